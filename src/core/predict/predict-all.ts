/** Prediction of every response of a study at the same settings. */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { parseSettings, type SettingsInput } from './parse-settings.ts';
import { predictSettings, type PredictOptions, type Prediction } from './predict.ts';

function sameFactor(a: Factor, b: Factor): boolean {
  if (a.kind !== b.kind || a.name !== b.name || a.letter !== b.letter) return false;
  if (a.kind === 'numeric' && b.kind === 'numeric') return a.low === b.low && a.high === b.high && (a.scale ?? 'linear') === (b.scale ?? 'linear');
  if (a.kind === 'categorical' && b.kind === 'categorical') return a.levels[0] === b.levels[0] && a.levels[1] === b.levels[1];
  return false;
}

/**
 * Predicts each response (one fitted model per response, the same factors and coding) at one set
 * of real settings, resolved once. Same method and rule for settings not given as predict
 * (Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6). Cost: one predict per
 * model.
 * Throws InputError for no models, models whose factors or coding differ, and as predict does.
 * Example: predictAll([gloss, hardness], { A: 185, B: 'gloss' }).map((p) => p.response) ->
 * ['Gloss', 'Hardness'].
 */
export function predictAll(models: readonly FittedModel[], settings: SettingsInput, options: PredictOptions = {}): Prediction[] {
  if (models.length === 0) throw new InputError('Predicting all responses needs at least one fitted response, got none');
  const factors = models[0].factors;
  for (const m of models) {
    if (m.factors.length !== factors.length || m.factors.some((f, i) => !sameFactor(f, factors[i]))) {
      throw new InputError(
        `Every response must be fitted with the same factors and coding; ${m.response} differs from ${models[0].response}`,
      );
    }
  }
  const resolved = parseSettings(factors, settings);
  return models.map((m) => predictSettings(m, resolved, options));
}
