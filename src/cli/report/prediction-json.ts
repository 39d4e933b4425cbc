/** The predict command's JSON: settings and coded values keyed by factor name, intervals as [lo, hi]. */
import type { Prediction } from '../../core/predict/predict.ts';

/**
 * The predict command's JSON object (keys coded, fit, se, ci, pi, baseline, contributions,
 * outside, messages, caution, with settings, level and outsideFactors besides). Plain data; nulls
 * stay null. Example: predictionJson(predict(model, { A: 40, B: 150 })).coded -> { Time: 1, Temperature: -1 }.
 */
export function predictionJson(p: Prediction) {
  return {
    response: p.response,
    settings: Object.fromEntries(p.settings.map((s) => [s.name, s.real])),
    coded: Object.fromEntries(p.settings.map((s) => [s.name, s.coded])),
    fit: p.fit,
    se: p.se,
    level: p.level,
    ci: p.ci,
    pi: p.pi,
    baseline: p.baseline,
    contributions: p.contributions.map((c) => ({ term: c.name, letters: c.letters, ...(c.estimates ? { estimates: c.estimates } : {}), value: c.value })),
    outside: p.outside,
    outsideFactors: p.outsideFactors.map((o) => ({ factor: o.name, real: o.real, coded: o.coded, beyond: o.beyond, end: o.end })),
    messages: p.messages,
    caution: p.caution,
    ...(p.transformed ? { transformed: p.transformed } : {}),
  };
}
