import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { conditionParts, formatTrackDayDate } from '../hooks/trackDays';
import type { UnitPreferences } from '../shared/types/auth';
import type { TrackDaySummary } from '../shared/types/trackdays';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type TrackDayListItemProps = { day: TrackDaySummary; units: UnitPreferences; first?: boolean };

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** "Saltmarsh Raceway · Hard-packed outdoor · 3 runs · 42 laps" and the conditions of the day. */
export function trackDayFacts(day: TrackDaySummary): string {
  return [day.track.name, trackTypeLabel(day.track.surface), plural(day.runCount, 'run'), plural(day.lapCount, 'lap')].join(' · ');
}

/** One day at the track in the list; the whole row opens it. */
export function TrackDayListItem({ day, units, first }: TrackDayListItemProps) {
  const { colors } = useTheme();
  const conditions = conditionParts(day.conditions, units);
  const date = formatTrackDayDate(day.date);
  return (
    <Link href={`/track-days/${day.id}`} asChild>
      <Pressable
        role="link"
        aria-label={`${date}, ${trackDayFacts(day)}`}
        // Link's asChild takes one flat style object: no arrays, no style functions.
        style={StyleSheet.flatten([styles.row, first ? null : { borderTopWidth: 1, borderColor: colors.border }])}
      >
        <View style={styles.text}>
          <AppText style={styles.bold}>{date}</AppText>
          <AppText variant="caption" tone="muted">
            {trackDayFacts(day)}
          </AppText>
          {conditions.length > 0 ? (
            <AppText variant="caption" tone="muted">
              {conditions.join(' · ')}
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
  row: { minHeight: layout.minTouchTarget, paddingVertical: space.md, flexDirection: 'row', alignItems: 'center', gap: space.md },
  text: { flex: 1, gap: 2 },
  bold: { fontWeight: '700' },
});
