import { StyleSheet, View } from 'react-native';
import { signInHref } from '../hooks/auth';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';

/** What the garage is for, and the way in, for someone not signed in. */
export function GarageSignedOut() {
  return (
    <Card>
      <AppText variant="heading">Your cars and their sheets live here</AppText>
      <AppText tone="muted">
        Sign in to add your cars, start a setup from the kit’s stock sheet and keep a note of every change you make at the
        track.
      </AppText>
      <View style={styles.actions}>
        <ButtonLink href={signInHref('/garage')} label="Sign in" />
        <ButtonLink href={`/sign-up?next=${encodeURIComponent('/garage')}`} label="Create an account" variant="secondary" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, marginTop: space.sm },
});
