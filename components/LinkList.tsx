import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type LinkListItem = { href: Href; label: string; description?: string };

export type LinkListProps = { items: readonly LinkListItem[]; label: string };

/** A card of destinations, one full-width row each. */
export function LinkList({ items, label }: LinkListProps) {
  const { colors } = useTheme();
  return (
    <Card role="navigation" aria-label={label} style={styles.card}>
      {items.map((item, i) => (
        <Link key={item.label} href={item.href} asChild>
          <Pressable
            role="link"
            aria-label={item.label}
            // Link's asChild takes one flat style object: no arrays, no style functions.
            style={StyleSheet.flatten([styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null])}
          >
            <View style={styles.text}>
              <AppText style={styles.label}>{item.label}</AppText>
              {item.description ? (
                <AppText variant="caption" tone="muted">
                  {item.description}
                </AppText>
              ) : null}
            </View>
            <AppText tone="muted" aria-hidden>
              ›
            </AppText>
          </Pressable>
        </Link>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { paddingVertical: 0, gap: 0 },
  row: {
    minHeight: layout.minTouchTarget,
    paddingVertical: space.md,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
  },
  text: { flex: 1, gap: 2 },
  label: { fontWeight: '700' },
});
