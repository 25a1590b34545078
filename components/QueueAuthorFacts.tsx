import { StyleSheet, View } from 'react-native';
import { ACTION_OUTCOME_TEXT, type QueueItem } from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { RoleBadge } from './RoleBadge';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

export type QueueAuthorFactsProps = {
  author: QueueItem['author'];
  /** The time account age is measured against, in ms since 1970. */
  now: number;
};

const HOUR = 3_600_000;
const HISTORY_SHOWN = 3;

/** "5 hours old", "3 days old", "2 years old": how long the account has existed. */
export function accountAge(createdAt: string, now: number): string {
  const hours = Math.max(0, Math.floor((now - Date.parse(createdAt)) / HOUR));
  if (hours < 48) return `${hours} hour${hours === 1 ? '' : 's'} old`;
  const days = Math.floor(hours / 24);
  if (days < 730) return `${days} days old`;
  return `${Math.floor(days / 365)} years old`;
}

/** Who posted it and what moderators did about them before: context for a fair decision. */
export function QueueAuthorFacts({ author, now }: QueueAuthorFactsProps) {
  const facts = [
    `account ${accountAge(author.createdAt, now)}`,
    author.emailVerified ? 'e-mail verified' : 'e-mail not verified',
    author.suspended ? (author.suspendedUntil ? `suspended until ${formatDay(author.suspendedUntil)}` : 'suspended until lifted') : null,
  ].filter(Boolean);
  const history = author.history.slice(0, HISTORY_SHOWN);
  return (
    <View style={styles.stack}>
      <View style={styles.row}>
        <AppText variant="caption" tone="muted">
          By
        </AppText>
        <TextLink href={`/racers/${author.handle}`} label={`@${author.handle}`} />
        <RoleBadge role={author.role} />
        <AppText variant="caption" tone="muted">
          {facts.join(' · ')}
        </AppText>
      </View>
      {author.history.length === 0 ? (
        <AppText variant="caption" tone="muted">
          No earlier moderation.
        </AppText>
      ) : (
        <View role="list" aria-label={`Earlier moderation of @${author.handle}`}>
          <AppText variant="caption" tone="muted">
            Earlier moderation ({author.history.length}):
          </AppText>
          {history.map((entry) => (
            <AppText key={`${entry.action}-${entry.createdAt}`} role="listitem" variant="caption">
              • {formatDay(entry.createdAt)}: {ACTION_OUTCOME_TEXT[entry.action]} “{entry.reason}”
            </AppText>
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm },
});
