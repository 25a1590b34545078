import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type ModerationPillProps = {
  label: string;
  /** Waiting for someone (caution), settled (success), or just a fact (neutral). */
  tone?: 'waiting' | 'settled' | 'neutral';
};

/** A short state in words ("Open", "Resolved", "Appeal"): colour only backs up what it says. */
export function ModerationPill({ label, tone = 'neutral' }: ModerationPillProps) {
  const { colors } = useTheme();
  const [background, foreground] =
    tone === 'waiting' ? [colors.cautionSoft, colors.caution] : tone === 'settled' ? [colors.successSoft, colors.success] : [colors.surfaceRaised, colors.textMuted];
  return (
    <View style={[styles.pill, { backgroundColor: background, borderColor: foreground }]}>
      <AppText variant="caption" style={[styles.text, { color: foreground }]}>
        {label}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: { alignSelf: 'flex-start', borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2 },
  text: { fontWeight: '700' },
});
