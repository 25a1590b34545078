import { Button } from './Button';

export type FollowButtonProps = {
  handle: string;
  following: boolean;
  /** While the follow or unfollow is on its way. */
  busy?: boolean;
  onPress: () => void;
};

/** "Follow" to start; "Following" once I do, which unfollows when pressed. */
export function FollowButton({ handle, following, busy, onPress }: FollowButtonProps) {
  return (
    <Button
      label={following ? 'Following' : 'Follow'}
      variant={following ? 'secondary' : 'primary'}
      onPress={onPress}
      busy={busy}
      busyLabel={following ? 'Unfollowing…' : 'Following…'}
      accessibilityLabel={following ? `Following @${handle}. Press to unfollow` : `Follow @${handle}`}
    />
  );
}
