import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';

export type ForkSignInPromptProps = {
  /** The sign-in and sign-up addresses, both bringing the racer back to the fork screen. */
  signInHref: string;
  signUpHref: string;
};

/** Why an account is needed to start from a setup, and the way back here after signing in. */
export function ForkSignInPrompt({ signInHref, signUpHref }: ForkSignInPromptProps) {
  return (
    <Card role="region" aria-label="Sign in to start from this setup">
      <AppText variant="heading">Sign in to start from this setup</AppText>
      <AppText>
        Your copy goes into your garage, on your car, so you can tune from it and keep your own history of changes. You come
        straight back here after signing in.
      </AppText>
      <View style={styles.row}>
        <ButtonLink href={signInHref} label="Sign in" />
        <ButtonLink href={signUpHref} label="Create an account" variant="secondary" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
