import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import { getTemplate } from '../shared/types/templates';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { SetupSheetSection } from './SetupSheetSection';

export type SetupSheetProps = {
  vehicleClass: VehicleClassKey;
  values: StoredSetupValues;
  units: UnitPreferences;
  /** Phones start with only the first section open; wide screens have room for all of them. */
  openAll: boolean;
};

/** The whole sheet, section by section, in the class template's order. */
export function SetupSheet({ vehicleClass, values, units, openAll }: SetupSheetProps) {
  const template = getTemplate(vehicleClass);
  const keys = template.sections.map((s) => s.key);
  const [open, setOpen] = useState<ReadonlySet<string>>(() => new Set(openAll ? keys : keys.slice(0, 1)));
  const everyOpen = keys.every((k) => open.has(k));
  const toggle = (key: string) =>
    setOpen((prev) => {
      const next = new Set(prev);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });
  return (
    <Card>
      <View style={styles.header}>
        <AppText variant="heading" style={styles.title}>
          The sheet
        </AppText>
        <Button
          label={everyOpen ? 'Close all' : 'Open all'}
          accessibilityLabel={everyOpen ? 'Close every section' : 'Open every section'}
          variant="secondary"
          onPress={() => setOpen(new Set(everyOpen ? [] : keys))}
        />
      </View>
      {template.sections.map((section, i) => (
        <SetupSheetSection
          key={section.key}
          section={section}
          values={values}
          units={units}
          open={open.has(section.key)}
          onToggle={() => toggle(section.key)}
          first={i === 0}
        />
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  title: { flexShrink: 1 },
});
