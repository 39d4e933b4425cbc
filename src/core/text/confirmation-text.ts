/**
 * The sentence that says what a set of confirmation runs found, for the screens and the exports
 * (see core/predict/confirm-runs.ts for the comparison and its source).
 */
import type { Factor } from '../factor/factor.ts';
import type { FitTransform } from '../fit/analysis.ts';
import { toReal } from '../factor/coding.ts';
import type { ConfirmationComparison } from '../predict/confirm-runs.ts';
import type { JudgedSet } from '../predict/confirmation-sets.ts';
import { formatSetting } from '../predict/parse-settings.ts';
import { shortNumber } from './number-text.ts';

/**
 * One plain sentence on the comparison. Cost O(1).
 * Example: mean 41.53 of 3 runs inside [41.14, 41.95] -> "Confirmed: the mean of the 3
 * confirmation runs, 41.53, lies inside the 95% interval for the mean of 3 new runs, 41.14 to
 * 41.95 (predicted 41.54)."
 */
export function confirmationStatement(c: ConfirmationComparison): string {
  const runs = `${c.m} confirmation run${c.m === 1 ? '' : 's'}`;
  const newRuns = `${c.m === 1 ? 'one new run' : `the mean of ${c.m} new runs`}`;
  const pct = `${shortNumber(c.level * 100)}%`;
  if (c.interval === null) {
    return `Cannot judge: the model has no runs left over to estimate the noise, so there is no interval to compare the ${runs} with. Refit with fewer terms first.`;
  }
  const where = `the ${pct} interval for ${newRuns}, ${shortNumber(c.interval[0])} to ${shortNumber(c.interval[1])} (predicted ${shortNumber(c.fit)})`;
  const mean = `${c.m === 1 ? 'the reading of the' : 'the mean of the'} ${runs}, ${shortNumber(c.mean)}`;
  return c.outcome === 'confirmed'
    ? `Confirmed: ${mean}, lies inside ${where}.`
    : `Not confirmed: ${mean}, lies outside ${where}. The model does not hold at this setting; do not rely on its predictions here.`;
}

/**
 * Where a set of confirmation runs was made, in words. Cost O(k).
 * Example: "Confirmation runs 12 to 14 (block 3) at Oven temperature 190 °C, Line speed 2.5 m/min".
 */
export function confirmationSetPlace(j: JudgedSet, factors: readonly Factor[]): string {
  const r = j.set.runs;
  const runs = r.length === 1 ? `Confirmation run ${r[0]}` : `Confirmation runs ${r[0]} to ${r[r.length - 1]}`;
  const at = factors.map((f, i) => `${f.name} ${formatSetting(toReal(f, j.set.coded[i]), f.kind === 'numeric' ? f.unit : undefined)}`).join(', ');
  return `${runs} (block ${j.set.block}) at ${at}`;
}

/**
 * What a set of confirmation runs found, in words: the statement, the core's message, or that none
 * is logged yet. The screens' cards and the command line's report both show it. Cost O(1).
 * Example: "Confirmed: the mean of the 3 confirmation runs, 41.53, lies inside ...".
 */
export function confirmationVerdict(j: JudgedSet): string {
  return j.comparison ? confirmationStatement(j.comparison) : j.problem !== null ? `Cannot judge: ${j.problem}` : NOT_LOGGED_YET;
}

/**
 * A set's verdict in one line: its place, then its verdict. Cost O(k).
 * Example: "Confirmation runs 12 to 14 (block 3) at ...: Confirmed: the mean of the 3 confirmation runs, ...".
 */
export function confirmationSetLine(j: JudgedSet, factors: readonly Factor[]): string {
  return `${confirmationSetPlace(j, factors)}: ${confirmationVerdict(j)}`;
}

/**
 * How many of a set's planned runs have a value yet, once some have and while some are missing;
 * null before any has (the verdict says so) and once all have. Cost O(1).
 * Example: 2 of runs 12 to 14 logged -> "2 of 3 confirmation runs logged with a value for this response."
 */
export function confirmationProgress(j: JudgedSet): string | null {
  const n = j.set.runs.length;
  const k = j.set.values.length;
  return k === 0 || k >= n ? null : `${k} of ${n} confirmation run${n === 1 ? '' : 's'} logged with a value for this response.`;
}

/**
 * Which scale a transformed model's confirmation figures are on, since its mean, prediction and
 * interval are not in the response's units (fit/response-transform.ts: ln(y - L) for the log,
 * ((y - L)^lambda - 1) / lambda otherwise); null for a model of the response as measured. Cost O(1).
 * Example: log of Gloss -> "The figures are on the scale the model is fitted on, ln(Gloss), not in Gloss itself."
 */
export function confirmationScale(t: FitTransform | undefined, response: string): string | null {
  if (!t || t.lambda === 1) return null;
  const y = t.lowerBound ? `${response} − ${shortNumber(t.lowerBound)}` : response;
  const scale = t.lambda === 0 ? `ln(${y})` : `((${y})^${shortNumber(t.lambda)} − 1) / ${shortNumber(t.lambda)}`;
  return `The figures are on the scale the model is fitted on, ${scale}, not in ${response} itself.`;
}

/** The token of a set's verdict for files: confirmed, not-confirmed, no-noise, not-logged or cannot-judge. Example: "confirmed". */
export function confirmationToken(j: JudgedSet): string {
  return j.comparison ? j.comparison.outcome : j.problem !== null ? 'cannot-judge' : 'not-logged';
}

/** A set of confirmation runs with no value yet for the response. */
export const NOT_LOGGED_YET = 'None logged yet with a value for this response; log them to see the verdict.';

/**
 * Why there is no confirmation verdict to export, with what to do where it was asked.
 * Example: noConfirmationRuns('Cure trial', 'app') -> 'The study "Cure trial" has no confirmation
 * runs planned, so there is no verdict to save; plan them on the Next tab first.'
 */
export function noConfirmationRuns(title: string, where: 'app' | 'command'): string {
  return where === 'app'
    ? `The study "${title}" has no confirmation runs planned, so there is no verdict to save; plan them on the Next tab first.`
    : `The study "${title}" has no confirmation runs planned, so there is no verdict to write; plan them in the app (Next tab) first.`;
}
