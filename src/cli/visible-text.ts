/**
 * Text for a terminal with its control characters made visible, so that a name, title or cell
 * from a file or an argument cannot move the cursor, retitle the window, ring the bell or
 * reorder what is shown. Every character of the Unicode category Cc (C0 U+0000-U+001F, DEL
 * U+007F, C1 U+0080-U+009F) except tab and line feed, and the bidirectional embedding, override,
 * isolate and mark characters (Unicode Standard Annex #9, "Explicit Directional Formatting
 * Characters"; the "Trojan Source" paper, Boucher and Anderson 2021), is written as its JSON
 * escape \uXXXX. A carriage return directly before a line feed is kept (CSV line ends).
 * The JSON escape keeps a JSON text's meaning: JSON.stringify already escapes C0 characters, and
 * the others it leaves raw only inside strings, where \uXXXX is the same character (RFC 8259,
 * section 7). So the same function serves reports, messages and --json output.
 * Cost: one pass over the text; the text is returned as it is when nothing needs escaping.
 * Example: visibleText('Title\u001b]0;owned\u0007') -> 'Title\\u001b]0;owned\\u0007'.
 */

// Cc except \t and \n; \r unless it begins a CRLF; ALM; LRM, RLM; LRE..RLO; LRI..PDI.
const HIDDEN = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]|\r(?!\n)/g;

export function visibleText(text: string): string {
  HIDDEN.lastIndex = 0;
  if (!HIDDEN.test(text)) return text;
  return text.replace(HIDDEN, (c) => '\\u' + c.charCodeAt(0).toString(16).padStart(4, '0'));
}
