/**
 * The grid a contour chart is drawn from: the fitted response on an n x n lattice of two numeric
 * factors, every other factor held at given coded settings (the quick card's), in the response's
 * own units (a transformed fit brought back, as predictions are). Lines of equal response are then
 * traced over it by marching squares (Lorensen and Cline 1987, SIGGRAPH, in its two-dimensional
 * form; done on the screen by d3-contour), at round levels (contourLevels).
 */
import { InputError } from '../errors.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { backTransform } from '../fit/response-transform.ts';
import { cachedPredictor } from '../predict/compiled-predictor.ts';

/** Points per axis unless asked: 41, so the five table columns (every tenth point) fall on the grid (common practice). */
export const CONTOUR_POINTS = 41;

export interface ContourGrid {
  /** Factor index across (x) and up (y). */
  readonly across: number;
  readonly up: number;
  /** Coded settings of the lattice along each axis, ascending. */
  readonly xs: Float64Array;
  readonly ys: Float64Array;
  /** Fitted values, row by row from the lowest y, x fastest: values[i + j * xs.length]; null-free (an unreachable back-transform is NaN and named in `gaps`). */
  readonly values: Float64Array;
  /** Points where the fit has no value in the response's units (a back-transform beyond its domain). */
  readonly gaps: number;
  readonly min: number;
  readonly max: number;
}

export interface ContourGridOptions {
  /** Coded half-width of each axis (the tested extent; 1 for a two-level box, alpha for a central composite design). */
  readonly reach?: readonly [number, number];
  readonly points?: number;
}

/**
 * The grid of fitted values (see the file comment). Cost O(n^2 p) for p model columns, one
 * buffer, no allocation per point.
 * Throws InputError when the two factors are the same, either is not a numeric factor of the
 * model, `held` has the wrong length or a non-finite value, a reach is not above 0, or the points
 * are fewer than 2.
 * Example: y = 10 + 2 x1 - x2 (two factors), points 3, reach [1, 1] -> values
 * [9, 11, 13, 8, 10, 12, 7, 9, 11] (x1 across, x2 up).
 */
export function contourGrid(model: FittedModel, across: number, up: number, held: readonly number[], options: ContourGridOptions = {}): ContourGrid {
  const k = model.factors.length;
  for (const [i, what] of [
    [across, 'across'],
    [up, 'up'],
  ] as const) {
    if (!Number.isInteger(i) || i < 0 || i >= k) throw new InputError(`A contour chart needs a factor of the model ${what}, got index ${i} of ${k}`);
    if (model.factors[i].kind !== 'numeric') throw new InputError(`A contour chart needs numeric factors; ${model.factors[i].name} is categorical`);
  }
  if (across === up) throw new InputError(`A contour chart needs two different factors, got ${model.factors[across].name} twice`);
  if (held.length !== k) throw new InputError(`A contour chart needs one held setting per factor (${k}), got ${held.length}`);
  held.forEach((h, i) => {
    if (!Number.isFinite(h)) throw new InputError(`The held setting of ${model.factors[i].name} needs a finite number, got ${h}`);
  });
  const n = options.points ?? CONTOUR_POINTS;
  if (!Number.isInteger(n) || n < 2) throw new InputError(`A contour grid needs 2 or more points per axis, got ${n}`);
  const [rx, ry] = options.reach ?? [1, 1];
  if (!(rx > 0 && ry > 0 && Number.isFinite(rx) && Number.isFinite(ry))) throw new InputError(`A contour chart's reach must be above 0 on both axes, got ${rx} and ${ry}`);
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    xs[i] = -rx + (2 * rx * i) / (n - 1);
    ys[i] = -ry + (2 * ry * i) / (n - 1);
  }
  const predictor = cachedPredictor(model);
  const lambda = model.transform?.lambda ?? 1;
  const bound = model.transform?.lowerBound ?? 0;
  const point = Float64Array.from(held);
  const values = new Float64Array(n * n);
  let min = Infinity;
  let max = -Infinity;
  let gaps = 0;
  for (let j = 0; j < n; j++) {
    point[up] = ys[j];
    for (let i = 0; i < n; i++) {
      point[across] = xs[i];
      const z = predictor.fit(point);
      // Back to the response's units as predictions are (back-transform.ts): y = L + inverse transform of z.
      const b = lambda === 1 ? z : backTransform(z, lambda);
      const v = b === null || !Number.isFinite(b) ? Number.NaN : lambda === 1 ? b : bound + b;
      values[i + j * n] = v;
      if (Number.isNaN(v)) gaps++;
      else {
        if (v < min) min = v;
        if (v > max) max = v;
      }
    }
  }
  return { across, up, xs, ys, values, gaps, min, max };
}

/**
 * Round levels for the lines: multiples of a step of 1, 2 or 5 times a power of ten, chosen so
 * about `count` of them lie strictly between min and max (common practice for chart ticks;
 * Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990). Cost O(count).
 * Returns [] when max is not above min (a flat surface has no lines). Throws InputError for a
 * count below 1 or a bound that is not finite.
 * Example: contourLevels(71.3, 79.8, 8) -> [72, 73, 74, 75, 76, 77, 78, 79].
 */
export function contourLevels(min: number, max: number, count = 8): number[] {
  if (!Number.isInteger(count) || count < 1) throw new InputError(`The number of contour levels must be a whole number, 1 or more, got ${count}`);
  if (!Number.isFinite(min) || !Number.isFinite(max)) throw new InputError(`Contour levels need finite bounds, got ${min} and ${max}`);
  if (!(max > min)) return [];
  const raw = (max - min) / (count + 1);
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  const step = (f < 1.5 ? 1 : f < 3.5 ? 2 : f < 7.5 ? 5 : 10) * power;
  const out: number[] = [];
  for (let m = Math.floor(min / step) + 1; m * step < max; m++) {
    // Rounded to the step's own digits, so 0.1 + 0.2 shows as 0.3.
    const v = Number((m * step).toPrecision(12));
    if (v > min) out.push(v);
  }
  return out;
}
