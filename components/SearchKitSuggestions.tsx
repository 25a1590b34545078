import { Pressable, StyleSheet, View } from 'react-native';
import type { KitSuggestion } from '../shared/types/community';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type SearchKitSuggestionsProps = {
  kits: KitSuggestion[];
  /** Shows that kit's setups (the search gives way to the kit filter). */
  onPick: (kit: KitSuggestion) => void;
};

/** Kits whose names are close to the words searched for, typos and all: one press filters by the kit. */
export function SearchKitSuggestions({ kits, onPick }: SearchKitSuggestionsProps) {
  const { colors } = useTheme();
  if (kits.length === 0) return null;
  return (
    <View style={styles.group}>
      <AppText variant="caption" tone="muted">
        Kits with a name like that:
      </AppText>
      <View style={styles.row}>
        {kits.map((kit) => (
          <Pressable
            key={kit.id}
            role="button"
            aria-label={`Show setups for the ${kit.makerName} ${kit.name}`}
            onPress={() => onPick(kit)}
            style={({ pressed }) => [styles.chip, { borderColor: colors.accent, backgroundColor: colors.surface, opacity: pressed ? 0.85 : 1 }]}
          >
            <AppText tone="accent" style={styles.name}>
              {kit.name}
            </AppText>
            <AppText variant="caption" tone="muted">
              {kit.makerName} · {vehicleClassLabel(kit.vehicleClass)}
            </AppText>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minHeight: layout.minTouchTarget, borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.xs, justifyContent: 'center' },
  name: { fontWeight: '700' },
});
