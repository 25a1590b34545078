import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { KitSummary } from '../shared/types/catalog';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type KitListProps = { kits: KitSummary[] };

/** Kits with their maker and class, one row each; a row opens the kit's page and its public setups. */
export function KitList({ kits }: KitListProps) {
  const { colors } = useTheme();
  return (
    <Card style={styles.card}>
      <View role="list" aria-label="Kits">
        {kits.map((kit, i) => (
          <View key={kit.id} role="listitem">
            <Link href={`/kits/${kit.id}`} asChild>
              <Pressable
                role="link"
                aria-label={`${kit.makerName} ${kit.name}, ${vehicleClassLabel(kit.vehicleClass)}`}
                // Link's asChild takes one flat style object: no arrays, no style functions.
                style={StyleSheet.flatten([styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null])}
              >
                <View style={styles.text}>
                  <AppText variant="body" style={styles.name}>
                    {kit.makerName} {kit.name}
                  </AppText>
                  <AppText variant="caption" tone="muted">
                    {vehicleClassLabel(kit.vehicleClass)}
                    {kit.releasedYear ? ` · ${kit.releasedYear}` : ''}
                  </AppText>
                </View>
                <AppText tone="muted" aria-hidden>
                  ›
                </AppText>
              </Pressable>
            </Link>
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { paddingVertical: 0, gap: 0 },
  row: { minHeight: layout.minTouchTarget, paddingVertical: space.sm, flexDirection: 'row', alignItems: 'center', gap: space.md },
  text: { flex: 1, gap: 2 },
  name: { fontWeight: '700' },
});
