import { Text, type TextProps } from 'react-native';
import { type as typeScale, useTheme } from '../theme';

export type AppTextProps = TextProps & {
  variant?: keyof typeof typeScale;
  tone?: 'default' | 'muted' | 'accent' | 'danger' | 'caution' | 'success';
};

/** Text in the shipped font, sized from the type scale and coloured from the theme. */
export function AppText({ variant = 'body', tone = 'default', style, ...rest }: AppTextProps) {
  const { colors } = useTheme();
  const color = {
    default: colors.text,
    muted: colors.textMuted,
    accent: colors.accent,
    danger: colors.danger,
    caution: colors.caution,
    success: colors.success,
  }[tone];
  // Titles are the screen's level-1 heading, headings its sections (level 2), unless told otherwise.
  const heading = variant === 'title' || variant === 'heading';
  return (
    <Text
      role={heading ? 'heading' : undefined}
      aria-level={heading ? (variant === 'title' ? 1 : 2) : undefined}
      style={[typeScale[variant], { color }, style]}
      {...rest}
    />
  );
}
