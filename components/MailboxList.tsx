import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { MailboxMessage } from '../shared/types/auth';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type MailboxListProps = { messages: readonly MailboxMessage[] };

/** Caught mail, newest first: subject, recipient and when it arrived. */
export function MailboxList({ messages }: MailboxListProps) {
  const { colors } = useTheme();
  return (
    <Card style={styles.card}>
      <View role="list">
        {messages.map((message, i) => (
          <View key={message.id} role="listitem">
            <Link href={`/dev/mailbox/${message.id}`} asChild>
              <Pressable
                role="link"
                aria-label={`${message.subject}, to ${message.to}`}
                // Link's asChild takes one flat style object: no arrays, no style functions.
                style={StyleSheet.flatten([styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null])}
              >
                <AppText style={styles.subject}>{message.subject}</AppText>
                <AppText variant="caption" tone="muted">
                  To {message.to} · {new Date(message.receivedAt).toLocaleString()}
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
  row: { minHeight: layout.minTouchTarget, paddingVertical: space.md, gap: 2, justifyContent: 'center' },
  subject: { fontWeight: '700' },
});
