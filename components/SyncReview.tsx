import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { SYNC_UNDECIDED, buildUpstreamPayload, changeSyncChoice, type SyncChoice } from '../hooks/forks';
import type { UnitPreferences } from '../shared/types/auth';
import type { Upstream } from '../shared/types/forks';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { FormErrorBanner } from './FormErrorBanner';
import { StatusNote } from './StatusNote';
import { SyncRowCard } from './SyncRowCard';
import { SyncSummary } from './SyncSummary';
import { SyncTable } from './SyncTable';
import { TextLink } from './TextLink';

export type AvailableUpstream = Extract<Upstream, { status: 'available' }>;

export type SyncReviewProps = {
  upstream: AvailableUpstream;
  /** The fork's class: its sheet names and units the values. */
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
  onApply: (payload: { take: string[]; dismiss: string[] }) => void;
  pending: boolean;
  error: string | null;
  /** Why the view was just refreshed (the original or the fork moved), shown beside Apply. */
  notice?: string | null;
};

function changes(n: number): string {
  return `${n} change${n === 1 ? '' : 's'}`;
}

/**
 * The fork owner's review of the original's changes. Choices stay on screen until "Apply" sends them,
 * with a summary of what that will do.
 */
export function SyncReview({ upstream, vehicleClass, units, onApply, pending, error, notice }: SyncReviewProps) {
  const { isWide } = useTheme();
  const [choices, setChoices] = useState<Record<string, SyncChoice>>({});
  const { rows, original } = upstream;
  const payload = buildUpstreamPayload(rows, choices);
  const count = payload.take.length + payload.dismiss.length;
  const theirsOnly = rows.filter((row) => row.status === 'theirs-only');
  const change = (key: string, next: Partial<SyncChoice>) =>
    setChoices((prev) => ({ ...prev, [key]: changeSyncChoice(prev[key] ?? SYNC_UNDECIDED, next) }));
  const takeAll = () =>
    setChoices((prev) => {
      const next = { ...prev };
      for (const row of theirsOnly) next[row.key] = changeSyncChoice(prev[row.key] ?? SYNC_UNDECIDED, { take: true });
      return next;
    });
  const labels = {
    base: `When you last took changes (revision ${upstream.syncedRevisionNumber})`,
    theirs: `Original now (revision ${original.revisionNumber})`,
    mine: 'Your fork now',
  };
  return (
    <>
      <Card role="region" aria-label="Changes in the original">
        <AppText variant="heading">
          The original changed {rows.length} field{rows.length === 1 ? '' : 's'} since you last took changes
        </AppText>
        <TextLink href={`/setups/${original.setupId}`} label={`“${original.title}” by @${original.ownerHandle}`} />
        <AppText tone="muted">Nothing changes in your fork until you press Apply.</AppText>
        {theirsOnly.length > 0 ? <Button label="Take all" accessibilityLabel={`Take all ${theirsOnly.length} that only the original changed`} variant="secondary" onPress={takeAll} disabled={pending} /> : null}
      </Card>
      {isWide ? (
        <Card>
          <SyncTable rows={rows} choices={choices} onChange={change} vehicleClass={vehicleClass} units={units} labels={labels} disabled={pending} />
        </Card>
      ) : (
        <View style={styles.cards}>
          {rows.map((row) => (
            <SyncRowCard
              key={row.key}
              row={row}
              choice={choices[row.key] ?? SYNC_UNDECIDED}
              onChange={(next) => change(row.key, next)}
              vehicleClass={vehicleClass}
              units={units}
              labels={labels}
              disabled={pending}
            />
          ))}
        </View>
      )}
      <Card>
        <StatusNote tone="caution" message={notice} />
        <SyncSummary rows={rows} payload={payload} />
        <FormErrorBanner message={error} />
        <Button
          label={`Apply ${changes(count)}`}
          busy={pending}
          busyLabel="Applying…"
          disabled={count === 0}
          onPress={() => onApply(payload)}
        />
      </Card>
    </>
  );
}

const styles = StyleSheet.create({
  cards: { gap: space.md },
});
