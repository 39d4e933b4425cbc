/**
 * The effects as every report and screen shows them, by one rule: a figure zero up to round-off
 * beside the responses' own scale (the largest |response value| of the runs) is 0
 * (roundoff-zero.ts); and where Lenth's list gives a term another number than the effects table
 * (Lenth judges the saturated fit over the factorial runs only, the table is the model's fit over
 * all runs, so center runs or actual settings off the plan make them differ), both are labelled.
 * Two numbers are one when they differ by round-off only (the same rule on their difference), or
 * when they read the same once written, so the comparison takes the caller's number format. Cost O(terms + runs). Throws nothing.
 * Example: an unreplicated 2^3 fitted exactly gives effects of round-off size (about 1e-16) for
 * the absent terms; effectShown gives 0 for them and lenthTableDifferences gives [].
 */
import type { Analysis } from '../fit/analysis.ts';
import { zeroIfRoundoff } from './roundoff-zero.ts';

/** One term whose effect in Lenth's list differs from its effect in the table, both shown. */
export interface LenthTableDifference {
  readonly letters: string;
  readonly lenth: number;
  readonly table: number;
}

/** The responses' own scale: the largest |response value| of the runs (0 for no runs). */
export function responseScale(a: Pick<Analysis, 'runs'>): number {
  let scale = 0;
  for (const r of a.runs) scale = Math.max(scale, Math.abs(r.y));
  return scale;
}

/** A figure of this analysis as shown: 0 when it is zero up to round-off on the responses' scale. */
export function effectShown(a: Pick<Analysis, 'runs'>, x: number): number {
  return zeroIfRoundoff(x, responseScale(a));
}

/** The terms whose effects in Lenth's list and in the table differ beyond round-off and once written by `format`. */
export function lenthTableDifferences(a: Pick<Analysis, 'runs' | 'terms' | 'lenth'>, format: (x: number) => string): LenthTableDifference[] {
  if (!a.lenth) return [];
  const scale = responseScale(a);
  const table = new Map(a.terms.map((t) => [t.estimates ?? t.letters, zeroIfRoundoff(t.effect, scale)]));
  const out: LenthTableDifference[] = [];
  for (const e of a.lenth.effects) {
    const inTable = table.get(e.letters);
    const lenth = zeroIfRoundoff(e.effect, scale);
    if (inTable !== undefined && zeroIfRoundoff(lenth - inTable, scale) !== 0 && format(inTable) !== format(lenth)) out.push({ letters: e.letters, lenth, table: inTable });
  }
  return out;
}

/** The label where the two lists differ, or null when they agree. */
export function lenthTableText(differences: readonly LenthTableDifference[], format: (x: number) => string): string | null {
  if (differences.length === 0) return null;
  return `Lenth's effects are those of the saturated fit over the factorial runs only; the effects table's are the model's over all runs: ${differences
    .map((d) => `${d.letters} ${format(d.lenth)} (Lenth) and ${format(d.table)} (table)`)
    .join('; ')}`;
}

/** The same label for one term, beside its effect on a screen. */
export function lenthTermText(d: LenthTableDifference, format: (x: number) => string): string {
  return `Lenth's method judged it by ${format(d.lenth)}, its effect in the saturated fit over the factorial runs only; the ${format(d.table)} shown is the model's over all runs`;
}
