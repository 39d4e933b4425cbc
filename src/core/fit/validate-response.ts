/**
 * The first step of the analysis: the runs of one response checked before anything is computed.
 * Throws InputError, with what was needed and what came, for: rows of settings that do not match
 * the responses, fewer runs than the intercept and the main effects need (k + 1), a response or a
 * setting that is not a finite number, a factor with the same setting in every run, or a
 * response with no variation: spread within CONSTANT_TOLERANCE of the values' own magnitude,
 * max |y| (common practice), so the check is the same at every scale (1e-14 m and 1e14 both
 * pass when they differ by 20 %; only values that are equal, or equal up to round-off, are refused).
 * Cost O(n k).
 * Example: validateResponseData({ ..., y: [5, 5, 5, 5] }) throws "Gloss is the same (5) in every run: ...".
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import type { ResponseData } from '../study/response-data.ts';
import { shortNumber } from '../text/number-text.ts';
import { CONSTANT_TOLERANCE } from '../tolerance.ts';

export function validateResponseData(data: ResponseData): void {
  const { factors, coded, y, response } = data;
  const n = y.length;
  if (coded.length !== n) throw new InputError(`${response}: ${n} responses but ${coded.length} rows of settings`);
  if (n < factors.length + 1) {
    throw new InputError(
      `${response}: ${n} ${n === 1 ? 'run' : 'runs'} cannot estimate even the intercept and ${factors.length} main ${factors.length === 1 ? 'effect' : 'effects'}; at least ${factors.length + 1} runs are needed`,
    );
  }
  const label = (i: number) => data.labels[i] ?? String(i + 1);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(y[i])) throw new InputError(`${response}, run ${label(i)}: needs a number, got ${y[i]}`);
    const row = coded[i];
    if (row.length !== factors.length) throw new InputError(`Run ${label(i)}: ${row.length} settings for ${factors.length} factors`);
    for (let f = 0; f < row.length; f++) {
      if (!Number.isFinite(row[f])) throw new InputError(`Run ${label(i)}: ${factors[f].name} needs a number, got ${row[f]}`);
    }
  }
  for (let f = 0; f < factors.length; f++) {
    const first = coded[0][f];
    let i = 1;
    while (i < n && coded[i][f] === first) i++;
    if (i === n) {
      const real = factors[f].kind === 'categorical' ? toReal(factors[f], first) : shortNumber(toReal(factors[f], first) as number);
      throw new InputError(`${factors[f].name} has the same setting (${real}) in every run, so its effect cannot be estimated`);
    }
  }
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    lo = Math.min(lo, y[i]);
    hi = Math.max(hi, y[i]);
  }
  // Relative to the values' own scale (no absolute floor); all zeros give 0 <= 0 and are refused.
  if (hi - lo <= CONSTANT_TOLERANCE * Math.max(Math.abs(lo), Math.abs(hi))) {
    throw new InputError(`${response} is the same (${shortNumber(lo)}) in every run: there is no variation to analyze`);
  }
}
