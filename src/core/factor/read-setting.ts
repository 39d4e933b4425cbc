/**
 * Reading what a person typed for a number or a factor's setting, with one wording for what went
 * wrong. A typed number takes a point or a comma as its decimal mark (a phone's keypad gives the
 * comma in many locales): "3,74" is 3.74; anything else that is not a whole number is refused
 * rather than guessed at ("1,234.5", "1,2,3", "12abc"). A setting then gets the checks the
 * coding already makes (a positive number on a log scale, one of a categorical factor's two
 * levels). Used by the run form, the quick card and the planning form alike; files and the
 * command line read numbers strictly (parseNumber), where a comma separates.
 */
import { InputError } from '../errors.ts';
import type { Setting } from '../study/study.ts';
import { parseNumber } from './coding.ts';
import type { Factor } from './factor.ts';

/**
 * A number as a person types it: parseNumber's forms, or the same with one comma in place of the
 * decimal point; a leading minus sign (U+2212) counts as "-". NaN for anything else.
 * Cost O(length). Example: parseTypedNumber('3,74') -> 3.74; parseTypedNumber('−2') -> -2;
 * parseTypedNumber('1,234.5') -> NaN.
 */
export function parseTypedNumber(text: string): number {
  const s = text.trim().replace(/^\u2212/, '-');
  if (/^[+-]?(\d+,\d*|,\d+)([eE][+-]?\d+)?$/.test(s)) return parseNumber(s.replace(',', '.'));
  return parseNumber(s);
}

/**
 * The number in `text` (surrounding spaces ignored; a comma may be the decimal mark, see parseTypedNumber). `what` names the field in the message.
 * Throws InputError for empty text ("... needs a number, got nothing") or text that is not a
 * number ('... needs a number (digits, with a point or a comma for decimals), got "12,5,1"').
 * Example: readNumber(' 12.5 ', 'Target') -> 12.5; readNumber('12,5', 'Target') -> 12.5; readNumber('1,2,5', 'Target') throws.
 */
export function readNumber(text: string, what: string): number {
  const s = text.trim();
  if (s === '') throw new InputError(`${what} needs a number, got nothing`);
  const x = parseTypedNumber(s);
  if (!Number.isFinite(x)) throw new InputError(`${what} needs a number (digits, with a point or a comma for decimals), got "${s}"`);
  return x;
}

/**
 * A factor's setting in real units from typed text: a numeric factor's number (positive on a log
 * scale, where log(u) must exist; see coding.ts), or a categorical factor's level (case and
 * surrounding spaces ignored, returned spelled as declared). `what` names the field in the
 * message; the factor's name unless given.
 * Throws InputError saying what was needed and what came.
 * Example: readSetting(Powder with levels matte/gloss, ' GLOSS') -> 'gloss';
 * readSetting(Temperature, '185') -> 185; readSetting(Temperature, '18,5') -> 18.5;
 * readSetting(Temperature, '18.5.1', 'Temperature: the actual setting') throws 'Temperature: the
 * actual setting needs a number (digits, with a point or a comma for decimals), got "18.5.1"'.
 */
export function readSetting(f: Factor, text: string, what: string = f.name): Setting {
  if (f.kind === 'categorical') {
    const key = text.trim().toLowerCase();
    const level = f.levels.find((l) => l.toLowerCase() === key);
    if (level === undefined) throw new InputError(`${what} needs "${f.levels[0]}" or "${f.levels[1]}", got "${text.trim()}"`);
    return level;
  }
  const x = readNumber(text, what);
  if (f.scale === 'log' && x <= 0) throw new InputError(`${what} needs a positive number (${f.name} is coded on a log scale), got ${x}`);
  return x;
}
