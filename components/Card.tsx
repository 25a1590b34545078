import type { ReactNode } from 'react';
import { StyleSheet, View, type ViewProps } from 'react-native';
import { radius, space, useTheme } from '../theme';

export type CardProps = ViewProps & { children: ReactNode };

export function Card({ style, children, ...rest }: CardProps) {
  const { colors } = useTheme();
  return (
    <View style={[styles.card, { backgroundColor: colors.surface, borderColor: colors.border }, style]} {...rest}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radius.md, padding: space.lg, gap: space.sm },
});
