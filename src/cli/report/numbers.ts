/** Number formatting for the plain-text reports: 4 significant digits, null as a dash (core/text/number-text.ts). */
import { shortNumber } from '../../core/text/number-text.ts';

export function num(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined) return '-';
  return shortNumber(x, digits);
}
/** Left-aligned first column, right-aligned others. */
export function table(header: string[], rows: string[][]): string {
  const w = header.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (r: string[]) => r.map((cell, c) => (c === 0 ? cell.padEnd(w[c]) : cell.padStart(w[c]))).join('  ').trimEnd();
  return [line(header), ...rows.map(line)].join('\n');
}
