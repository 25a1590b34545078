import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { SetupSummary } from '../shared/types/setups';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { formatDay } from './SetupSheetFormat';
import { VisibilityBadge } from './VisibilityBadge';

export type SetupListItemProps = { setup: SetupSummary; first?: boolean };

/** "Loose and dusty · 3 revisions · changed 2 Dec 2026" */
export function setupFacts(setup: SetupSummary): string {
  const parts = [
    setup.conditions.trackType ? trackTypeLabel(setup.conditions.trackType) : 'Any track',
    `${setup.revisionCount} revision${setup.revisionCount === 1 ? '' : 's'}`,
    `changed ${formatDay(setup.updatedAt)}`,
  ];
  return parts.join(' · ');
}

/** One setup in a car's list; the whole row opens the setup. */
export function SetupListItem({ setup, first }: SetupListItemProps) {
  const { colors } = useTheme();
  return (
    <Link href={`/setups/${setup.id}`} asChild>
      <Pressable
        role="link"
        // Link's asChild takes one flat style object: no arrays, no style functions.
        style={StyleSheet.flatten([styles.row, first ? null : { borderTopWidth: 1, borderColor: colors.border }])}
      >
        <View style={styles.text}>
          <View style={styles.titleRow}>
            <AppText style={styles.title}>{setup.title}</AppText>
            <VisibilityBadge visibility={setup.visibility} />
          </View>
          <AppText variant="caption" tone="muted">
            {setupFacts(setup)}
          </AppText>
        </View>
        <AppText tone="muted" aria-hidden>
          ›
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: layout.minTouchTarget, paddingVertical: space.md, flexDirection: 'row', alignItems: 'center', gap: space.md },
  text: { flex: 1, gap: space.xs },
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  title: { fontWeight: '700', flexShrink: 1 },
});
