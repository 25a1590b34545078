import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { KitStock } from '../shared/types/setups';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { SetupSheet } from './SetupSheet';

export type KitSetupStockSheetProps = { stock: KitStock; units: UnitPreferences; openAll: boolean };

/** The kit's stock sheet behind a button: the baseline every setup of the kit starts from. */
export function KitSetupStockSheet({ stock, units, openAll }: KitSetupStockSheetProps) {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.block}>
      <Card>
        <AppText variant="heading">Stock sheet</AppText>
        <AppText tone="muted">The values the kit comes with in the box: where every new setup for it starts.</AppText>
        <Button
          label={open ? 'Hide the stock sheet' : 'Show the stock sheet'}
          variant="secondary"
          onPress={() => setOpen((o) => !o)}
        />
      </Card>
      {open ? <SetupSheet vehicleClass={stock.vehicleClass} values={stock.values} units={units} openAll={openAll} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md },
});
