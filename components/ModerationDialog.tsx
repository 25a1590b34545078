import type { ReactNode } from 'react';
import { Modal, ScrollView, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type ModerationDialogProps = {
  visible: boolean;
  /** The dialog's heading and accessible name. */
  title: string;
  onClose: () => void;
  children: ReactNode;
};

/** A centred sheet over the page for a short form (a report, an appeal); Escape or back closes it. */
export function ModerationDialog({ visible, title, onClose, children }: ModerationDialogProps) {
  const { colors } = useTheme();
  return (
    <Modal visible={visible} onRequestClose={onClose} animationType="fade" transparent aria-label={title}>
      <View style={[styles.backdrop, { backgroundColor: colors.background }]}>
        <ScrollView contentContainerStyle={styles.scroll} keyboardShouldPersistTaps="handled">
          <View role="dialog" aria-label={title} style={[styles.sheet, { backgroundColor: colors.surface, borderColor: colors.border }]}>
            <AppText variant="heading">{title}</AppText>
            {children}
          </View>
        </ScrollView>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1 },
  scroll: { flexGrow: 1, justifyContent: 'center', padding: space.lg },
  sheet: {
    width: '100%',
    maxWidth: layout.contentMaxWidth,
    alignSelf: 'center',
    borderWidth: 1,
    borderRadius: radius.lg,
    padding: space.lg,
    gap: space.md,
  },
});
