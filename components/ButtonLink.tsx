import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { pillStyles, useTheme } from '../theme';
import { AppText } from './AppText';

export type ButtonLinkProps = { href: Href; label: string; variant?: 'primary' | 'secondary' };

/** Looks like a button, behaves like a link: it goes somewhere rather than doing something. */
export function ButtonLink({ href, label, variant = 'primary' }: ButtonLinkProps) {
  const { colors } = useTheme();
  const filled = variant === 'primary';
  return (
    <Link href={href} asChild>
      <Pressable
        role="link"
        aria-label={label}
        // Link's asChild takes one flat style object: no arrays, no style functions.
        style={StyleSheet.flatten([styles.button, { backgroundColor: filled ? colors.accent : colors.surface, borderColor: colors.accent }])}
      >
        <AppText style={[styles.label, { color: filled ? colors.accentText : colors.accent }]}>{label}</AppText>
      </Pressable>
    </Link>
  );
}

const styles = pillStyles;
