import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AppealDecisionForm } from '../../components/AppealDecisionForm';
import { AppText } from '../../components/AppText';
import { QueueActions } from '../../components/QueueActions';
import { doneText, QueueDoneList, type QueueDoneEntry } from '../../components/QueueDoneList';
import { QueueFilters, type QueueFilterValues } from '../../components/QueueFilters';
import { QueueItemCard, queueItemKey } from '../../components/QueueItemCard';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { TextLink } from '../../components/TextLink';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useDecideAppeal, useModerationAction, useModerationQueueQuery } from '../../hooks/moderation';
import type { ModerationActionSummary, QueueItem } from '../../shared/types/moderation';
import { space } from '../../theme';

const DONE_SHOWN = 8;

function QueueRows({ items, onDone }: { items: QueueItem[]; onDone: (entry: QueueDoneEntry) => void }) {
  const act = useModerationAction();
  const decide = useDecideAppeal();
  const [now] = useState(Date.now);
  return (
    <View role="list" aria-label="Review queue" style={styles.list}>
      {items.map((item) => {
        const key = queueItemKey(item);
        const appeal = item.appeal;
        return (
          <View key={key} role="listitem">
            <QueueItemCard item={item} now={now}>
              {appeal ? (
                <AppealDecisionForm
                  canDecide={appeal.canDecide}
                  onDecide={async ({ decision, reason }) => {
                    await decide.mutateAsync({ appealId: appeal.id, decision, reason });
                    onDone({ key: `${key}:${Date.now()}`, text: doneText(item, decision === 'uphold' ? 'appeal-upheld' : 'appeal-overturned', 0) });
                  }}
                />
              ) : (
                <QueueActions
                  item={item}
                  onAct={async (request) => {
                    const summary: ModerationActionSummary = await act.mutateAsync(request);
                    onDone({ key: `${key}:${summary.id}`, text: doneText(item, request.action, summary.resolvedReports) });
                  }}
                />
              )}
            </QueueItemCard>
          </View>
        );
      })}
    </View>
  );
}

function Queue() {
  const [filter, setFilter] = useState<QueueFilterValues>({ kind: 'all', order: 'oldest' });
  const [done, setDone] = useState<QueueDoneEntry[]>([]);
  const queue = useModerationQueueQuery(filter, true);
  const record = (entry: QueueDoneEntry) => setDone((list) => [entry, ...list].slice(0, DONE_SHOWN));
  let body;
  if (queue.isPending) body = <LoadingState label="Loading the queue…" />;
  else if (queue.isError) body = <ErrorState title="The queue could not load" message={queue.error.message} onRetry={() => void queue.refetch()} />;
  else if (queue.data.items.length === 0)
    body = <EmptyState title="Nothing waiting" message="No open reports or appeals match these filters. New reports show up here as racers send them." />;
  else body = <QueueRows items={queue.data.items} onDone={record} />;
  return (
    <>
      <View style={styles.row}>
        <AppText role="status" aria-live="polite">
          {queue.data
            ? `${queue.data.openReports} open report${queue.data.openReports === 1 ? '' : 's'} · ${queue.data.openAppeals} appeal${queue.data.openAppeals === 1 ? '' : 's'} waiting`
            : ' '}
        </AppText>
        <TextLink href="/moderation/audit" label="Audit log" />
      </View>
      <QueueFilters value={filter} onChange={setFilter} />
      <QueueDoneList entries={done} />
      {body}
    </>
  );
}

export default function ModerationQueueScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Review queue" subtitle="Reported posts and appeals, grouped by what was reported." back={{ href: '/profile', label: 'Back to Profile' }}>
      <SignedInGate me={me} signInHref={signInHref('/moderation')}>
        {(signedIn) =>
          signedIn.role === 'racer' ? (
            <EmptyState title="Moderators only" message="The review queue is for Tunefork's moderators and admins. To flag something, use the “Report” button on it; follow your reports in My reports." />
          ) : (
            <Queue />
          )
        }
      </SignedInGate>
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', columnGap: space.md },
});
