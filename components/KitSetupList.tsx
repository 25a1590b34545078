import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { KitSetupList as KitSetups } from '../shared/types/forks';
import { TRACK_TYPES } from '../shared/types/trackTypes';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { formatDay } from './SetupSheetFormat';

export type KitSetupListProps = { setups: KitSetups['setups'] };

function count(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** "@juno_braithwick · Loose and dusty · 4 revisions · 2 forks · changed 2 Dec 2026" */
export function kitSetupFacts(setup: KitSetups['setups'][number]): string {
  const track = setup.trackType ? (TRACK_TYPES.find((t) => t.key === setup.trackType)?.label ?? setup.trackType) : 'Any track';
  return [
    `@${setup.ownerHandle}`,
    track,
    count(setup.revisionCount, 'revision', 'revisions'),
    count(setup.forkCount, 'fork', 'forks'),
    `changed ${formatDay(setup.updatedAt)}`,
  ].join(' · ');
}

/** Public setups of one kit, newest first; each row opens the setup. */
export function KitSetupList({ setups }: KitSetupListProps) {
  const { colors } = useTheme();
  return (
    <Card style={styles.card}>
      <View role="list" aria-label="Public setups of this kit">
        {setups.map((setup, i) => (
          <View key={setup.id} role="listitem">
            <Link href={`/setups/${setup.id}`} asChild>
              <Pressable
                role="link"
                aria-label={`${setup.title}, ${kitSetupFacts(setup)}`}
                // Link's asChild takes one flat style object: no arrays, no style functions.
                style={StyleSheet.flatten([styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null])}
              >
                <View style={styles.text}>
                  <AppText style={styles.title}>{setup.title}</AppText>
                  <AppText variant="caption" tone="muted">
                    {kitSetupFacts(setup)}
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
  row: { minHeight: layout.minTouchTarget, paddingVertical: space.md, flexDirection: 'row', alignItems: 'center', gap: space.md },
  text: { flex: 1, gap: space.xs },
  title: { fontWeight: '700' },
});
