import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type FieldMessagesProps = {
  /** Refuses the save; announced as soon as it appears. */
  error?: string;
  /** An unusual value that may be right: shown, never blocking. */
  warning?: string;
  /** The value before this edit, in words, for a field that changed. */
  previous?: string;
  /** The template's help text, when the racer asked for it. */
  help?: string;
};

/** What the racer should know about one field, under its control: problems first. */
export function FieldMessages({ error, warning, previous, help }: FieldMessagesProps) {
  const { colors } = useTheme();
  return (
    <>
      {error ? (
        <View style={[styles.note, { borderColor: colors.danger, backgroundColor: colors.dangerSoft }]}>
          <AppText variant="caption" role="alert" style={{ color: colors.danger }}>
            {error}
          </AppText>
        </View>
      ) : null}
      {warning ? (
        <View style={[styles.note, { borderColor: colors.caution, backgroundColor: colors.cautionSoft }]}>
          <AppText variant="caption" style={{ color: colors.caution }}>
            {warning}
          </AppText>
        </View>
      ) : null}
      {previous !== undefined ? (
        <View style={styles.changedRow}>
          <AppText variant="caption" style={[styles.changed, { backgroundColor: colors.accentSoft, color: colors.accent }]}>
            Changed
          </AppText>
          <AppText variant="caption" tone="muted">
            was {previous}
          </AppText>
        </View>
      ) : null}
      {help ? (
        <AppText variant="caption" tone="muted" style={[styles.help, { borderColor: colors.border }]}>
          {help}
        </AppText>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  note: { borderLeftWidth: space.xs, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: space.xs },
  changedRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  changed: { borderRadius: radius.pill, paddingHorizontal: space.sm, overflow: 'hidden', fontWeight: '700' },
  help: { borderLeftWidth: 2, paddingLeft: space.sm },
});
