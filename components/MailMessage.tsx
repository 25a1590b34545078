import { Linking, Platform, Pressable, StyleSheet, View } from 'react-native';
import type { MailboxMessage } from '../shared/types/auth';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type MailMessageProps = {
  message: MailboxMessage;
  /** The web addresses found in the text part, in order. */
  links: readonly string[];
};

function openLink(url: string) {
  // Same tab on web, so a verification link lands in this app with this session.
  if (Platform.OS === 'web') window.location.assign(url);
  else void Linking.openURL(url);
}

/** One caught mail: its headers, its text, and its links as things you can press. */
export function MailMessage({ message, links }: MailMessageProps) {
  const { colors } = useTheme();
  return (
    <>
      <Card>
        <AppText variant="heading">{message.subject}</AppText>
        <AppText variant="caption" tone="muted">
          To {message.to} · {new Date(message.receivedAt).toLocaleString()}
        </AppText>
      </Card>
      {links.length > 0 ? (
        <Card>
          <AppText variant="heading">Links in this mail</AppText>
          <View role="list" style={styles.links}>
            {links.map((url) => (
              <View key={url} role="listitem">
                <Pressable role="link" aria-label={`Open ${url}`} onPress={() => openLink(url)} style={styles.link}>
                  <AppText tone="accent" style={styles.linkText}>
                    {url}
                  </AppText>
                </Pressable>
              </View>
            ))}
          </View>
        </Card>
      ) : null}
      <Card>
        <AppText variant="heading">Text</AppText>
        <AppText selectable style={[styles.body, { borderColor: colors.border }]}>
          {message.text}
        </AppText>
      </Card>
    </>
  );
}

const styles = StyleSheet.create({
  links: { gap: space.xs },
  link: { minHeight: layout.minTouchTarget, justifyContent: 'center' },
  linkText: { textDecorationLine: 'underline' },
  body: { borderLeftWidth: 2, paddingLeft: space.md },
});
