import { Image, StyleSheet, View } from 'react-native';
import { API_BASE } from '../hooks/api';
import type { QueueItem } from '../shared/types/moderation';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { HtmlContent } from './HtmlContent';
import { TextLink } from './TextLink';

export type QueueContentPreviewProps = { content: QueueItem['content'] };

// Long spam is cut off here; the link opens all of it.
const PREVIEW_MAX_HEIGHT = layout.minTouchTarget * 4;
const THUMB_SIZE = layout.avatarLarge * 2;

/** The reported thing itself, inline, so most decisions need no extra page. */
export function QueueContentPreview({ content }: QueueContentPreviewProps) {
  const { colors } = useTheme();
  return (
    <View style={[styles.box, { borderColor: colors.border, backgroundColor: colors.surfaceRaised }]}>
      {content.path ? <TextLink href={content.path} label={content.title} /> : <AppText style={styles.bold}>{content.title}</AppText>}
      {content.imageUrl ? (
        <Image source={{ uri: `${API_BASE}${content.imageUrl}` }} alt={`Reported photo in ${content.title}`} style={[styles.thumb, { borderColor: colors.border }]} />
      ) : null}
      {content.bodyHtml.trim() ? (
        <View style={styles.body}>
          <HtmlContent html={content.bodyHtml} />
        </View>
      ) : (
        <AppText tone="muted">No text.</AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.sm },
  bold: { fontWeight: '700' },
  body: { maxHeight: PREVIEW_MAX_HEIGHT, overflow: 'hidden' },
  thumb: { width: THUMB_SIZE, height: THUMB_SIZE, borderRadius: radius.sm, borderWidth: 1 },
});
