import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { compareConfirmation } from '../../../src/core/predict/confirm-runs.ts';
import { parseSettings } from '../../../src/core/predict/parse-settings.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

// Montgomery, Design and Analysis of Experiments, 8th ed., section 6.8: 2^2 with 5 center runs,
// time 30..40 min, temperature 150..160 degF; first-order model y-hat = 40.44 + 0.775 x1 + 0.325 x2.
const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const model = analyze(data, { terms: [1, 2] }).model;

// Hand computation of the interval for the mean of m new runs,
//   y-hat +- t(0.975, df) s sqrt(1/m + x0'(X'X)^-1 x0)
// (Montgomery 8th ed., section 10.6; Myers, Montgomery and Anderson-Cook, 3rd ed., section 2.8;
// both from memory). The columns 1, x1, x2 are orthogonal with X'X = diag(9, 4, 4), so
// x0'(X'X)^-1 x0 = 1/9 + x1^2/4 + x2^2/4. The residual sum of squares of the first-order model
// pools SS_AB 0.0025, SS_curvature 0.0027 and SS_pure error 0.1720 of Montgomery's ANOVA for this
// example (section 6.8): 0.1772 on 6 df.
const SSE = 0.0025 + 0.0027 + 0.172; // Montgomery 8th ed., section 6.8, ANOVA table (printed to 4 decimals)
const DF = 6; // 9 runs - 3 coefficients
const S = Math.sqrt(SSE / DF);
const T = jStat.studentt.inv(0.975, DF); // 2.447 in a t table (NIST/SEMATECH e-Handbook, section 1.3.6.7.2)
const FIT_AT_11 = 364 / 9 + 0.775 + 0.325; // Montgomery 8th ed., section 6.8: intercept = mean of the 9 runs

describe('compareConfirmation: interval for the mean of m new runs (hand computation)', () => {
  const at = parseSettings(model.factors, { Time: 40, Temperature: 160 });

  it('three runs at (1, 1) near the prediction: confirmed, with the hand-computed interval', () => {
    const c = compareConfirmation(model, at, [41.2, 41.8, 41.6]); // readings invented for the test
    const half = T * S * Math.sqrt(1 / 3 + 1 / 9 + 1 / 4 + 1 / 4);
    expect(T).toBeCloseTo(2.447, 3); // t table, 6 df (NIST/SEMATECH e-Handbook, section 1.3.6.7.2)
    expect(c.m).toBe(3);
    expect(c.mean).toBeCloseTo(124.6 / 3, 12);
    expect(c.fit).toBeCloseTo(FIT_AT_11, 10);
    expect(c.varianceFactor).toBeCloseTo(1 / 9 + 1 / 4 + 1 / 4, 12);
    expect(c.dfResidual).toBe(DF);
    // The printed sums of squares carry 4 decimals, so s agrees to about 1e-4.
    expect(c.sigma!).toBeCloseTo(S, 3);
    expect(c.halfWidth!).toBeCloseTo(half, 3);
    expect(c.interval![0]).toBeCloseTo(FIT_AT_11 - half, 3);
    expect(c.interval![1]).toBeCloseTo(FIT_AT_11 + half, 3);
    expect(c.outcome).toBe('confirmed');
    expect(c.caution).toEqual(CAUTION);
  });

  it('the interval narrows with m but never below the model part: 1/m + q', () => {
    const one = compareConfirmation(model, at, [41.5]);
    const ten = compareConfirmation(model, at, Array.from({ length: 10 }, () => 41.5));
    expect(one.halfWidth!).toBeCloseTo(T * S * Math.sqrt(1 + 1 / 9 + 1 / 2), 3);
    expect(ten.halfWidth!).toBeCloseTo(T * S * Math.sqrt(1 / 10 + 1 / 9 + 1 / 2), 3);
    expect(ten.halfWidth!).toBeLessThan(one.halfWidth!);
  });

  it('a mean outside the interval is not confirmed (at the center, q = 1/9)', () => {
    const center = parseSettings(model.factors, { Time: 35, Temperature: 155 });
    const half = T * S * Math.sqrt(1 / 2 + 1 / 9);
    const c = compareConfirmation(model, center, [41.3, 41.5]); // invented readings, about 1 unit above 40.44
    expect(c.fit).toBeCloseTo(364 / 9, 10);
    expect(c.halfWidth!).toBeCloseTo(half, 3);
    expect(c.mean - c.fit).toBeGreaterThan(half);
    expect(c.outcome).toBe('not-confirmed');
  });

  it('a saturated model (no residual df) gives no interval and says so', () => {
    // The four corner runs of the same data with A, B and AB: 4 coefficients from 4 runs.
    const sat = analyze({ ...data, coded: data.coded.slice(0, 4), y: data.y.slice(0, 4), labels: data.labels.slice(0, 4), points: null }, { terms: [1, 2, 3] }).model;
    expect(sat.dfResidual).toBe(0);
    const c = compareConfirmation(sat, at, [41.5]);
    expect(c.outcome).toBe('no-noise');
    expect(c.interval).toBeNull();
  });

  it('degenerate input is refused with a message', () => {
    expect(() => compareConfirmation(model, at, [])).toThrow(InputError);
    expect(() => compareConfirmation(model, at, [])).toThrow(/at least one confirmation run/);
    expect(() => compareConfirmation(model, at, [Number.NaN])).toThrow(/finite reading/);
    expect(() => compareConfirmation(model, at.slice(0, 1), [41])).toThrow(/one setting per factor \(2\)/);
    expect(() => compareConfirmation(model, at, [41], 1)).toThrow(/between 0 and 1/);
  });
});
