/**
 * Escaping for the design-review note. Every string that can come from the user (title,
 * field values, material names of an inline material, supplier text) passes through one of
 * these before it is written into HTML, SVG or Markdown.
 */

const HTML: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Text for HTML or SVG element content and attribute values (quotes included). */
export function escapeHtml(s: unknown): string {
  return String(s).replace(/[&<>"']/g, (ch) => HTML[ch]!);
}

/**
 * Text for a Markdown paragraph or table cell: HTML-special characters as entities (viewers
 * pass raw HTML through), Markdown punctuation backslash-escaped so a title cannot turn into
 * emphasis, a link, a strike-through or a code span (the characters that open those are
 * backslash-escaped: \ ` * _ [ ] ~), pipes escaped (table cells) and line breaks folded.
 */
export function escapeMd(s: unknown): string {
  return String(s)
    .replace(/[&<>]/g, (ch) => HTML[ch]!)
    .replace(/([\\`*_[\]|~])/g, '\\$1')
    .replace(/\r?\n/g, ' ');
}
