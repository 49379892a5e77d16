import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';

/**
 * Markdown commentary → HTML safe to insert: raw HTML in the Markdown is stripped, only
 * basic block and inline tags survive, links keep http(s)/mailto targets and get
 * rel="nofollow noopener" (contributor-written links are not endorsements).
 */
const options: sanitizeHtml.IOptions = {
  allowedTags: ['p', 'br', 'em', 'strong', 'i', 'b', 'code', 'pre', 'blockquote', 'ul', 'ol', 'li', 'a', 'h3', 'h4', 'h5', 'h6', 'hr', 'sup', 'sub', 'del'],
  allowedAttributes: { a: ['href', 'rel'] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  transformTags: {
    a: (tagName, attribs) => ({ tagName, attribs: { ...(attribs.href ? { href: attribs.href } : {}), rel: 'nofollow noopener' } }),
    // Headings inside a commentary sit below the page's own h1/h2.
    h1: 'h3',
    h2: 'h4',
  },
};

export function renderCommentary(markdown: string | null): string | null {
  if (!markdown) return null;
  const html = marked.parse(markdown, { async: false, gfm: true, breaks: false });
  return sanitizeHtml(html, options);
}
