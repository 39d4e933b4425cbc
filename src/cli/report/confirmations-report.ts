/**
 * The confirmation section of the analyze report, as text and as JSON: per set of confirmation
 * runs, the mean of its m runs, the 95% interval for the mean of m new runs from the model fitted
 * without them, and whether the model is confirmed there (core/predict/confirmation-sets.ts; the
 * sentences from core/text/confirmation-text.ts), with the standing caution.
 */
import type { Factor } from '../../core/factor/factor.ts';
import type { FittedModel } from '../../core/fit/analysis.ts';
import { toReal } from '../../core/factor/coding.ts';
import { CAUTION } from '../../core/predict/caution.ts';
import type { JudgedSet } from '../../core/predict/confirmation-sets.ts';
import { confirmationScale, confirmationSetLine, confirmationStatement, confirmationToken } from '../../core/text/confirmation-text.ts';

export function confirmationsText(judged: readonly JudgedSet[], model: Pick<FittedModel, 'factors' | 'transform' | 'response'>): string {
  const out = ['Confirmation runs (kept out of the fit, judged against it)'];
  for (const j of judged) out.push(`  - ${confirmationSetLine(j, model.factors)}`);
  const scale = confirmationScale(model.transform, model.response);
  if (scale) out.push(`  ${scale}`);
  out.push('', 'Caution');
  for (const c of CAUTION) out.push(`  - ${c}`);
  return out.join('\n');
}

/** One object per set; numbers are on the model's scale (transformed when the model is); nulls where the runs give none. */
export function confirmationsJson(judged: readonly JudgedSet[], factors: readonly Factor[]): Record<string, unknown>[] {
  return judged.map((j) => {
    const c = j.comparison;
    return {
      block: j.set.block,
      runs: j.set.runs,
      settings: Object.fromEntries(factors.map((f, i) => [f.name, toReal(f, j.set.coded[i])])),
      m: c ? c.m : j.set.values.length,
      mean: c ? c.mean : null,
      predicted: c ? c.fit : null,
      level: c ? c.level : null,
      interval: c ? c.interval : null,
      outcome: confirmationToken(j),
      statement: c ? confirmationStatement(c) : (j.problem ?? null),
    };
  });
}
