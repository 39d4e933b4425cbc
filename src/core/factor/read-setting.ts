/**
 * Reading what a person typed for a number or a factor's setting, with one wording for what went
 * wrong. Numbers are read strictly with a point for decimals (parseNumber: "12,5" and "12abc" are
 * refused rather than guessed at); a setting then gets the checks the coding already makes (a
 * positive number on a log scale, one of a categorical factor's two levels). Used by the run
 * form, the quick card and the planning form alike.
 */
import { InputError } from '../errors.ts';
import type { Setting } from '../study/study.ts';
import { parseNumber } from './coding.ts';
import type { Factor } from './factor.ts';

/**
 * The number in `text` (surrounding spaces ignored). `what` names the field in the message.
 * Throws InputError for empty text ("... needs a number, got nothing") or text that is not a
 * number ("... needs a number (use a point for decimals), got "12,5"").
 * Example: readNumber(' 12.5 ', 'Target') -> 12.5; readNumber('12,5', 'Target') throws.
 */
export function readNumber(text: string, what: string): number {
  const s = text.trim();
  if (s === '') throw new InputError(`${what} needs a number, got nothing`);
  const x = parseNumber(s);
  if (!Number.isFinite(x)) throw new InputError(`${what} needs a number (use a point for decimals), got "${s}"`);
  return x;
}

/**
 * A factor's setting in real units from typed text: a numeric factor's number (positive on a log
 * scale, where log(u) must exist; see coding.ts), or a categorical factor's level (case and
 * surrounding spaces ignored, returned spelled as declared). `what` names the field in the
 * message; the factor's name unless given.
 * Throws InputError saying what was needed and what came.
 * Example: readSetting(Powder with levels matte/gloss, ' GLOSS') -> 'gloss';
 * readSetting(Temperature, '185') -> 185; readSetting(Temperature, '18,5', 'Temperature: the
 * actual setting') throws 'Temperature: the actual setting needs a number (use a point for
 * decimals), got "18,5"'.
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
