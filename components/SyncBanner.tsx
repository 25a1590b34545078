import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';

export type SyncBannerProps = {
  setupId: number;
  /** Fields the original changed that the fork has not looked at. */
  count: number;
  /** False once the fork has taken changes from the original at least once. */
  sinceFork?: boolean;
};

/** For the owner of a fork: the original moved on, and a way to review its changes. */
export function SyncBanner({ setupId, count, sinceFork = true }: SyncBannerProps) {
  const { colors } = useTheme();
  if (count <= 0) return null;
  return (
    <View role="region" aria-label="Changes in the original" style={[styles.banner, { backgroundColor: colors.accentSoft, borderColor: colors.accent }]}>
      <AppText role="status" style={styles.text}>
        The original changed {count} field{count === 1 ? '' : 's'} since you {sinceFork ? 'forked it' : 'last took changes'}
      </AppText>
      <ButtonLink href={`/setups/${setupId}/sync`} label="Review the changes" />
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    borderWidth: 1,
    borderLeftWidth: space.xs,
    borderRadius: radius.md,
    padding: space.md,
    gap: space.sm,
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
  },
  text: { fontWeight: '700', flexShrink: 1 },
});
