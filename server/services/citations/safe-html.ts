import sanitizeHtml from 'sanitize-html';

/**
 * citeproc passes some markup in field values through to its HTML output (CSL's
 * "rich text" micro-formatting), so user-entered titles could carry live HTML.
 * Every formatted citation is cleaned to the tags styles actually produce.
 */
export function safeCitationHtml(html: string): string {
  return sanitizeHtml(html, {
    allowedTags: ['i', 'b', 'em', 'strong', 'sup', 'sub', 'span', 'div', 'a', 'br'],
    allowedAttributes: { span: ['style', 'class'], div: ['class'], a: ['href'] },
    allowedStyles: { span: { 'font-variant': [/^small-caps$/], 'font-style': [/^(normal|italic)$/], 'font-weight': [/^(normal|bold)$/] } },
    allowedSchemes: ['http', 'https'],
    transformTags: { a: sanitizeHtml.simpleTransform('a', { rel: 'nofollow noopener' }) },
  });
}
