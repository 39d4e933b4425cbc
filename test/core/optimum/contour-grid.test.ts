import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { canonicalAnalysis } from '../../../src/core/optimum/canonical-analysis.ts';
import { contourGrid, contourLevels } from '../../../src/core/optimum/contour-grid.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { syntheticModel } from './helpers.ts';

describe('contourGrid: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2 (yield)', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const model = analyze(data, { terms: parseTerms('quadratic', data.factors) }).model;
  const g = contourGrid(model, 0, 1, [0, 0], { reach: [Math.SQRT2, Math.SQRT2] });

  it('holds the fitted values of the reference library on every lattice point', () => {
    // ml-regression-multivariate-linear 2.0.4 on the columns x1, x2, x1 x2, x1^2, x2^2 built here.
    const cols = (x: number, y: number) => [x, y, x * y, x * x, y * y];
    const ref = new MLR(data.coded.map((r) => cols(r[0], r[1])), data.y.map((v) => [v]), { intercept: true });
    const n = g.xs.length;
    for (let j = 0; j < n; j += 5) for (let i = 0; i < n; i += 5) expect(g.values[i + j * n]).toBeCloseTo(ref.predict(cols(g.xs[i], g.ys[j]))[0], 9);
    expect(g.xs[0]).toBeCloseTo(-Math.SQRT2, 12);
    expect(g.xs[n - 1]).toBeCloseTo(Math.SQRT2, 12);
    expect(g.gaps).toBe(0);
  });

  it('agrees with the printed fitted equation and never rises above the printed maximum', () => {
    // Printed (Montgomery 8th ed., Example 11.2; from memory): y = 79.94 + 0.995 x1 + 0.515 x2 - 1.376 x1^2
    // - 1.001 x2^2 + 0.25 x1 x2, with its maximum y_s = 80.21 at x_s = (0.389, 0.306).
    const printed = (x: number, y: number) => 79.94 + 0.995 * x + 0.515 * y - 1.376 * x * x - 1.001 * y * y + 0.25 * x * y;
    const n = g.xs.length;
    for (const [i, j] of [
      [0, 0],
      [20, 20],
      [40, 10],
      [7, 33],
    ]) {
      expect(Math.abs(g.values[i + j * n] - printed(g.xs[i], g.ys[j]))).toBeLessThan(0.02); // printed to 3 decimals
    }
    expect(g.max).toBeLessThanOrEqual(canonicalAnalysis(model).stationary!.fit);
    expect(g.max).toBeGreaterThan(80.21 - 0.02);
  });

  it('holds the other factors at the given settings (three factors, one held off center)', () => {
    const m = syntheticModel(3, 7);
    const held = contourGrid(m, 2, 0, [0, 0.5, 0], { points: 3 });
    const center = contourGrid(m, 2, 0, [0, 0, 0], { points: 3 });
    // Invented model: moving the held factor changes the slice, so the grids must differ.
    expect([...held.values]).not.toEqual([...center.values]);
  });

  it('refuses what it cannot draw (degenerate input)', () => {
    expect(() => contourGrid(model, 0, 0, [0, 0])).toThrow('two different factors, got Time twice');
    expect(() => contourGrid(model, 0, 2, [0, 0])).toThrow(/index 2 of 2/);
    expect(() => contourGrid(model, 0, 1, [0])).toThrow(/one held setting per factor \(2\), got 1/);
    expect(() => contourGrid(model, 0, 1, [0, Number.NaN])).toThrow(/finite number/);
    expect(() => contourGrid(model, 0, 1, [0, 0], { points: 1 })).toThrow(/2 or more points/);
    expect(() => contourGrid(model, 0, 1, [0, 0], { reach: [0, 1] })).toThrow(/above 0/);
  });
});

describe('contourLevels: round steps of 1, 2 or 5 times a power of ten (Heckbert 1990, Graphics Gems)', () => {
  it('gives round levels strictly inside the range', () => {
    expect(contourLevels(71.3, 79.8, 8)).toEqual([72, 73, 74, 75, 76, 77, 78, 79]);
    expect(contourLevels(0.05, 0.95, 4)).toEqual([0.2, 0.4, 0.6, 0.8]);
    expect(contourLevels(-3, 3, 5)).toEqual([-2, -1, 0, 1, 2]);
    const many = contourLevels(12.34, 987.6, 8);
    expect(many.every((v) => v > 12.34 && v < 987.6)).toBe(true);
    expect(many.length).toBeGreaterThanOrEqual(5);
  });
  it('a flat surface has no lines; a bad count is refused', () => {
    expect(contourLevels(5, 5)).toEqual([]);
    expect(() => contourLevels(0, 1, 0)).toThrow(/1 or more/);
    expect(() => contourLevels(0, Infinity)).toThrow(/finite/);
  });
});
