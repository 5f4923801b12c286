// Teaching notes: Markdown written by a teacher, shown to students as sanitized HTML.
// marked turns Markdown into HTML (raw HTML in the source passes through it), so sanitize-html then keeps only
// a small set of text tags and http(s)/mailto links; scripts, styles, iframes, images and event handlers go.
import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

const ALLOWED: sanitizeHtml.IOptions = {
  allowedTags: ['p', 'br', 'strong', 'em', 'ul', 'ol', 'li', 'blockquote', 'code', 'pre', 'h2', 'h3', 'h4', 'hr', 'a', 'table', 'thead', 'tbody', 'tr', 'th', 'td'],
  allowedAttributes: { a: ['href', 'title', 'rel'] },
  allowedSchemes: ['http', 'https', 'mailto'],
  transformTags: { a: sanitizeHtml.simpleTransform('a', { rel: 'noopener noreferrer nofollow' }), h1: 'h2' },
};

export function renderNotes(markdown: string): string {
  const html = marked.parse(markdown, { async: false, gfm: true, breaks: false });
  return sanitizeHtml(html, ALLOWED);
}
