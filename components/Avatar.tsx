import { StyleSheet, View } from 'react-native';
import { layout, radius, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

export type AvatarProps = {
  displayName: string;
  size?: 'small' | 'large';
};

/**
 * Up to two letters standing for a name: the first letters of its first and last words.
 * Works on whole characters, so names in any script (or with emoji) are never cut in half.
 */
export function initialsFor(displayName: string): string {
  const words = displayName
    .trim()
    .split(/\s+/)
    .filter((w) => /[\p{L}\p{N}]/u.test(w));
  if (words.length === 0) return '?';
  const firstLetter = (word: string) => Array.from(word.replace(/^[^\p{L}\p{N}]+/u, ''))[0] ?? '';
  const letters = words.length === 1 ? firstLetter(words[0]) : firstLetter(words[0]) + firstLetter(words[words.length - 1]);
  return letters.toLocaleUpperCase();
}

/** A round badge with a racer's initials; decorative, since the name is always shown beside it. */
export function Avatar({ displayName, size = 'small' }: AvatarProps) {
  const { colors } = useTheme();
  const side = size === 'large' ? layout.avatarLarge : layout.avatarSmall;
  return (
    <View
      aria-hidden
      testID="avatar"
      style={[styles.circle, { width: side, height: side, backgroundColor: colors.accentSoft, borderColor: colors.accent }]}
    >
      <AppText style={[size === 'large' ? typeScale.title : typeScale.body, styles.letters, { color: colors.accent }]}>
        {initialsFor(displayName)}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  circle: { borderRadius: radius.pill, borderWidth: 1, alignItems: 'center', justifyContent: 'center' },
  letters: { fontWeight: '700' },
});
