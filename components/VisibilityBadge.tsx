import { StyleSheet, View } from 'react-native';
import type { Visibility } from '../shared/types/setups';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type VisibilityBadgeProps = { visibility: Visibility };

const SHORT: Record<Visibility, string> = { private: 'Private', unlisted: 'Unlisted', public: 'Public' };

/** Who can open a setup, at a glance in lists; the words say it so colour is never the only cue. */
export function VisibilityBadge({ visibility }: VisibilityBadgeProps) {
  const { colors } = useTheme();
  const [background, foreground] =
    visibility === 'public'
      ? [colors.accentSoft, colors.accent]
      : visibility === 'unlisted'
        ? [colors.cautionSoft, colors.caution]
        : [colors.surfaceRaised, colors.textMuted];
  return (
    <View style={[styles.badge, { backgroundColor: background, borderColor: foreground }]}>
      <AppText variant="caption" style={[styles.text, { color: foreground }]}>
        {SHORT[visibility]}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { alignSelf: 'flex-start', borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2 },
  text: { fontWeight: '700' },
});
