import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { curvature, runKinds } from '../../../src/core/fit/curvature.ts';
import { pureError } from '../../../src/core/fit/pure-error.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { CENTER_TOLERANCE } from '../../../src/core/tolerance.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('runKinds', () => {
  const factors = defineFactors([
    { kind: 'numeric', name: 'Time', low: 30, high: 40 },
    { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  ]);
  it('factorial at +-1 (within CENTER_TOLERANCE), center with numeric factors at 0 and categorical ones at either level, else other', () => {
    expect(CENTER_TOLERANCE).toBe(0.1); // our own choice: 5% of the range either side
    expect(runKinds(factors, [[1, -1], [-0.95, 1], [0, 1], [0.05, -1], [0.5, 1], [0, 0]])).toEqual(['factorial', 'factorial', 'center', 'center', 'other', 'other']);
  });
  it('degenerate input: no runs give no kinds', () => {
    expect(runKinds(factors, [])).toEqual([]);
  });
});

describe('curvature (Montgomery 8th ed., section 6.8, Eq. 6.30)', () => {
  const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
  const kinds = runKinds(d.factors, d.coded);
  const c = curvature(kinds, d.y, pureError(d.coded, d.y, null))!;

  it('the printed example: ybar_F = 40.425, ybar_C = 40.46, SS_pure quadratic = 0.0027', () => {
    expect(c.nFactorial).toBe(4);
    expect(c.nCenter).toBe(5);
    expect(c.estimate).toBeCloseTo(40.425 - 40.46, 12);
    expect(c.ss).toBeCloseTo((4 * 5 * 0.035 ** 2) / 9, 12); // 0.0027222
  });

  it("t^2 equals the printed F = SS / MS_E = 0.0027 / 0.0430, and p agrees with jstat's t distribution on 4 df", () => {
    expect(c.t! ** 2).toBeCloseTo(c.ss / 0.043, 10);
    expect(c.p!).toBeCloseTo(2 * (1 - jStat.studentt.cdf(Math.abs(c.t!), 4)), 10);
  });

  it('degenerate input: null without center runs; no se without pure error; no t when pure error is zero', () => {
    expect(curvature(['factorial', 'factorial'], [1, 2], { ss: 0, df: 0 })).toBeNull();
    expect(curvature(['center', 'center'], [1, 2], { ss: 0.5, df: 1 })).toBeNull();
    const noPe = curvature(['factorial', 'factorial', 'center'], [1, 3, 5], { ss: 0, df: 0 })!;
    expect(noPe.estimate).toBe(-3);
    expect(noPe.se).toBeNull();
    expect(noPe.p).toBeNull();
    const zero = curvature(['factorial', 'factorial', 'center', 'center'], [1, 3, 5, 5], { ss: 0, df: 1 })!;
    expect(zero.se).toBe(0);
    expect(zero.t).toBeNull();
  });
});
