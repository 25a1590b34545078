import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { CompareRows, type CompareDisplayRow } from './CompareRows';

export type CompareSectionProps = {
  title: string;
  rows: CompareDisplayRow[];
  wide: boolean;
  columns: { a: string; b: string };
  /** Ruled off from the section above. */
  ruled?: boolean;
};

/** One section of a comparison: its changed settings, the unchanged ones folded away until asked for. */
export function CompareSection({ title, rows, wide, columns, ruled }: CompareSectionProps) {
  const { colors } = useTheme();
  const [showUnchanged, setShowUnchanged] = useState(false);
  const changed = rows.filter((row) => row.changed);
  const unchanged = rows.length - changed.length;
  const shown = showUnchanged ? rows : changed;
  return (
    <View style={[styles.section, ruled ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
      <View style={styles.header}>
        <AppText role="heading" aria-level={3} style={styles.title}>
          {title}
        </AppText>
        <AppText variant="caption" tone="muted">
          {changed.length === 0 ? 'No changes' : `${changed.length} changed`}
        </AppText>
      </View>
      {shown.length > 0 ? <CompareRows rows={shown} wide={wide} columns={columns} label={`${title}: ${showUnchanged ? 'every setting' : 'changed settings'}`} /> : null}
      {unchanged > 0 ? (
        <Pressable
          role="button"
          aria-expanded={showUnchanged}
          aria-label={`${showUnchanged ? 'Hide' : 'Show'} ${unchanged} unchanged in ${title}`}
          onPress={() => setShowUnchanged((s) => !s)}
          style={({ pressed }) => [styles.toggle, { opacity: pressed ? 0.85 : 1 }]}
        >
          <AppText tone="accent" style={styles.toggleText}>
            {showUnchanged ? `Hide ${unchanged} unchanged` : `Show ${unchanged} unchanged`}
          </AppText>
        </Pressable>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { paddingVertical: space.sm, gap: space.xs },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', columnGap: space.md },
  title: { fontWeight: '700', flexShrink: 1 },
  toggle: { minHeight: layout.minTouchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  toggleText: { textDecorationLine: 'underline' },
});
