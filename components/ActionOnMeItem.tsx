import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ActionOnMe, ModerationActionKind, MyAppeal } from '../shared/types/moderation';
import { space, useTheme } from '../theme';
import { AppealForm } from './AppealForm';
import { AppText } from './AppText';
import { Button } from './Button';
import { ModerationPill } from './ModerationPill';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

export type ActionOnMeItemProps = {
  action: ActionOnMe;
  onAppeal: (text: string) => Promise<unknown>;
  /** Opened from an "Appeal" link for this very action: the form starts open. */
  startOpen?: boolean;
  first?: boolean;
};

/** What happened to my post or account, said to me. */
const AUTHOR_TEXT: Record<ModerationActionKind, string> = {
  hide: 'Hidden by moderators',
  restore: 'Put back by moderators',
  dismiss: 'Reports looked at; nothing changed',
  warn: 'A warning from the moderators',
  suspend: 'Your account was suspended',
  unsuspend: 'Your suspension was lifted',
  'hide-all': 'Everything you posted was hidden',
  'auto-hide': 'Hidden automatically while moderators review reports',
  'appeal-upheld': 'Your appeal was turned down',
  'appeal-overturned': 'Your appeal succeeded',
};

export function authorActionText(action: Pick<ActionOnMe, 'action' | 'suspendedUntil'>): string {
  const base = AUTHOR_TEXT[action.action];
  if (action.action !== 'suspend') return base;
  return action.suspendedUntil ? `${base} until ${formatDay(action.suspendedUntil)}` : `${base} until further notice`;
}

function AppealStatus({ appeal }: { appeal: MyAppeal }) {
  if (appeal.status === 'open') {
    return (
      <View style={styles.block}>
        <ModerationPill label="Appeal waiting" tone="waiting" />
        <AppText tone="muted">Sent {formatDay(appeal.createdAt)}. A moderator who did not take this action will decide.</AppText>
      </View>
    );
  }
  const stands = appeal.status === 'upheld';
  return (
    <View style={styles.block}>
      <ModerationPill label={stands ? 'Appeal turned down' : 'Appeal succeeded'} tone="settled" />
      <AppText>
        {stands ? 'The decision stands' : 'The decision was reversed'}
        {appeal.decidedAt ? ` (${formatDay(appeal.decidedAt)})` : ''}.{appeal.decisionReason ? ` “${appeal.decisionReason}”` : ''}
      </AppText>
    </View>
  );
}

function AppealPart({ action, onAppeal, startOpen }: ActionOnMeItemProps) {
  const [open, setOpen] = useState(Boolean(startOpen));
  if (action.appeal) return <AppealStatus appeal={action.appeal} />;
  if (!action.canAppeal) {
    return action.cannotAppealReason ? (
      <AppText variant="caption" tone="muted">
        {action.cannotAppealReason}
      </AppText>
    ) : null;
  }
  if (!open) return <Button label="Appeal" variant="secondary" accessibilityLabel={`Appeal: ${authorActionText(action)}`} onPress={() => setOpen(true)} />;
  return <AppealForm onSubmit={onAppeal} appealUntil={action.appealUntil} onCancel={() => setOpen(false)} label="Your appeal" />;
}

/** One moderation action on my content or account: what, on what, why, when, and its appeal. */
export function ActionOnMeItem(props: ActionOnMeItemProps) {
  const { action, first } = props;
  const { colors } = useTheme();
  return (
    <View role="listitem" style={[styles.item, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <AppText style={styles.bold}>{authorActionText(action)}</AppText>
      <AppText variant="caption" tone="muted">
        {formatDay(action.createdAt)}
      </AppText>
      {action.targetPath ? <TextLink href={action.targetPath} label={action.targetLabel} /> : <AppText>{action.targetLabel}</AppText>}
      <AppText>
        <AppText style={styles.bold}>Reason: </AppText>
        {action.reason}
      </AppText>
      <AppealPart {...props} />
    </View>
  );
}

const styles = StyleSheet.create({
  item: { paddingVertical: space.md, gap: space.xs },
  bold: { fontWeight: '700' },
  block: { gap: space.xs },
});
