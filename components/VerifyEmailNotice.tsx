import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';

export type VerifyEmailNoticeProps = {
  /** The address waiting for its link to be clicked. */
  email: string;
  onResend: () => void;
  pending: boolean;
  /** The server's answer once a fresh link went out. */
  sentMessage?: string | null;
  error?: string | null;
};

/** A reminder that an address is not confirmed yet, with a way to get the link again. */
export function VerifyEmailNotice({ email, onResend, pending, sentMessage, error }: VerifyEmailNoticeProps) {
  const { colors } = useTheme();
  return (
    <View style={[styles.notice, { backgroundColor: colors.cautionSoft, borderColor: colors.caution }]}>
      <AppText style={[styles.heading, { color: colors.caution }]}>Confirm your e-mail address</AppText>
      <AppText style={{ color: colors.caution }}>
        We mailed a link to {email}. Open it to show the address is yours.
      </AppText>
      {sentMessage ? (
        <AppText role="status" aria-live="polite" style={{ color: colors.caution }}>
          {sentMessage}
        </AppText>
      ) : null}
      <FormErrorBanner message={error} />
      <Button label="Send the link again" busyLabel="Sending…" busy={pending} variant="secondary" onPress={onResend} />
    </View>
  );
}

const styles = StyleSheet.create({
  notice: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.lg, gap: space.sm },
  heading: { fontWeight: '700' },
});
