import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  REPORT_REASON_LABELS,
  type ModerationActionRequest,
  type QueueAction,
  type QueueItem,
} from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { QueueActionForm } from './QueueActionForm';

export type QueueActionsProps = {
  item: QueueItem;
  /** Sends one action on this row's target; resolves when the server took it. */
  onAct: (request: ModerationActionRequest) => Promise<unknown>;
};

const ACTION_LABELS: Record<QueueAction, string> = {
  hide: 'Hide',
  restore: 'Restore',
  dismiss: 'Dismiss reports',
  warn: 'Warn author',
  suspend: 'Suspend author',
  'hide-all': 'Hide everything by this account',
};

const LOOKED_AT = 'Looked at the reports: it follows the rules.';

/** The reason most reporters gave, as the starting words of a hide or suspension. */
function topReasonText(item: QueueItem): string {
  const top = [...item.reasons].sort((a, b) => b.count - a.count)[0];
  return top ? `${REPORT_REASON_LABELS[top.reason].label}.` : '';
}

export function initialReasonFor(action: QueueAction, item: QueueItem): string {
  if (action === 'restore' || action === 'dismiss') return LOOKED_AT;
  if (action === 'warn') return '';
  return topReasonText(item);
}

/** A moderator's hide still to come: shown content, or content the report threshold hid pending review. */
function hideable(item: QueueItem): boolean {
  return item.content.hiddenAt === null || item.content.autoHidden;
}

/**
 * Actions that make sense for this row now: shown content can be hidden, hidden content restored;
 * an automatic hide can go either way, since it waits for exactly this decision.
 */
export function availableActions(item: QueueItem): QueueAction[] {
  const actions: QueueAction[] = [];
  if (hideable(item)) actions.push('hide');
  if (item.content.hiddenAt !== null) actions.push('restore');
  if (item.reportCount > 0) actions.push('dismiss');
  actions.push('warn', 'suspend', 'hide-all');
  return actions;
}

/**
 * What a moderator can do with one reported thing. Spam is the common case, so it gets one
 * button with the reason filled in; everything else is a chip, then a reason, then confirm.
 */
export function QueueActions({ item, onAct }: QueueActionsProps) {
  const [chosen, setChosen] = useState<{ action: QueueAction; reason: string } | null>(null);
  if (!item.canAct) {
    return (
      <AppText tone="muted" role="note">
        {item.cannotActReason ?? 'You cannot act on this one.'}
      </AppText>
    );
  }
  const spam = item.reasons.some((r) => r.reason === 'spam') && hideable(item);
  const choose = (action: QueueAction) => setChosen({ action, reason: initialReasonFor(action, item) });
  if (chosen) {
    return (
      <QueueActionForm
        key={`${chosen.action}:${chosen.reason}`}
        action={chosen.action}
        authorHandle={item.author.handle}
        initialReason={chosen.reason}
        onCancel={() => setChosen(null)}
        onSubmit={async (values) => {
          await onAct({ targetType: item.targetType, targetId: item.targetId, action: chosen.action, ...values });
          // Most rows leave the queue once acted on; one that stays offers its actions again.
          setChosen(null);
        }}
      />
    );
  }
  const options = availableActions(item).map((value) => ({ value, label: ACTION_LABELS[value] }));
  return (
    <View style={styles.stack}>
      {spam ? (
        <Button
          label="Hide as spam"
          accessibilityLabel={`Hide as spam: ${item.content.title}`}
          onPress={() => setChosen({ action: 'hide', reason: `${REPORT_REASON_LABELS.spam.label}.` })}
        />
      ) : null}
      <ChoiceChips label={spam ? 'Or another action' : 'Action'} options={options} selected={[]} onChange={([action]) => action && choose(action)} />
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
});
