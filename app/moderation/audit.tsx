import { useState } from 'react';
import { View } from 'react-native';
import { AuditEntryRow } from '../../components/AuditEntryRow';
import { AuditFilters, type AuditFilterValues } from '../../components/AuditFilters';
import { Button } from '../../components/Button';
import { Card } from '../../components/Card';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useAuditLogQuery } from '../../hooks/moderation';
import { useDebouncedValue } from '../../hooks/useDebouncedValue';

const TYPING_PAUSE_MS = 300;

function AuditLog() {
  const [filters, setFilters] = useState<AuditFilterValues>({ actor: '', action: '', targetType: '' });
  const actor = useDebouncedValue(filters.actor.trim().replace(/^@/, ''), TYPING_PAUSE_MS);
  const log = useAuditLogQuery({ actor: actor || undefined, action: filters.action || undefined, targetType: filters.targetType || undefined }, true);
  const entries = log.data?.pages.flatMap((page) => page.entries) ?? [];
  let body;
  if (log.isPending) body = <LoadingState label="Loading the audit log…" />;
  else if (log.isError && !log.data) body = <ErrorState title="The audit log could not load" message={log.error.message} onRetry={() => void log.refetch()} />;
  else if (entries.length === 0) body = <EmptyState title="No entries" message="Nothing in the log matches these filters." />;
  else
    body = (
      <Card>
        <View role="list" aria-label="Audit log">
          {entries.map((entry, i) => (
            <AuditEntryRow key={entry.id} entry={entry} first={i === 0} />
          ))}
        </View>
        {log.hasNextPage ? (
          <Button label="Load older entries" variant="secondary" busy={log.isFetchingNextPage} busyLabel="Loading…" onPress={() => void log.fetchNextPage()} />
        ) : null}
        {log.isFetchNextPageError ? <ErrorState title="Older entries could not load" message={log.error.message} onRetry={() => void log.fetchNextPage()} /> : null}
      </Card>
    );
  return (
    <>
      <AuditFilters value={filters} onChange={setFilters} />
      {body}
    </>
  );
}

export default function AuditLogScreen() {
  const me = useMeQuery();
  return (
    <Screen
      title="Audit log"
      subtitle="Every moderation and role action: who, what, why, and what changed. Entries are never edited or removed."
      back={{ href: '/moderation', label: 'Back to the review queue' }}
    >
      <SignedInGate me={me} signInHref={signInHref('/moderation/audit')}>
        {(signedIn) =>
          signedIn.role === 'racer' ? (
            <EmptyState title="Moderators only" message="The audit log is for Tunefork's moderators and admins." />
          ) : (
            <AuditLog />
          )
        }
      </SignedInGate>
    </Screen>
  );
}
