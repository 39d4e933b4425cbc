import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import { contrastEffects } from '../../../src/core/fit/contrast-effects.ts';
import { plackettBurmanTable } from '../../../src/core/design/plackett-burman.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('contrastEffects', () => {
  it('the doc example: a 2^2 in standard order, effects (average at + minus average at -) by hand', () => {
    // By hand: A = (3 + 6)/2 - (1 + 2)/2 = 3; B = (2 + 6)/2 - (1 + 3)/2 = 2.
    const out = contrastEffects([[-1, 1, -1, 1], [-1, -1, 1, 1]], [1, 3, 2, 6]);
    expect(out.map((e) => e.column)).toEqual([0, 1]);
    expect(out[0].effect).toBeCloseTo(3, 12);
    expect(out[1].effect).toBeCloseTo(2, 12);
  });

  it('all 11 columns of a complete 12-run Plackett-Burman table: effect_j = x_j . y / 6 (Plackett and Burman 1946: balanced, orthogonal columns)', () => {
    const table = plackettBurmanTable(12);
    const y = [12.1, 9.8, 14.3, 10.2, 11.7, 13.9, 8.4, 10.6, 12.8, 9.1, 11.2, 10.0]; // INVENTED responses
    const cols = Array.from({ length: 11 }, (_, j) => table.map((r) => r[j]));
    const out = contrastEffects(cols, y);
    expect(out).toHaveLength(11);
    out.forEach((e) => {
      const dot = cols[e.column].reduce((s, x, i) => s + x * y[i], 0);
      expect(e.effect).toBeCloseTo(dot / 6, 10);
    });
  });

  it('with a run missing the columns are no longer orthogonal: least squares agrees with ml-regression-multivariate-linear 2.0.4, and the column left over is dropped', () => {
    const table = plackettBurmanTable(12).slice(0, 11); // the last run (all -1) never logged
    const y = [12.1, 9.8, 14.3, 10.2, 11.7, 13.9, 8.4, 10.6, 12.8, 9.1, 11.2]; // INVENTED responses
    const cols = Array.from({ length: 6 }, (_, j) => table.map((r) => r[j]));
    const out = contrastEffects(cols, y);
    expect(out).toHaveLength(6);
    const ref = new MLR(table.map((r) => r.slice(0, 6)), y.map((v) => [v]), { intercept: true });
    out.forEach((e) => expect(e.effect).toBeCloseTo(2 * ref.weights[e.column][0], 8));
    // 11 runs carry an intercept and 10 columns at most: of all 11 columns one is set aside.
    expect(contrastEffects(Array.from({ length: 11 }, (_, j) => table.map((r) => r[j])), y)).toHaveLength(10);
  });

  it('degenerate input: no runs, or a column of the wrong length, is refused', () => {
    expect(() => contrastEffects([[1, -1]], [])).toThrow(InputError);
    expect(() => contrastEffects([[1, -1, 1]], [1, 2])).toThrow('Contrast column 1 needs one entry per run (2), got 3');
  });
});
