import { StyleSheet, View } from 'react-native';
import type { SavedRevisionNotice } from '../hooks/editor';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';

export type EditorSavedNoticeProps = {
  /** Nothing renders while this is null. */
  notice: SavedRevisionNotice | null;
  onDismiss: () => void;
};

/**
 * For the setup page after the editor sends the racer back: the revision number that was saved and
 * the values the server found unusual. Read it with `useSavedRevisionNotice(setupId)`.
 */
export function EditorSavedNotice({ notice, onDismiss }: EditorSavedNoticeProps) {
  const { colors } = useTheme();
  if (!notice) return null;
  const unusual = notice.warnings.length > 0;
  const [background, border] = unusual ? [colors.cautionSoft, colors.caution] : [colors.successSoft, colors.success];
  return (
    <View style={[styles.notice, { backgroundColor: background, borderColor: border }]}>
      <AppText role="status" aria-live="polite" style={styles.title}>
        Saved as revision {notice.revisionNumber}.{unusual ? ' Some values are unusual; they were kept, but check them:' : ''}
      </AppText>
      {notice.warnings.map((warning) => (
        <AppText key={warning} variant="caption">
          • {warning}
        </AppText>
      ))}
      <Button label="Dismiss" variant="secondary" onPress={onDismiss} />
    </View>
  );
}

const styles = StyleSheet.create({
  notice: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.sm },
  title: { fontWeight: '700' },
});
