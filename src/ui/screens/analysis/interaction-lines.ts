/**
 * What the interaction chart draws for one two-factor term of a fitted model: the response the
 * core's predict gives at the four corners of the two factors (first factor across, second factor
 * at its low and at its high setting), every other factor at its center (a categorical one at its
 * first level). No statistics here: every number is a prediction from the fitted model.
 */
import type { Analysis } from '../../../core/fit/analysis.ts';
import type { Factor } from '../../../core/factor/factor.ts';
import { termFactors, type Term } from '../../../core/model/term.ts';
import { predict } from '../../../core/predict/predict.ts';
import type { SettingValue } from '../../../core/predict/parse-settings.ts';
import { setting } from '../../lib/format.ts';

export interface InteractionLines {
  readonly term: Term;
  /** The factor across the chart. */
  readonly across: Factor;
  /** The factor held at its low, then at its high setting (one line each). */
  readonly held: Factor;
  /** Low and high settings of the factor across, as text. */
  readonly acrossLabels: readonly [string, string];
  /** One line per setting of the held factor: its setting as text and the two predicted values. */
  readonly lines: readonly { readonly label: string; readonly values: readonly [number, number] }[];
  /** Where the other factors are held, in words ("Powder flow at its center, 40 g/min"); empty when there are none. */
  readonly others: readonly string[];
}

function end(f: Factor, e: 0 | 1): SettingValue {
  if (f.kind === 'categorical') return f.levels[e];
  return e === 0 ? f.low : f.high;
}

function endText(f: Factor, e: 0 | 1): string {
  return f.kind === 'categorical' ? f.levels[e] : setting(e === 0 ? f.low : f.high, f.unit);
}

/** The four predicted points of a two-factor term. Throws as predict does. */
export function interactionLines(a: Analysis, term: Term): InteractionLines {
  const factors = a.model.factors;
  const [i, j] = termFactors(term);
  const across = factors[i];
  const held = factors[j];
  const base: [string, SettingValue][] = [];
  factors.forEach((f, k) => {
    if (k !== i && k !== j && f.kind === 'categorical') base.push([f.name, f.levels[0]]);
  });
  const at = (ea: 0 | 1, eh: 0 | 1) => predict(a.model, [...base, [across.name, end(across, ea)], [held.name, end(held, eh)]]);
  const first = at(0, 0);
  const others = first.settings
    .filter((_s, k) => k !== i && k !== j)
    .map((s) => (s.kind === 'categorical' ? `${s.name} at its first level, ${s.real}` : `${s.name} at its center, ${setting(s.real, s.unit)}`));
  return {
    term,
    across,
    held,
    acrossLabels: [endText(across, 0), endText(across, 1)],
    lines: [
      { label: endText(held, 0), values: [first.fit, at(1, 0).fit] },
      { label: endText(held, 1), values: [at(0, 1).fit, at(1, 1).fit] },
    ],
    others,
  };
}
