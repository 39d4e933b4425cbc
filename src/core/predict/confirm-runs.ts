/**
 * Confirmation runs: after a setting is chosen from the model, m new runs are made there and
 * their mean is compared with the prediction interval for the mean of m new runs,
 *   y-hat(x0) +- t(1 - (1 - level)/2, df) s sqrt(1/m + x0'(X'X)^-1 x0),
 * from the model fitted without the confirmation runs. A mean inside the interval confirms the
 * model at that setting; a mean outside it says the model does not hold there.
 * Source: Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6 (prediction of
 * new observations) and Myers, Montgomery and Anderson-Cook, Response Surface Methodology,
 * 3rd ed., section 2.8 (the interval for the mean of m future runs); both from memory.
 */
import { InputError } from '../errors.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { CAUTION } from './caution.ts';
import { cachedPredictor } from './compiled-predictor.ts';
import type { FactorSetting } from './parse-settings.ts';

/** What the comparison found. 'no-noise': the model has no residual df, so no interval exists. */
export type ConfirmationOutcome = 'confirmed' | 'not-confirmed' | 'no-noise';

export interface ConfirmationComparison {
  readonly response: string;
  readonly settings: readonly FactorSetting[];
  /** Number of confirmation runs with a reading. */
  readonly m: number;
  /** Mean of their readings (on the model's scale). */
  readonly mean: number;
  /** The model's prediction at the setting. */
  readonly fit: number;
  /** x0'(X'X)^-1 x0 at the setting. */
  readonly varianceFactor: number;
  readonly level: number;
  readonly dfResidual: number;
  /** The t quantile; null when the residual df is 0. */
  readonly t: number | null;
  /** Residual standard deviation s; null when the residual df is 0. */
  readonly sigma: number | null;
  /** Half-width t s sqrt(1/m + q); null when the residual df is 0. */
  readonly halfWidth: number | null;
  /** The interval for the mean of m new runs; null when the residual df is 0. */
  readonly interval: readonly [number, number] | null;
  readonly outcome: ConfirmationOutcome;
  readonly caution: readonly string[];
}

/**
 * Compares the mean of m confirmation runs with the prediction interval for the mean of m new
 * runs at their setting (formula and source in the file comment). `observed` holds one value
 * per confirmation run (each run's mean reading), already on the model's scale (transformed
 * when the model's response is). Cost O(p^2) for the first call on a model, O(p^2) or O(p) per
 * call after (see compilePredictor), plus O(m).
 * Throws InputError when the settings do not match the model's factors, no run has a reading,
 * a reading is not a finite number, or the level is not between 0 and 1.
 * Example: for y-hat = 40.44 + 0.775 x1 + 0.325 x2 (Montgomery 8th ed., section 6.8 data,
 * s = 0.1719 on 6 df) at x0 = (1, 1) with readings 41.2, 41.8, 41.6: mean 41.53, interval
 * 41.54 +- 2.447 x 0.1719 x sqrt(1/3 + 1/9 + 1/4 + 1/4) = [41.14, 41.95], outcome 'confirmed'.
 */
export function compareConfirmation(model: FittedModel, settings: readonly FactorSetting[], observed: readonly number[], level = 0.95): ConfirmationComparison {
  if (!(level > 0 && level < 1)) throw new InputError(`A confidence level needs a number between 0 and 1, got ${level}`);
  if (settings.length !== model.factors.length) {
    throw new InputError(`A confirmation needs one setting per factor (${model.factors.length}), got ${settings.length}`);
  }
  if (observed.length === 0) throw new InputError('A confirmation needs at least one confirmation run with a reading, got none: log the confirmation runs first');
  let sum = 0;
  observed.forEach((y, i) => {
    if (typeof y !== 'number' || !Number.isFinite(y)) throw new InputError(`Confirmation run ${i + 1} needs a finite reading, got ${String(y)}`);
    sum += y;
  });
  const m = observed.length;
  const mean = sum / m;
  const predictor = cachedPredictor(model, level);
  const x = settings.map((s) => s.coded);
  const fit = predictor.fit(x);
  const qRaw = predictor.varianceFactor(x);
  const q = qRaw > 0 ? qRaw : 0;
  const { sigma, tValue: t } = predictor;
  if (sigma === null || t === null) {
    return { response: model.response, settings, m, mean, fit, varianceFactor: q, level, dfResidual: model.dfResidual, t: null, sigma: null, halfWidth: null, interval: null, outcome: 'no-noise', caution: CAUTION };
  }
  const halfWidth = t * sigma * Math.sqrt(1 / m + q);
  const interval: [number, number] = [fit - halfWidth, fit + halfWidth];
  const outcome: ConfirmationOutcome = mean >= interval[0] && mean <= interval[1] ? 'confirmed' : 'not-confirmed';
  return { response: model.response, settings, m, mean, fit, varianceFactor: q, level, dfResidual: model.dfResidual, t, sigma, halfWidth, interval, outcome, caution: CAUTION };
}
