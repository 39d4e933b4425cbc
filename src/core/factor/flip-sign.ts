/**
 * The sign of a number as a person is typing it, for a "+/−" button beside a number field: a
 * phone's decimal keypad often has no minus key. Only the leading sign changes; the rest of the
 * text stays exactly as typed (a decimal comma stays a comma, a half-typed "3," stays so), so
 * the field's own reading (read-setting.ts) still decides whether it is a number.
 */

/** A leading minus: the keyboard's hyphen-minus or the typographic minus sign U+2212 (read-setting.ts accepts both). */
const MINUS = /^[-\u2212]/;

/**
 * Whether typed text starts with a minus sign (leading spaces ignored), i.e. whether the number
 * being typed is negative. Common practice. Cost O(length).
 * Example: isNegativeText('-3,74') -> true; isNegativeText('\u22122') -> true; isNegativeText('3') -> false.
 */
export function isNegativeText(text: string): boolean {
  return MINUS.test(text.trimStart());
}

/**
 * Flips the sign of typed text: a leading minus (either kind) is removed, a leading "+" becomes
 * "-", otherwise "-" is put in front. Leading spaces are dropped; nothing else changes, and the
 * text is not checked (empty text gives "-", ready for the digits). Never throws.
 * Cost O(length). Examples: flipSign('3,74') -> '-3,74'; flipSign('-3') -> '3';
 * flipSign('\u22122') -> '2'; flipSign('') -> '-'; flipSign('+1e-3') -> '-1e-3'.
 */
export function flipSign(text: string): string {
  const s = text.trimStart();
  if (MINUS.test(s)) return s.slice(1);
  if (s.startsWith('+')) return `-${s.slice(1)}`;
  return `-${s}`;
}
