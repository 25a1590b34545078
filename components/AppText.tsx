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
  const role = variant === 'title' || variant === 'heading' ? 'heading' : undefined;
  return <Text role={role} style={[typeScale[variant], { color }, style]} {...rest} />;
}
