/**
 * The guard against CSV injection, and its inverse. A spreadsheet runs a cell as a formula when
 * its text starts with =, +, - or @ (OWASP, "CSV Injection"), also after leading characters it
 * trims: spaces, tabs, line breaks, no-break and other Unicode spaces (category Zs), zero-width
 * spaces and joiners and the byte-order mark, and in East Asian input the full-width forms
 * U+FF1D (＝), U+FF0B (＋), U+FF0D (－) and U+FF20 (＠). Such a cell gets a leading single quote,
 * which spreadsheets show as "this is text"; a cell starting with a tab or carriage return is
 * guarded too, as OWASP lists them.
 *
 * Reading a file back removes the quote again: a cell is guarded exactly when the text after its
 * own leading quotes would be guarded, so "'=x" is written "''=x" and read back "'=x", and
 * unguardCell(guardCell(t)) === t for every text t (a property test says so).
 * Source: OWASP CSV Injection (formula characters); the trimmed characters: Unicode Standard,
 * category Zs and U+200B-U+200D, U+2060, U+FEFF (common practice of spreadsheet trimming).
 */

// Characters a spreadsheet may skip before it looks for a formula sign.
const TRIMMED = /^[\s\u200b-\u200d\u2060\ufeff\u180e]*/;
const FORMULA_SIGN = /^[=+\-@\uff1d\uff0b\uff0d\uff20]/;

/**
 * True when a spreadsheet could run this text as a formula (see the file comment).
 * Example: needsFormulaGuard('\u00a0=1+1') -> true; needsFormulaGuard('matte') -> false.
 */
export function needsFormulaGuard(text: string): boolean {
  // Text starting with an ASCII letter or digit has nothing to skip and no sign (the export's hot path).
  const c = text.charCodeAt(0);
  if ((c >= 0x61 && c <= 0x7a) || (c >= 0x41 && c <= 0x5a) || (c >= 0x30 && c <= 0x39)) return false;
  const own = text.replace(/^'+/, '');
  if (own.startsWith('\t') || own.startsWith('\r')) return true;
  return FORMULA_SIGN.test(own.replace(TRIMMED, ''));
}

/** The text with a leading single quote when it needs one. Example: guardCell(' +1') -> "' +1". */
export function guardCell(text: string): string {
  return needsFormulaGuard(text) ? `'${text}` : text;
}

/**
 * The text as it was before guardCell: one leading quote removed when the rest needs the guard.
 * Example: unguardCell("'=SUM(A1)") -> '=SUM(A1)'; unguardCell("'hello") -> "'hello".
 */
export function unguardCell(text: string): string {
  return text.startsWith("'") && needsFormulaGuard(text.slice(1)) ? text.slice(1) : text;
}
