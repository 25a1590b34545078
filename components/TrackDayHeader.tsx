import { conditionParts, formatTrackDayDate } from '../hooks/trackDays';
import type { UnitPreferences } from '../shared/types/auth';
import type { TrackDay } from '../shared/types/trackdays';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { AppText } from './AppText';
import { Card } from './Card';

export type TrackDayHeaderProps = { day: TrackDay; units: UnitPreferences };

/** Where and when, and what the track was like, in the viewer's units. */
export function TrackDayHeader({ day, units }: TrackDayHeaderProps) {
  const conditions = conditionParts(day.conditions, units);
  return (
    <Card role="region" aria-label="The day">
      <AppText variant="heading">{formatTrackDayDate(day.date)}</AppText>
      <AppText>
        {day.track.name} · {trackTypeLabel(day.track.surface)} · {day.track.indoor ? 'indoor' : 'outdoor'}
      </AppText>
      <AppText tone="muted">{conditions.length > 0 ? conditions.join(' · ') : 'No conditions noted.'}</AppText>
      {day.notes ? <AppText>{day.notes}</AppText> : null}
    </Card>
  );
}
