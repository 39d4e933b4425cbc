/**
 * The sentences about a response's lower bound on the Effects screen: what the bound means for
 * the scales offered, and the Box-Cox suggestion said of the response minus its bound (the
 * transforms work on y - L; fit/response-transform.ts, fit/box-cox.ts).
 * Cost O(1). Example: boundNote('Roughness', 0) -> 'Roughness cannot be negative: the Log, Square
 * root and Inverse scales keep every prediction above 0; as measured, a prediction may go below it.'
 */
import { shortNumber } from './number-text.ts';

/** What the bound means for the scales the screen offers. */
export function boundNote(response: string, bound: number): string {
  const head = bound === 0 ? `${response} cannot be negative` : `${response} cannot go below ${shortNumber(bound)}`;
  return `${head}: the Log, Square root and Inverse scales keep every prediction above ${shortNumber(bound)}; as measured, a prediction may go below it.`;
}

/**
 * The same note in the command line's words: its scales are --transform tokens.
 * Example: boundNoteCommand('Roughness', 0) -> 'Roughness cannot be negative: --transform log, sqrt
 * and inverse keep every prediction above 0; without a transform, a prediction may go below it.'
 */
export function boundNoteCommand(response: string, bound: number): string {
  const head = bound === 0 ? `${response} cannot be negative` : `${response} cannot go below ${shortNumber(bound)}`;
  return `${head}: --transform log, sqrt and inverse keep every prediction above ${shortNumber(bound)}; without a transform, a prediction may go below it.`;
}

/** The Box-Cox line: its suggestion as a scale name, said of the response minus its bound when that is not 0 (minus 0 says nothing). */
export function boxCoxText(suggestion: string, response: string, bound: number | null): string {
  const names: Record<string, string> = { none: 'as measured', log: 'Log', sqrt: 'Square root', inverse: 'Inverse' };
  const scale = names[suggestion] ?? suggestion;
  return bound === null || bound === 0 ? `Box-Cox suggests: ${scale}` : `Box-Cox suggests: ${scale} (for ${response} minus its lowest value ${shortNumber(bound)})`;
}
