/**
 * Text inside XML (JUnit) and HTML: the five markup characters escaped, and every
 * character XML 1.0 forbids (C0 controls other than tab, LF and CR; U+FFFE, U+FFFF;
 * lone surrogates) replaced by U+FFFD, since a claim name may hold any JSON escape and
 * a single such character makes the whole document unreadable to a parser.
 */
const ESCAPES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

const FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

export function xmlText(text: string): string {
  return text.replace(FORBIDDEN, '\uFFFD').replace(/[&<>"']/g, (c) => ESCAPES[c]!);
}
