import { StyleSheet, View } from 'react-native';
import type { KitSummary } from '../shared/types/catalog';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type KitListProps = { kits: KitSummary[] };

/** Kits with their maker and class, one row each. */
export function KitList({ kits }: KitListProps) {
  const { colors } = useTheme();
  return (
    <Card>
      <View role="list">
        {kits.map((kit, i) => (
          <View
            key={kit.id}
            role="listitem"
            style={[styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}
          >
            <AppText variant="body" style={styles.name}>
              {kit.makerName} {kit.name}
            </AppText>
            <AppText variant="caption" tone="muted">
              {vehicleClassLabel(kit.vehicleClass)}
              {kit.releasedYear ? ` · ${kit.releasedYear}` : ''}
            </AppText>
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.sm, gap: 2 },
  name: { fontWeight: '700' },
});
