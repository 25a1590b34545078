import { Pressable, StyleSheet } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { FieldChangeDto } from '../shared/types/forks';
import { fieldsByKey, getTemplate, listFields } from '../shared/types/templates';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { layout } from '../theme';
import { AppText } from './AppText';
import { CompareRows, valueText, type CompareDisplayRow } from './CompareRows';

export type RevisionChangesProps = {
  changes: FieldChangeDto[];
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
  revisionNumber: number;
  /** Offered beside each change when the viewer can comment. */
  onCommentOnField?: (field: { key: string; label: string }) => void;
};

/** A revision's field changes in the sheet's order, each "before → after" in the viewer's units. */
export function changeRows(changes: FieldChangeDto[], vehicleClass: VehicleClassKey, units: UnitPreferences): CompareDisplayRow[] {
  const template = getTemplate(vehicleClass);
  const fields = fieldsByKey(template);
  const order = new Map(listFields(template).map((field, i) => [field.key, i]));
  const position = (key: string) => order.get(key) ?? Number.MAX_SAFE_INTEGER;
  return [...changes]
    .sort((x, y) => position(x.key) - position(y.key) || x.key.localeCompare(y.key))
    .map((change) => {
      const field = fields.get(change.key);
      return {
        key: change.key,
        label: field?.label ?? change.key,
        a: valueText(field, change.before, units),
        b: valueText(field, change.after, units),
        changed: true,
      };
    });
}

function FieldCommentAction({ row, onPress }: { row: CompareDisplayRow; onPress: () => void }) {
  return (
    <Pressable role="button" aria-label={`Comment on ${row.label}`} onPress={onPress} style={styles.action}>
      <AppText variant="caption" tone="accent" style={styles.underline}>
        Comment on this field
      </AppText>
    </Pressable>
  );
}

/** What one revision changed; the first revision is the starting sheet, so it lists none. */
export function RevisionChanges({ changes, vehicleClass, units, revisionNumber, onCommentOnField }: RevisionChangesProps) {
  if (changes.length === 0) {
    return <AppText tone="muted">{revisionNumber === 1 ? 'The starting sheet: nothing before it to change.' : 'No values changed in this revision.'}</AppText>;
  }
  return (
    <CompareRows
      rows={changeRows(changes, vehicleClass, units)}
      wide={false}
      columns={{ a: 'Before', b: 'After' }}
      label={`Changes in revision ${revisionNumber}`}
      renderAction={onCommentOnField ? (row) => <FieldCommentAction row={row} onPress={() => onCommentOnField({ key: row.key, label: row.label })} /> : undefined}
    />
  );
}

const styles = StyleSheet.create({
  action: { minHeight: layout.minTouchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  underline: { textDecorationLine: 'underline' },
});
