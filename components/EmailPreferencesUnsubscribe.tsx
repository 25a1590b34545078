import { StyleSheet, View } from 'react-native';
import type { UnsubscribeInfo } from '../shared/types/community';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { FormErrorBanner } from './FormErrorBanner';
import { StatusNote } from './StatusNote';
import { TextLink } from './TextLink';

export type EmailPreferencesUnsubscribeProps = {
  info: UnsubscribeInfo;
  onConfirm: () => void;
  pending: boolean;
  /** The server's confirmation once the link was applied. */
  doneMessage: string | null;
  error: string | null;
};

/** What an unsubscribe link will stop, and the one button that stops it. */
export function EmailPreferencesUnsubscribe({ info, onConfirm, pending, doneMessage, error }: EmailPreferencesUnsubscribeProps) {
  const what = info.scope === 'all' ? 'all notification e-mail' : `e-mail about ${info.label.toLowerCase()}`;
  const settings = <TextLink href="/settings" label="Open e-mail settings" />;
  if (doneMessage) {
    return (
      <View style={styles.column}>
        <StatusNote message={doneMessage} />
        {settings}
      </View>
    );
  }
  return (
    <Card style={styles.column}>
      <AppText variant="heading">{info.alreadyOff ? 'Already stopped' : `Stop ${what}?`}</AppText>
      <AppText>
        {info.alreadyOff
          ? `@${info.handle} already gets no ${what}. Nothing more to do here.`
          : `For the Tunefork account @${info.handle}. No sign-in needed; you can turn it back on in Settings.`}
      </AppText>
      {info.alreadyOff ? null : (
        <Button label="Unsubscribe" accessibilityLabel={`Stop ${what}`} onPress={onConfirm} busy={pending} busyLabel="Unsubscribing…" />
      )}
      <FormErrorBanner message={error} />
      {settings}
    </Card>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.md },
});
