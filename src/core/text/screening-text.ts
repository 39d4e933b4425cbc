/**
 * The plain-words summary of a Plackett-Burman plan, read before the person commits: how many
 * runs, that main effects are estimated clear of each other but partly mixed with two-factor
 * interactions (partial aliasing, Plackett and Burman 1946; the reading is common practice for
 * screening), how many columns are left unused, and how the runs are ordered.
 */
import { InputError } from '../errors.ts';
import { RATIO_TOLERANCE } from '../tolerance.ts';

export interface ScreeningSummaryInput {
  /** Factorial runs of one replicate (12, 20 or 24). */
  readonly factorialRuns: number;
  readonly factors: number;
  readonly totalRuns: number;
  /** Center runs per replicate. */
  readonly centerRuns: number;
  readonly replicates: number;
  /** The largest |correlation| of a main effect with a two-factor interaction (1/3 for 12 runs); null with 2 factors, which have no such pair. */
  readonly largestCorrelation: number | null;
  readonly seed: number | null;
}

/**
 * The partial-aliasing caution shown with every Plackett-Burman plan (and, later, its analysis):
 * what the partial mixing means in practice and what separates it (common practice for
 * screening designs; a foldover of a Plackett-Burman design clears main effects of two-factor
 * interactions, Montgomery, 8th ed., section 8.6.3, from memory).
 */
export const PARTIAL_ALIASING_NOTE =
  'Partial aliasing: each main effect is partly mixed with two-factor interactions of other factors, so a large interaction can make a main effect look larger or smaller than it is, or shift it onto a factor that does nothing. Treat the main effects as a screen: confirm the few factors that matter with a follow-up plan (a regular fraction on those factors, or the plan with every sign switched).';

/** A correlation as a person reads it: 1/3, 1/5, 3/5 ... when it is a simple fraction, else 2 decimals. */
export function correlationText(r: number): string {
  const a = Math.abs(r);
  for (let den = 1; den <= 12; den++) {
    const num = Math.round(a * den);
    if (num > 0 && Math.abs(a - num / den) < RATIO_TOLERANCE) return `${r < 0 ? '-' : ''}${den === 1 ? num : `${num}/${den}`}`;
  }
  return r.toFixed(2);
}

/**
 * The summary text.
 * Throws InputError for fewer factorial runs than factors + 1 or a total below 1.
 * Example: {factorialRuns: 12, factors: 7, totalRuns: 12, centerRuns: 0, replicates: 1,
 * largestCorrelation: 1/3, seed: 7} -> "12 runs, a Plackett-Burman screening design for 7
 * factors: main effects are estimated clear of each other but partly mixed with two-factor
 * interactions (correlations up to 1/3); 4 columns are left unused and help judge the effects.
 * Run order randomized (seed 7)."
 */
export function plackettBurmanSummary(s: ScreeningSummaryInput): string {
  if (!(s.totalRuns >= 1)) throw new InputError(`A plan needs at least one run, got ${s.totalRuns}`);
  if (!(s.factorialRuns >= s.factors + 1)) throw new InputError(`A ${s.factorialRuns}-run screening design takes up to ${s.factorialRuns - 1} factors, got ${s.factors}`);
  const detail: string[] = [];
  if (s.centerRuns > 0 || s.replicates > 1) {
    detail.push(`${s.factorialRuns} factorial${s.centerRuns > 0 ? ` + ${s.centerRuns} center` : ''}${s.replicates > 1 ? ` per replicate, ${s.replicates} replicates` : ''}`);
  }
  let text = `${s.totalRuns} runs${detail.length ? ` (${detail.join(', ')})` : ''}, a Plackett-Burman screening design for ${s.factors} factors: main effects are estimated clear of each other but partly mixed with two-factor interactions`;
  text += s.largestCorrelation === null || s.largestCorrelation === 0 ? '' : ` (correlations up to ${correlationText(s.largestCorrelation)})`;
  const unused = s.factorialRuns - 1 - s.factors;
  text += unused > 0 ? `; ${unused} column${unused === 1 ? ' is' : 's are'} left unused and help${unused === 1 ? 's' : ''} judge the effects.` : '.';
  text += s.seed === null ? ' Standard order kept.' : ` Run order randomized (seed ${s.seed}).`;
  return text;
}
