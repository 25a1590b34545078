import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';

export type EditorSaveBarProps = {
  changedCount: number;
  problemCount: number;
  nextRevisionNumber: number;
  saving: boolean;
  /** A newer revision is waiting for the racer's choices; saving comes after. */
  conflictOpen: boolean;
  onSave: () => void;
};

export function changedCountText(count: number): string {
  if (count === 0) return 'No fields changed yet';
  return `${count} ${count === 1 ? 'field' : 'fields'} changed`;
}

/** Always in reach: how much changed, what still needs fixing, and Save. */
export function EditorSaveBar({ changedCount, problemCount, nextRevisionNumber, saving, conflictOpen, onSave }: EditorSaveBarProps) {
  const status = conflictOpen
    ? 'Choose between the two versions above, then save.'
    : problemCount > 0
      ? `${problemCount} ${problemCount === 1 ? 'value needs' : 'values need'} fixing before you can save.`
      : null;
  return (
    <View style={styles.bar}>
      <View style={styles.text}>
        <AppText style={styles.count} role="status" aria-live="polite">
          {changedCountText(changedCount)}
        </AppText>
        {status ? (
          <AppText variant="caption" tone={conflictOpen ? 'caution' : 'danger'}>
            {status}
          </AppText>
        ) : null}
      </View>
      <Button
        label={`Save revision ${nextRevisionNumber}`}
        busy={saving}
        busyLabel="Saving…"
        disabled={changedCount === 0 || conflictOpen}
        onPress={onSave}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  text: { flex: 1, minWidth: 140, gap: space.xs },
  count: { fontWeight: '700' },
});
