/**
 * Numbers in CSV cells, for the readers of factor settings, responses and blocks: strict parsing
 * (coding.ts parseNumber), and when a cell is not a number the part of the message that says why
 * and what to do, so that no NaN or Infinity reaches the analysis or a message. A number beyond
 * the largest double (about 1.8e308, IEEE 754 binary64) and the words NaN and Infinity are
 * refused at reading; a decimal comma in a comma-separated file gets a suggestion; a response
 * beyond what the analysis carries (MAX_RESPONSE_MAGNITUDE) is refused with its own message.
 */
import { parseNumber } from '../../core/factor/coding.ts';
import { MAX_RESPONSE_MAGNITUDE } from '../../core/tolerance.ts';

const DECIMAL_COMMA = /^[+-]?(\d+,\d*|,\d+)([eE][+-]?\d+)?$/;
const NOT_A_MEASUREMENT = /^[+-]?(nan|inf|infinity|∞)$/i;

/** The cell as a finite number, or NaN when it is not one (words, decimal commas, 1e400). */
export function cellNumber(text: string): number {
  const x = parseNumber(text);
  return Number.isFinite(x) ? x : Number.NaN;
}

/** True when the text is written as a number but cannot be carried (1e400, NaN, Infinity). */
export function isNonFiniteNumberText(text: string): boolean {
  const s = text.trim();
  const x = parseNumber(s);
  return NOT_A_MEASUREMENT.test(s) || (!Number.isNaN(x) && !Number.isFinite(x));
}

/**
 * Why a cell is not a number, as the end of a message (starting with "; "), or '' when there is
 * nothing more to say than that it is not one. `delimiter` is the file's separator.
 * Example: whyNotANumber('12,5', ',') -> '; a decimal comma is read only in a file separated by ...'.
 */
export function whyNotANumber(text: string, delimiter = ','): string {
  const s = text.trim();
  if (NOT_A_MEASUREMENT.test(s)) return `; "${s}" is not a measurement (in a file, leave the cell empty where there is no value)`;
  const x = parseNumber(s);
  if (!Number.isNaN(x) && !Number.isFinite(x)) return `; ${s} is beyond the largest number a calculation can carry (about 1.8e308): give it in a larger unit`;
  if (DECIMAL_COMMA.test(s)) {
    return delimiter === ';' || delimiter === '\t'
      ? `; a decimal comma is read when every number of its column is written with one, but this column mixes decimal commas and points`
      : `; a decimal comma is read only in a file separated by semicolons or tabs, and this file is separated by "${delimiter}": write ${s.replace(',', '.')}, or save the file with ";" as the separator`;
  }
  return '';
}

/**
 * Why a response value cannot be analyzed although it is a number, as a message part, or '' when
 * it can: a magnitude above MAX_RESPONSE_MAGNITUDE, where effects, intervals and predictions
 * (a few times the largest reading) would leave the range of a double.
 * Example: responseMagnitudeProblem(1e305) -> 'is 1e+305, beyond what the analysis can carry ...'.
 */
export function responseMagnitudeProblem(x: number): string {
  if (Math.abs(x) <= MAX_RESPONSE_MAGNITUDE) return '';
  return `is ${x}, beyond what the analysis can carry (magnitudes up to ${MAX_RESPONSE_MAGNITUDE}, so that effects, intervals and predictions, which reach a few times the largest reading, stay within the range of a number): give the response in a larger unit`;
}
