/** Small helpers for e-mail text: no header injection, no markup injection. */

/**
 * A header value on one line. The schemas already refuse CR/LF in names and labels; this is the
 * second line of defence for anything that reaches a header (subject, display names).
 */
export function headerSafe(value: string, max = 200): string {
  return value
    .replace(/[\r\n\t\u2028\u2029]+/g, ' ')
    .replace(/\s{2,}/g, ' ')
    .trim()
    .slice(0, max);
}

const HTML_ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => HTML_ESCAPES[c]!);
}
