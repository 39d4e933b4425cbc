/**
 * The screening step of the analysis, for runs from a Plackett-Burman plan (data.screening):
 * the default model of main effects only, the design's N - 1 orthogonal contrast columns over the
 * runs (factors first, then the unused columns) for Lenth's method, and the largest correlation
 * of a main effect with a two-factor interaction for the partial-aliasing verdict. Main effects
 * by default because the interactions are only partly aliased with them and a few of them would
 * make the main effects less precise, not clearer (common practice for screening; Plackett and
 * Burman 1946, Biometrika 33, 305-325; Lenth 1989, Technometrics 31, 469-473, section 2).
 * Cost O(N n) for N columns and n runs, plus O(k^3 N) for the correlations.
 * Example: a 12-run plan with 5 factors -> terms A..E, 11 contrast columns, largest correlation 1/3.
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { plackettBurmanAliasing, plackettBurmanTable } from '../design/plackett-burman.ts';
import { termLetters, termName, type Term } from '../model/term.ts';
import type { ResponseData } from '../study/response-data.ts';

export interface ScreeningStep {
  readonly terms: Term[];
  readonly contrasts: { readonly columns: number[][]; readonly labels: { readonly name: string; readonly letters: string }[] };
  /** Null with fewer than 3 factors (no interaction of two other factors). */
  readonly partialAliasing: { readonly runs: number; readonly largestCorrelation: number } | null;
}

/** The label of an unused column j (from 0) of a screening design, as reports and charts show it. */
export function unusedColumnLabel(j: number): { name: string; letters: string } {
  return { name: `Unused column ${j + 1}`, letters: `col${j + 1}` };
}

/**
 * The screening step for the data, or null when the runs do not come from a Plackett-Burman plan.
 * Throws InputError when the plan's run count is not 12, 20 or 24, it has more factors than
 * columns, or a row's standard-order index lies outside the table or does not match the row
 * count.
 */
export function screeningStep(data: Pick<ResponseData, 'factors' | 'y' | 'screening'>): ScreeningStep | null {
  const s = data.screening;
  if (!s) return null;
  const factors: readonly Factor[] = data.factors;
  const k = factors.length;
  const table = plackettBurmanTable(s.runs);
  if (k > s.runs - 1) throw new InputError(`A ${s.runs}-run Plackett-Burman plan takes up to ${s.runs - 1} factors, got ${k}`);
  if (s.standardOrder.length !== data.y.length) throw new InputError(`The screening plan needs one standard-order index per run (${data.y.length}), got ${s.standardOrder.length}`);
  const columns = Array.from({ length: s.runs - 1 }, () => new Array<number>(data.y.length).fill(0));
  s.standardOrder.forEach((row, i) => {
    if (row === null) return;
    if (!Number.isInteger(row) || row < 1 || row > s.runs) throw new InputError(`Run ${i + 1} has standard-order index ${row}, outside 1 to ${s.runs} of its Plackett-Burman plan`);
    for (let j = 0; j < s.runs - 1; j++) columns[j][i] = table[row - 1][j];
  });
  const terms = Array.from({ length: k }, (_, i) => 1 << i);
  const labels = columns.map((_, j) => (j < k ? { name: termName(1 << j, factors), letters: termLetters(1 << j, factors) } : unusedColumnLabel(j)));
  const partialAliasing = k < 3 ? null : { runs: s.runs, largestCorrelation: Math.max(...plackettBurmanAliasing(s.runs, k).map((a) => Math.abs(a.correlation))) };
  return { terms, contrasts: { columns, labels }, partialAliasing };
}
