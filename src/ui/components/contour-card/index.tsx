/**
 * The contour chart's place on the quick card: the two numeric factors to draw (chosen with
 * large buttons), the others held at the card's settings, and the grid of fitted values the
 * chart and its table show. Shown for models with a second-order term (a two-factor
 * interaction or a square), where the lines bend; for main effects only they would be straight
 * and parallel and say nothing the contributions do not.
 */
import { useSignal } from '@preact/signals';
import { toReal } from '../../../core/factor/coding.ts';
import type { Factor } from '../../../core/factor/factor.ts';
import type { FittedModel } from '../../../core/fit/analysis.ts';
import { isInteraction, isSquare } from '../../../core/model/term.ts';
import { canonicalAnalysis } from '../../../core/optimum/canonical-analysis.ts';
import { contourGrid, contourLevels } from '../../../core/optimum/contour-grid.ts';
import type { Setting } from '../../../core/study/study.ts';
import { num, setting } from '../../lib/format.ts';
import { problemOf } from '../../lib/problem.ts';
import { ChoiceButtons } from '../choice-buttons/index.tsx';
import { ContourChart } from '../contour-chart/index.tsx';

export type ContourCardProps = {
  readonly model: FittedModel;
  /** Coded settings of the runs the model was fitted to (the design points). */
  readonly runs: readonly (readonly number[])[];
  /** The quick card's settings: coded (for the grid) and as set (for the sentence). */
  readonly held: readonly number[];
  readonly settings: readonly Setting[];
  readonly responseLabel: string;
};

/** Whether a model has a term that bends the contour lines. */
export function hasCurvedTerms(model: FittedModel): boolean {
  return model.terms.some((t) => isInteraction(t) || isSquare(t));
}

function realText(f: Factor, coded: number): string {
  return f.kind === 'numeric' ? num(toReal(f, coded) as number) : '';
}

export function ContourCard({ model, runs, held, settings, responseLabel }: ContourCardProps) {
  const numeric = model.factors.flatMap((f, i) => (f.kind === 'numeric' ? [i] : []));
  const acrossChoice = useSignal<number | null>(null);
  const upChoice = useSignal<number | null>(null);
  if (numeric.length < 2 || !hasCurvedTerms(model)) return null;
  const across = acrossChoice.value !== null && numeric.includes(acrossChoice.value) ? acrossChoice.value : numeric[0];
  let up = upChoice.value !== null && numeric.includes(upChoice.value) ? upChoice.value : numeric[1];
  if (up === across) up = numeric.find((i) => i !== across)!;
  // The tested extent on each axis: the design's own (the axial distance of a central composite design).
  const reach = (i: number) => Math.max(1, ...runs.map((r) => Math.abs(r[i])));
  let grid;
  try {
    grid = contourGrid(model, across, up, held, { reach: [reach(across), reach(up)] });
  } catch (err) {
    return (
      <p class="problem input" role="alert">
        The contour chart cannot be drawn: {problemOf(err).message}
      </p>
    );
  }
  const levels = contourLevels(grid.min, grid.max, 8);
  let stationary: [number, number] | null = null;
  try {
    const s = canonicalAnalysis(model).stationary;
    if (s) stationary = [s.coded[across], s.coded[up]];
  } catch {
    stationary = null; // no second-order part in these factors: nothing to mark
  }
  const outside = stationary !== null && (Math.abs(stationary[0]) > grid.xs[grid.xs.length - 1] || Math.abs(stationary[1]) > grid.ys[grid.ys.length - 1]);
  const f = model.factors;
  const others = f.flatMap((g, i) => (i === across || i === up ? [] : [`${g.name} ${setting(settings[i], g.kind === 'numeric' ? g.unit : undefined)}`]));
  const name = (i: number) => {
    const g = f[i];
    return g.kind === 'numeric' && g.unit ? `${g.name} (${g.unit})` : g.name;
  };
  const options = numeric.map((i) => ({ value: i, label: f[i].name }));
  const note = [
    others.length > 0 ? `The other factors are held at the settings above: ${others.join(', ')}.` : '',
    outside ? 'The stationary point lies outside this chart.' : '',
  ]
    .filter((s) => s !== '')
    .join(' ');
  return (
    <section class="contour-card" aria-labelledby="contour-h">
      <h3 id="contour-h">Contour chart</h3>
      <ChoiceButtons label="Across" options={options} value={across} onChoose={(i) => (acrossChoice.value = i)} />
      <ChoiceButtons label="Up" options={options.filter((o) => o.value !== across)} value={up} onChoose={(i) => (upChoice.value = i)} />
      <ContourChart
        grid={grid}
        levels={levels}
        xName={name(across)}
        yName={name(up)}
        xLabel={(c) => realText(f[across], c)}
        yLabel={(c) => realText(f[up], c)}
        responseLabel={responseLabel}
        points={runs.map((r) => [r[across], r[up]] as const)}
        stationary={outside ? null : stationary}
        othersNote={note}
      />
    </section>
  );
}
