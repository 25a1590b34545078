import { StyleSheet, View } from 'react-native';
import type { ConflictChoice } from '../hooks/editor';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';

export type ConflictPanelRow = {
  key: string;
  label: string;
  /** Both values already in words and in the racer's units. */
  mine: string;
  theirs: string;
  /** False when the racer never touched the field: their "mine" is only the older saved value. */
  editedByMe: boolean;
  /** False when the newer revision kept the older value and only the racer changed it. */
  editedByThem: boolean;
  choice: ConflictChoice;
};

export type ConflictPanelProps = {
  revisionNumber: number;
  authorHandle: string;
  savedAt: string;
  changeNote: string;
  rows: readonly ConflictPanelRow[];
  onChoose: (key: string, choice: ConflictChoice) => void;
  onApply: () => void;
};

const CHOICES: readonly ChoiceOption<ConflictChoice>[] = [
  { value: 'mine', label: 'Keep mine' },
  { value: 'theirs', label: 'Take theirs' },
];

function savedWhen(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : ` at ${date.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' })}`;
}

/** A newer revision arrived while the racer edited: per field, their value or the saved one. */
export function ConflictPanel({ revisionNumber, authorHandle, savedAt, changeNote, rows, onChoose, onApply }: ConflictPanelProps) {
  const { colors } = useTheme();
  return (
    <View role="region" aria-label="Newer revision" style={[styles.panel, { borderColor: colors.caution, backgroundColor: colors.cautionSoft }]}>
      <AppText variant="heading">
        Revision {revisionNumber} was saved while you were editing
      </AppText>
      <AppText>
        Saved by @{authorHandle}
        {savedWhen(savedAt)}: “{changeNote}”
      </AppText>
      <AppText role="alert">
        Nothing you typed is lost.{' '}
        {rows.length > 0
          ? `For each of the ${rows.length} ${rows.length === 1 ? 'field' : 'fields'} below, keep your value or take the saved one, then save again on top of revision ${revisionNumber}.`
          : `It holds the same values as your draft, so you can save on top of it as they are.`}
      </AppText>
      {rows.map((row) => (
        <View key={row.key} style={[styles.row, { borderColor: colors.border, backgroundColor: colors.surface }]}>
          <AppText variant="heading" aria-level={3}>
            {row.label}
          </AppText>
          <AppText>Yours: {row.mine}{row.editedByMe ? '' : ' (you did not change this)'}</AppText>
          <AppText>
            In revision {revisionNumber}: {row.theirs}
            {row.editedByThem ? '' : ' (unchanged there)'}
          </AppText>
          <ChoiceChips label={`${row.label}: which value to keep`} hideLabel options={CHOICES} selected={[row.choice]} onChange={([choice]) => onChoose(row.key, choice)} />
        </View>
      ))}
      <Button label={rows.length > 0 ? 'Use these choices' : 'Continue editing'} onPress={onApply} />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.lg, gap: space.md },
  row: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
});
