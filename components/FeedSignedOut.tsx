import { StyleSheet, View } from 'react-native';
import { signInHref } from '../hooks/auth';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';

/** What the activity feed is for, and the way in, for someone not signed in. */
export function FeedSignedOut() {
  return (
    <Card>
      <AppText variant="heading">Follow racers, see what they change</AppText>
      <AppText tone="muted">
        Sign in to follow racers and see their new setups and every change they make, with the reason they give, and who forks your setups.
      </AppText>
      <View style={styles.actions}>
        <ButtonLink href={signInHref('/activity')} label="Sign in" />
        <ButtonLink href={`/sign-up?next=${encodeURIComponent('/activity')}`} label="Create an account" variant="secondary" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, marginTop: space.sm },
});
