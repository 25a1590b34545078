import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type EditorIndexEntry = { key: string; label: string; changedCount: number; problemCount: number };

export type EditorSectionIndexProps = {
  entries: readonly EditorIndexEntry[];
  onJump: (key: string) => void;
  /** Chips across the top on phones; a list down the side on wide screens. */
  variant: 'chips' | 'side';
};

function spoken(entry: EditorIndexEntry): string {
  const extra = [entry.changedCount > 0 ? `${entry.changedCount} changed` : '', entry.problemCount > 0 ? `${entry.problemCount} to fix` : ''].filter(Boolean);
  return extra.length > 0 ? `${entry.label}, ${extra.join(', ')}` : entry.label;
}

/** Jumps to a section of the sheet; marks sections with changes or problems. */
export function EditorSectionIndex({ entries, onJump, variant }: EditorSectionIndexProps) {
  const { colors } = useTheme();
  const items = entries.map((entry) => {
    const marker = entry.problemCount > 0 ? colors.danger : entry.changedCount > 0 ? colors.accent : null;
    return (
      <Pressable
        key={entry.key}
        role="button"
        aria-label={`Go to ${spoken(entry)}`}
        onPress={() => onJump(entry.key)}
        style={({ pressed }) => [
          variant === 'chips' ? styles.chip : styles.sideItem,
          { borderColor: colors.border, backgroundColor: pressed ? colors.accentSoft : colors.surface },
        ]}
      >
        {marker ? <View style={[styles.dot, { backgroundColor: marker }]} /> : null}
        <AppText variant={variant === 'chips' ? 'caption' : 'body'} style={styles.text}>
          {entry.label}
        </AppText>
        {entry.problemCount > 0 || entry.changedCount > 0 ? (
          <AppText variant="caption" tone={entry.problemCount > 0 ? 'danger' : 'accent'} aria-hidden>
            {entry.problemCount > 0 ? `${entry.problemCount}!` : entry.changedCount}
          </AppText>
        ) : null}
      </Pressable>
    );
  });
  if (variant === 'side') {
    return (
      <View role="navigation" aria-label="Sections of this sheet" style={styles.side}>
        <AppText variant="caption" tone="muted" style={styles.sideTitle}>
          On this sheet
        </AppText>
        {items}
      </View>
    );
  }
  return (
    <View role="navigation" aria-label="Sections of this sheet">
      <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.chips}>
        {items}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  chips: { gap: space.sm, paddingVertical: space.xs },
  chip: {
    minHeight: layout.minTouchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xs,
    paddingHorizontal: space.md,
    borderRadius: radius.pill,
    borderWidth: 1,
  },
  side: { gap: space.xs },
  sideTitle: { paddingHorizontal: space.md, paddingBottom: space.xs, fontWeight: '700' },
  sideItem: {
    minHeight: layout.minTouchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 0,
  },
  dot: { width: space.sm, height: space.sm, borderRadius: radius.pill },
  text: { flexShrink: 1 },
});
