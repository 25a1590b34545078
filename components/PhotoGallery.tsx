import type { ReactNode } from 'react';
import { Image, Pressable, StyleSheet, View } from 'react-native';
import { API_BASE } from '../hooks/api';
import type { Photo } from '../shared/types/setups';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type PhotoGalleryProps = {
  photos: Photo[];
  onOpen: (photo: Photo) => void;
  /** The owner's upload control, shown under the thumbnails. */
  uploader?: ReactNode;
};

// Thumbnails are 400 px wide on the server; this is the size they are shown at.
const THUMB = space.xxl * 3;

/** Thumbnails of the setup's photos; pressing one opens it at display size. */
export function PhotoGallery({ photos, onOpen, uploader }: PhotoGalleryProps) {
  const { colors } = useTheme();
  return (
    <Card>
      <AppText variant="heading">Photos</AppText>
      {photos.length === 0 ? (
        <AppText tone="muted">{uploader ? 'No photos yet. Add one of the car as it is set up.' : 'No photos of this setup.'}</AppText>
      ) : (
        <View role="list" style={styles.grid}>
          {photos.map((photo, i) => (
            <View key={photo.id} role="listitem">
              <Pressable
                role="button"
                aria-label={`Open photo ${i + 1}${photo.caption ? `: ${photo.caption}` : ''}`}
                onPress={() => onOpen(photo)}
                style={({ pressed }) => [styles.thumb, { borderColor: colors.border, opacity: pressed ? 0.85 : 1 }]}
              >
                <Image source={{ uri: `${API_BASE}${photo.thumbUrl}` }} alt="" style={styles.image} />
              </Pressable>
            </View>
          ))}
        </View>
      )}
      {uploader}
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  thumb: { width: THUMB, height: THUMB, borderWidth: 1, borderRadius: radius.sm, overflow: 'hidden' },
  image: { width: '100%', height: '100%' },
});
