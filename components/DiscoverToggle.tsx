import { Pressable } from 'react-native';
import { pillStyles, useTheme } from '../theme';
import { AppText } from './AppText';

export type DiscoverToggleProps = {
  label: string;
  open: boolean;
  onToggle: () => void;
  /** Spoken instead of the label, e.g. with how many filters are on. */
  accessibilityLabel?: string;
};

/** A button that shows or hides a panel below it, and says which it will do. */
export function DiscoverToggle({ label, open, onToggle, accessibilityLabel }: DiscoverToggleProps) {
  const { colors } = useTheme();
  return (
    <Pressable
      role="button"
      aria-expanded={open}
      aria-label={accessibilityLabel ?? label}
      onPress={onToggle}
      style={({ pressed }) => [pillStyles.button, { backgroundColor: colors.surface, borderColor: colors.accent, opacity: pressed ? 0.85 : 1 }]}
    >
      <AppText style={[pillStyles.label, { color: colors.accent }]}>
        {open ? '▾ ' : '▸ '}
        {label}
      </AppText>
    </Pressable>
  );
}
