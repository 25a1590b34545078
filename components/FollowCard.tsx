import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import type { FollowStatus } from '../shared/types/community';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { FollowButton } from './FollowButton';
import { FormErrorBanner } from './FormErrorBanner';

export type FollowListChoice = 'followers' | 'following';

export type FollowCardProps = {
  status: FollowStatus;
  /** While a follow or unfollow is on its way. */
  busy: boolean;
  /** Why the last follow or unfollow failed. */
  error: string | null;
  onFollowChange: (follow: boolean) => void;
  /** Where to sign in, when nobody is signed in; null otherwise. */
  signInHref: string | null;
  /** The list shown below the counts, if any. */
  shown: FollowListChoice | null;
  onShow: (which: FollowListChoice | null) => void;
  /** The shown list. */
  children?: ReactNode;
};

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function CountToggle({ label, expanded, onPress }: { label: string; expanded: boolean; onPress: () => void }) {
  const { colors } = useTheme();
  return (
    <Pressable
      role="button"
      aria-expanded={expanded}
      aria-label={`${label}: ${expanded ? 'hide the list' : 'show the list'}`}
      onPress={onPress}
      style={[styles.toggle, { borderColor: expanded ? colors.accent : colors.border, backgroundColor: expanded ? colors.accentSoft : colors.surface }]}
    >
      <AppText style={styles.toggleText}>{label}</AppText>
    </Pressable>
  );
}

/** A profile's follower and following counts, each opening its list, and the Follow button. */
export function FollowCard({ status, busy, error, onFollowChange, signInHref, shown, onShow, children }: FollowCardProps) {
  const toggle = (which: FollowListChoice) => onShow(shown === which ? null : which);
  return (
    <Card>
      <View style={styles.row}>
        <CountToggle label={plural(status.followerCount, 'follower', 'followers')} expanded={shown === 'followers'} onPress={() => toggle('followers')} />
        <CountToggle label={`${status.followingCount} following`} expanded={shown === 'following'} onPress={() => toggle('following')} />
        {status.canFollow ? (
          <FollowButton handle={status.handle} following={Boolean(status.followedByMe)} busy={busy} onPress={() => onFollowChange(!status.followedByMe)} />
        ) : null}
        {signInHref ? <ButtonLink href={signInHref} label="Sign in to follow" variant="secondary" /> : null}
      </View>
      {error ? <FormErrorBanner message={error} /> : null}
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  toggle: { minHeight: layout.minTouchTarget, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 1 },
  toggleText: { fontWeight: '700' },
});
