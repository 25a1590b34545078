import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';

export type UnsavedRestoredNoticeProps = {
  changedCount: number;
  hasNote: boolean;
  onDiscard: () => void;
};

function whatCameBack(changedCount: number, hasNote: boolean): string {
  const parts = [changedCount > 0 ? `${changedCount} changed ${changedCount === 1 ? 'field' : 'fields'}` : '', hasNote ? 'your change note' : ''];
  return parts.filter(Boolean).join(' and ') || 'your draft';
}

/** The editor reopened with work the racer left without saving: say so, and offer a clean start. */
export function UnsavedRestoredNotice({ changedCount, hasNote, onDiscard }: UnsavedRestoredNoticeProps) {
  const { colors } = useTheme();
  return (
    <View style={[styles.notice, { backgroundColor: colors.cautionSoft, borderColor: colors.caution }]}>
      <AppText role="status" aria-live="polite">
        You left this sheet without saving, so we kept {whatCameBack(changedCount, hasNote)}. Carry on, or start again from the
        saved revision.
      </AppText>
      <Button label="Discard my unsaved changes" variant="secondary" onPress={onDiscard} />
    </View>
  );
}

const styles = StyleSheet.create({
  notice: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.sm },
});
