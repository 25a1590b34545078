import { StyleSheet, View } from 'react-native';
import type { OneSideField } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { fieldsByKey, getTemplate } from '../shared/types/templates';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { AppText } from './AppText';
import { valueText } from './CompareRows';

export type CompareOneSideProps = {
  /** Names the side, e.g. "Stoat 8N race sheet, revision 3". */
  sideName: string;
  fields: OneSideField[];
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
};

/** Settings only one side's class has (a clutch bell, a motor's kV): listed, not compared. */
export function CompareOneSide({ sideName, fields, vehicleClass, units }: CompareOneSideProps) {
  const byKey = fieldsByKey(getTemplate(vehicleClass));
  if (fields.length === 0) return null;
  return (
    <View style={styles.group}>
      <AppText role="heading" aria-level={3} style={styles.bold}>
        Only on {sideName}
      </AppText>
      <View role="list" aria-label={`Settings only on ${sideName}`}>
        {fields.map((field) => (
          <View key={field.key} role="listitem" style={styles.item}>
            <AppText>
              <AppText style={styles.bold}>{field.label}</AppText>: {valueText(byKey.get(field.key), field.value, units)}
            </AppText>
            <AppText variant="caption" tone="muted">
              {field.section}
            </AppText>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  item: { paddingVertical: space.xs },
  bold: { fontWeight: '700' },
});
