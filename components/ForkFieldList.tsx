import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';

export type ForkFieldListItem = { key: string; label: string; section: string; /** The value in words, in the racer's units. */ detail: string };

export type ForkFieldListProps = {
  title: string;
  description: string;
  items: readonly ForkFieldListItem[];
};

// A handful of lines reads at a glance on a phone; longer lists fold so the confirm button stays near.
const FOLD_AFTER = 5;

/** A titled list of fields the fork treats specially, folded to its first few rows when long. */
export function ForkFieldList({ title, description, items }: ForkFieldListProps) {
  const { colors } = useTheme();
  const [open, setOpen] = useState(false);
  if (items.length === 0) return null;
  const shown = open ? items : items.slice(0, FOLD_AFTER);
  return (
    <View role="region" aria-label={title} style={styles.section}>
      <AppText variant="heading">
        {title} ({items.length})
      </AppText>
      <AppText tone="muted">{description}</AppText>
      <View role="list">
        {shown.map((item, i) => (
          <View key={item.key} role="listitem" style={[styles.item, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
            <AppText style={styles.bold}>{item.label}</AppText>
            <AppText variant="caption" tone="muted">
              {item.section} · {item.detail}
            </AppText>
          </View>
        ))}
      </View>
      {items.length > FOLD_AFTER ? (
        <Button
          label={open ? 'Show fewer' : `Show all ${items.length}`}
          accessibilityLabel={open ? `Show fewer: ${title}` : `Show all ${items.length}: ${title}`}
          variant="secondary"
          onPress={() => setOpen((o) => !o)}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  item: { paddingVertical: space.sm, gap: 2 },
  bold: { fontWeight: '700' },
});
