import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { formatForDisplay } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { DiscoverSetup } from '../shared/types/community';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type DiscoverSetupCardProps = { setup: DiscoverSetup; units: UnitPreferences };

/** "@juno_braithwick · Stoat 8E by Ottervale Kitworks · 1/8 electric buggy" */
export function discoverWhoAndWhat(setup: DiscoverSetup): string {
  return `@${setup.ownerHandle} · ${setup.kitName} by ${setup.makerName} · ${vehicleClassLabel(setup.vehicleClass)}`;
}

/** "Loose and dusty · 24 °C · 3 forks" in the racer's temperature unit. */
export function discoverConditions(setup: DiscoverSetup, units: UnitPreferences): string {
  const parts = [setup.trackType ? trackTypeLabel(setup.trackType) : 'Any surface'];
  if (setup.temperatureC !== null) parts.push(formatForDisplay(setup.temperatureC, 'temperature', units).text);
  parts.push(`${setup.forkCount} ${setup.forkCount === 1 ? 'fork' : 'forks'}`);
  return parts.join(' · ');
}

/** For "best for": "9 of 11 racers say it works on Loamy · score 0.62", the numbers the order is made from. */
export function discoverVotes(votes: NonNullable<DiscoverSetup['votes']>): string {
  const total = votes.works + votes.fails;
  const surface = trackTypeLabel(votes.trackType);
  if (total === 0) return `No votes for ${surface} yet`;
  return `${votes.works} of ${total} ${total === 1 ? 'racer says' : 'racers say'} it works on ${surface} · score ${votes.wilson.toFixed(2)}`;
}

/** One setup in Discover or search results; the whole card opens the setup. */
export function DiscoverSetupCard({ setup, units }: DiscoverSetupCardProps) {
  const { colors } = useTheme();
  const lines = [discoverWhoAndWhat(setup), discoverConditions(setup, units), ...(setup.votes ? [discoverVotes(setup.votes)] : [])];
  return (
    <Link href={`/setups/${setup.id}`} asChild>
      <Pressable
        role="link"
        aria-label={`${setup.title}. ${lines.join('. ')}`}
        // Link's asChild takes one flat style object: no arrays, no style functions.
        style={StyleSheet.flatten([styles.card, { backgroundColor: colors.surface, borderColor: colors.border }])}
      >
        <View style={styles.text}>
          <AppText style={styles.title}>{setup.title}</AppText>
          <AppText variant="caption" tone="muted">
            {lines[0]}
          </AppText>
          <AppText variant="caption" tone="muted">
            {lines[1]}
          </AppText>
          {setup.votes ? (
            <AppText variant="caption" tone="accent">
              {lines[2]}
            </AppText>
          ) : null}
        </View>
        <AppText tone="muted" aria-hidden>
          ›
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    minHeight: layout.minTouchTarget,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.lg,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
  },
  text: { flex: 1, gap: space.xs },
  title: { fontWeight: '700' },
});
