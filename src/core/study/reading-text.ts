/**
 * The readings of one response as typed text: repeat readings separated by semicolons or spaces
 * ("10.2;10.4" or "10.2 10.4"). The run form keeps one box per reading in this text, so an empty
 * box stays as an empty part; parseReadings (run-form.ts) skips empty parts when it reads the
 * numbers. One splitter for both, so the boxes and the saved readings always agree.
 */

/** What separates two readings: one semicolon, or a run of white space. */
const SEPARATOR = /;|\s+/;

/**
 * The parts of a readings text, empty parts kept (an empty text is one empty part).
 * Example: splitReadings('10.2;;10.4') -> ['10.2', '', '10.4']; splitReadings('') -> [''].
 */
export function splitReadings(text: string): string[] {
  return text.split(SEPARATOR);
}

/**
 * The readings text of some parts, the inverse of splitReadings for parts without separators.
 * Example: joinReadings(['10.2', '']) -> '10.2;'; joinReadings(['']) -> ''.
 */
export function joinReadings(parts: readonly string[]): string {
  return parts.join(';');
}
