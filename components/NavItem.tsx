import { forwardRef } from 'react';
import { Pressable, StyleSheet, View, type PressableProps } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { NavIcon, type NavIconName } from './NavIcon';

export type NavItemProps = Omit<PressableProps, 'children'> & {
  label: string;
  icon: NavIconName;
  /** Set by expo-router's TabTrigger when this destination is showing. */
  isFocused?: boolean;
  /** Rail (wide screens): icon beside the label. Bar (phones): icon above it. */
  orientation: 'rail' | 'bar';
};

/** One main destination, in the phone tab bar or the wide-screen rail. */
export const NavItem = forwardRef<View, NavItemProps>(function NavItem(
  { label, icon, isFocused, orientation, style: _triggerStyle, ...rest },
  ref,
) {
  const { colors } = useTheme();
  const color = isFocused ? colors.accent : colors.textMuted;
  const rail = orientation === 'rail';
  return (
    <Pressable
      ref={ref}
      role="link"
      aria-label={label}
      aria-current={isFocused ? 'page' : undefined}
      {...rest}
      // The trigger's own layout style is dropped on purpose: this component owns its look.
      style={({ pressed }) => [
        rail ? styles.rail : styles.bar,
        isFocused && rail ? { backgroundColor: colors.accentSoft } : null,
        pressed ? { opacity: 0.8 } : null,
      ]}
    >
      <NavIcon name={icon} color={color} />
      <AppText
        variant="caption"
        style={[styles.label, { color, fontWeight: isFocused ? '700' : '400' }]}
        aria-hidden
      >
        {label}
      </AppText>
      {isFocused && !rail ? <View style={[styles.barMarker, { backgroundColor: colors.accent }]} /> : null}
    </Pressable>
  );
});

const styles = StyleSheet.create({
  bar: {
    flex: 1,
    flexDirection: 'column',
    minHeight: layout.tabBarHeight,
    minWidth: layout.minTouchTarget,
    alignItems: 'center',
    justifyContent: 'center',
    gap: 2,
  },
  rail: {
    flexDirection: 'row',
    justifyContent: 'flex-start',
    alignItems: 'center',
    gap: space.md,
    minHeight: layout.minTouchTarget + 4,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
  },
  label: { textAlign: 'center' },
  barMarker: { position: 'absolute', top: 0, width: 32, height: 3, borderRadius: radius.pill },
});
