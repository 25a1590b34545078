import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';

export type LoadingStateProps = { label: string };

/** A spinner with words, announced politely to screen readers. */
export function LoadingState({ label }: LoadingStateProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.row} role="status" aria-live="polite">
      {/* The words beside it say what is loading; the spinner itself is decoration. */}
      <ActivityIndicator color={colors.accent} aria-hidden />
      <AppText tone="muted">{label}</AppText>
    </View>
  );
}

export type ErrorStateProps = { title: string; message: string; onRetry?: () => void };

/** What went wrong in words a racer can act on, and a retry. */
export function ErrorState({ title, message, onRetry }: ErrorStateProps) {
  return (
    <Card role="alert">
      <AppText variant="heading" tone="danger">
        {title}
      </AppText>
      <AppText>{message}</AppText>
      {onRetry ? <Button label="Try again" onPress={onRetry} variant="secondary" /> : null}
    </Card>
  );
}

export type EmptyStateProps = { title: string; message: string; actionLabel?: string; onAction?: () => void };

/** An empty list says what will be here and what to do next. */
export function EmptyState({ title, message, actionLabel, onAction }: EmptyStateProps) {
  return (
    <Card>
      <AppText variant="heading">{title}</AppText>
      <AppText tone="muted">{message}</AppText>
      {actionLabel && onAction ? <Button label={actionLabel} onPress={onAction} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.md },
});
