import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

const LINK_REL = 'nofollow ugc noopener';

/** Only formatting that reads well in a bio, note or comment; nothing that runs or embeds. */
const SANITIZE_OPTIONS: sanitizeHtml.IOptions = {
  allowedTags: ['p', 'br', 'strong', 'em', 'del', 'code', 'pre', 'blockquote', 'ul', 'ol', 'li', 'a', 'h3', 'h4', 'hr'],
  allowedAttributes: { a: ['href', 'title', 'rel'] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  transformTags: {
    // Page and section headings belong to the app; a note's headings sit below them.
    h1: 'h3',
    h2: 'h3',
    h5: 'h4',
    h6: 'h4',
    // Only absolute web and mail links survive: a relative or odd href in racer content is never
    // what the author meant and could be read differently by different browsers.
    a: (tagName, attribs) => {
      const { href, ...rest } = attribs;
      const safe = typeof href === 'string' && /^(https?:\/\/|mailto:)/i.test(href);
      return { tagName, attribs: safe ? { ...rest, href, rel: LINK_REL } : { ...rest, rel: LINK_REL } };
    },
  },
};

/** Renders racer-written markdown to HTML that is safe to insert into a page. */
export function renderMarkdown(markdown: string): string {
  if (markdown === '') return '';
  const known = rendered.get(markdown);
  if (known !== undefined) {
    // Most recently used goes to the back; the front is dropped first.
    rendered.delete(markdown);
    rendered.set(markdown, known);
    return known;
  }
  const html = sanitizeHtml(marked.parse(markdown, { async: false, gfm: true, breaks: true }), SANITIZE_OPTIONS);
  if (markdown.length <= MEMO_MAX_INPUT) {
    rendered.set(markdown, html);
    if (rendered.size > MEMO_ENTRIES) rendered.delete(rendered.keys().next().value!);
  }
  return html;
}

/*
 * Rendering is a pure function of the text, and a popular setup's notes are rendered on every view
 * (parse plus sanitize costs about a millisecond), so recent results are kept: at most
 * MEMO_ENTRIES texts of up to MEMO_MAX_INPUT characters, least recently used dropped first. Only a
 * speed-up: every server renders the same HTML from the same text, memo or not.
 */
const MEMO_ENTRIES = 2_000;
const MEMO_MAX_INPUT = 8_000;
const rendered = new Map<string, string>();

/** Counts links a piece of markdown will render, for spam limits. */
export function countRenderedLinks(markdown: string): number {
  return (renderMarkdown(markdown).match(/<a\s/g) ?? []).length;
}
