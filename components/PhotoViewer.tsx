import type { ReactNode } from 'react';
import { Image, Modal, ScrollView, StyleSheet, View } from 'react-native';
import { API_BASE } from '../hooks/api';
import type { Photo } from '../shared/types/setups';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { SetupConfirmButton } from './SetupConfirmButton';

export type PhotoViewerProps = {
  photo: Photo | null;
  onClose: () => void;
  /** Only for the owner: removes the photo after a confirm step. */
  onDelete?: () => void;
  deleting?: boolean;
  deleteError?: string | null;
  /** A control to report the photo to moderators, for readers other than the owner. */
  report?: ReactNode;
};

/** One photo at display size over the page, with its caption and, for the owner, a way to remove it. */
export function PhotoViewer({ photo, onClose, onDelete, deleting = false, deleteError, report }: PhotoViewerProps) {
  const { colors } = useTheme();
  return (
    // On web the modal itself is the dialog, so it carries the name.
    <Modal visible={photo !== null} onRequestClose={onClose} animationType="fade" transparent aria-label={photo?.caption || 'Setup photo'}>
      <View style={[styles.backdrop, { backgroundColor: colors.background }]}>
        {photo ? (
          <ScrollView contentContainerStyle={styles.content}>
            <Button label="Close" variant="secondary" onPress={onClose} />
            <Image
              source={{ uri: `${API_BASE}${photo.url}` }}
              alt={photo.caption || 'Setup photo'}
              resizeMode="contain"
              style={[styles.image, { aspectRatio: photo.width / photo.height }]}
            />
            {photo.caption ? <AppText>{photo.caption}</AppText> : null}
            {report}
            {onDelete ? (
              <SetupConfirmButton
                label="Remove this photo"
                question="Remove this photo from the setup? The file is deleted too."
                confirmLabel="Yes, remove it"
                busyLabel="Removing…"
                busy={deleting}
                onConfirm={onDelete}
              />
            ) : null}
            {deleteError ? (
              <AppText tone="danger" role="alert">
                {deleteError}
              </AppText>
            ) : null}
          </ScrollView>
        ) : null}
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1 },
  content: { padding: space.lg, gap: space.md, alignItems: 'center', width: '100%', maxWidth: layout.contentMaxWidth * 1.5, alignSelf: 'center' },
  image: { width: '100%' },
});
