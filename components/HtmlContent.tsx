import { useEffect, useRef } from 'react';
import { Platform, View } from 'react-native';
import { fonts, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

export type HtmlContentProps = {
  /** HTML the server rendered from markdown and sanitized; never pass anything else. */
  html: string;
};

/** The words of an HTML fragment, for platforms that cannot show the markup. */
export function htmlToPlainText(html: string): string {
  return html
    .replace(/<\/(p|div|li|h[1-6])>|<br\s*\/?>/gi, '\n')
    .replace(/<[^>]*>/g, '')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}

/**
 * Server-cleaned HTML (a racer's bio). On web the markup goes into a DOM node as is, which is
 * safe only because the server sanitizes it; elsewhere the plain words are shown.
 */
export function HtmlContent({ html }: HtmlContentProps) {
  const { colors } = useTheme();
  const ref = useRef<View>(null);
  useEffect(() => {
    if (Platform.OS !== 'web' || !ref.current) return;
    // On web a View's ref is its DOM node.
    const node = ref.current as unknown as HTMLElement;
    node.innerHTML = html;
    // The markup carries no styles of its own; give it the theme's font and colours.
    Object.assign(node.style, {
      color: colors.text,
      fontFamily: fonts.regular,
      fontSize: `${typeScale.body.fontSize}px`,
      lineHeight: `${typeScale.body.lineHeight}px`,
      overflowWrap: 'anywhere',
    });
    node.querySelectorAll('a').forEach((a) => {
      a.style.color = colors.accent;
    });
  }, [html, colors]);
  if (Platform.OS !== 'web') return <AppText>{htmlToPlainText(html)}</AppText>;
  return <View ref={ref} testID="html-content" />;
}
