import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type StatusNoteProps = {
  /** Nothing renders while this is null or empty. */
  message: string | null | undefined;
  tone?: 'success' | 'caution';
};

/** Good news or a heads-up after an action ("Saved", "Check your inbox"), read out politely. */
export function StatusNote({ message, tone = 'success' }: StatusNoteProps) {
  const { colors } = useTheme();
  if (!message) return null;
  const [background, foreground] = tone === 'success' ? [colors.successSoft, colors.success] : [colors.cautionSoft, colors.caution];
  return (
    <View style={[styles.note, { backgroundColor: background, borderColor: foreground }]}>
      <AppText role="status" aria-live="polite" style={{ color: foreground }}>
        {message}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  note: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md },
});
