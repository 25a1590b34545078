import { StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { HtmlContent } from './HtmlContent';
import { ErrorState, LoadingState } from './StatusViews';

export type NotesPreviewState = {
  /** The markdown the shown (or pending) preview was made from. */
  markdown?: string;
  /** The server's cleaned HTML for `markdown`. */
  html?: string;
  pending: boolean;
  error: string | null;
};

export type NotesEditorPreviewProps = {
  markdown: string;
  preview: NotesPreviewState;
  onRetry: () => void;
};

/** The notes as readers will see them: only ever the server's cleaned HTML, never the raw markdown. */
export function NotesEditorPreview({ markdown, preview, onRetry }: NotesEditorPreviewProps) {
  const { colors } = useTheme();
  let body;
  if (markdown.trim() === '') body = <AppText tone="muted">Nothing to preview yet: write some notes first.</AppText>;
  else if (preview.pending) body = <LoadingState label="Rendering the preview…" />;
  else if (preview.error) body = <ErrorState title="The preview could not load" message={preview.error} onRetry={onRetry} />;
  else if (preview.markdown === markdown && preview.html !== undefined) body = <HtmlContent html={preview.html} />;
  else body = <LoadingState label="Rendering the preview…" />;
  return (
    <View
      role="region"
      aria-label="Notes preview"
      style={[styles.pane, { borderColor: colors.border, backgroundColor: colors.surface }]}
    >
      {body}
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { minHeight: layout.minTouchTarget * 3, borderWidth: 1, borderRadius: radius.md, padding: space.md },
});
