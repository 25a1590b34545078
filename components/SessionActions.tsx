import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';

export type SessionActionsProps = {
  onSignOut: () => void;
  onSignOutEverywhere: () => void;
  signingOut: boolean;
  signingOutEverywhere: boolean;
  error?: string | null;
};

/** Leaving this device, or every device at once after a second, deliberate press. */
export function SessionActions(props: SessionActionsProps) {
  const { onSignOut, onSignOutEverywhere, signingOut, signingOutEverywhere, error } = props;
  const [confirming, setConfirming] = useState(false);
  return (
    <View style={styles.block}>
      <FormErrorBanner message={error} />
      <Button label="Sign out" busyLabel="Signing out…" busy={signingOut} variant="secondary" onPress={onSignOut} />
      {confirming ? (
        <View style={styles.confirm}>
          <AppText>
            This signs you out on every phone and computer, this one included. Use it if you lost a device or signed in
            somewhere public.
          </AppText>
          <View style={styles.row}>
            <Button
              label="Yes, sign out everywhere"
              busyLabel="Signing out everywhere…"
              busy={signingOutEverywhere}
              variant="danger"
              onPress={onSignOutEverywhere}
            />
            <Button label="Keep me signed in" variant="secondary" onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : (
        <Button label="Sign out everywhere…" variant="danger" onPress={() => setConfirming(true)} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md },
  confirm: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
