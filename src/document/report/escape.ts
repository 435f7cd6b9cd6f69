// Text into HTML and SVG: every name in a report comes from a file someone else
// may have written, so nothing reaches the markup unescaped.

const ENTITIES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/**
 * Text safe inside an HTML or SVG element or a quoted attribute: the five markup
 * characters as entities, and control characters (not allowed in XML) as '?'.
 */
export function escapeMarkup(text: string): string {
  // eslint-disable-next-line no-control-regex -- control characters are not allowed in XML text; tab and newline are kept
  const clean = text.replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\ufffe\uffff]/g, '?');
  return clean.replace(/[&<>"']/g, (c) => ENTITIES[c]);
}
