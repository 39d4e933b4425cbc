import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { squareTerm } from '../../../src/core/model/term.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const byLetters = (a: ReturnType<typeof analyze>) => Object.fromEntries(a.terms.map((t) => [t.letters, t]));

/** The reference fit: ml-regression-multivariate-linear 2.0.4 on columns built here by hand (intercept last in its output). */
function reference(data: ResponseData, columns: (x: readonly number[]) => number[]) {
  return new MLR(data.coded.map((r) => columns(r)), data.y.map((v) => [v]), { intercept: true, statistics: true });
}

describe('analyze with squares: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2 (central composite design, yield)', () => {
  // Coded on the factorial settings (80/90 min, 170/180 degF), so the axial runs sit at +-1.414 as printed.
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const terms = parseTerms('quadratic', data.factors);
  const a = analyze(data, { terms });
  const t = byLetters(a);
  // Columns x1, x2, x1 x2, x1^2, x2^2: the model order of compareTerms (interactions before squares).
  const ref = reference(data, (x) => [x[0], x[1], x[0] * x[1], x[0] * x[0], x[1] * x[1]]);

  it('takes the QR path and lists the terms in model order', () => {
    expect(a.method).toBe('qr');
    expect(a.terms.map((e) => e.letters)).toEqual(['A', 'B', 'AB', 'A^2', 'B^2']);
    expect(a.terms.map((e) => e.name)).toEqual(['Time', 'Temperature', 'Time:Temperature', 'Time^2', 'Temperature^2']);
  });

  it('coefficients and standard errors equal the reference library', () => {
    expect(a.intercept.coef).toBeCloseTo(ref.weights[5][0], 9);
    expect(a.intercept.se!).toBeCloseTo(ref.stdErrors[5], 9);
    a.terms.forEach((e, j) => {
      expect(e.coef).toBeCloseTo(ref.weights[j][0], 9);
      expect(e.se!).toBeCloseTo(ref.stdErrors[j], 9);
    });
    expect(a.sigma!).toBeCloseTo(ref.stdError, 9);
    expect(a.df.residual).toBe(13 - 6);
  });

  it('matches the printed fitted model (Montgomery 8th ed., Example 11.2, from memory)', () => {
    // Printed: yhat = 79.94 + 0.99 x1 + 0.52 x2 - 1.38 x1^2 - 1.00 x2^2 + 0.25 x1 x2 (from memory)
    expect(a.intercept.coef).toBeCloseTo(79.94, 2);
    expect(t.A.coef).toBeCloseTo(0.99, 1);
    expect(t.B.coef).toBeCloseTo(0.52, 1);
    expect(t.AB.coef).toBeCloseTo(0.25, 2);
    expect(t['A^2'].coef).toBeCloseTo(-1.38, 1);
    expect(t['B^2'].coef).toBeCloseTo(-1.0, 1);
  });

  it('pure error from the five center runs, and the half-normal chart holds no square', () => {
    // 4 pure-error df from 5 center runs; lack of fit 7 - 4 = 3 df (by counting)
    expect(a.df.pureError).toBe(4);
    expect(a.df.lackOfFit).toBe(3);
    expect(a.halfNormal.map((e) => e.letters)).not.toContain('A^2');
    expect(a.halfNormal.map((e) => e.letters).sort()).toEqual(['A', 'AB', 'B']);
  });
});

describe('analyze with a square on a two-level design with center points (Montgomery 8th ed., section 6.8 data)', () => {
  const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
  const A2 = squareTerm(0, data.factors);
  const B2 = squareTerm(1, data.factors);

  it('any square leaves the Yates path; the square estimates ybar_F - ybar_C, the curvature estimate', () => {
    expect(analyze(data, { terms: [1, 2, 3] }).method).toBe('yates');
    const a = analyze(data, { terms: [1, 2, 3, A2] });
    expect(a.method).toBe('qr');
    // Montgomery 8th ed., section 6.8: ybar_F = 40.425, ybar_C = 40.46, so ybar_F - ybar_C = -0.035
    expect(byLetters(a)['A^2'].coef).toBeCloseTo(-0.035, 10);
    expect(byLetters(a)['A^2'].coef).toBeCloseTo(a.curvature!.estimate, 10);
    const ref = reference(data, (x) => [x[0], x[1], x[0] * x[1], x[0] * x[0]]);
    a.terms.forEach((e, j) => expect(e.se!).toBeCloseTo(ref.stdErrors[j], 10));
  });

  it('two squares cannot be separated by these runs: B^2 is reported as aliased with A^2', () => {
    const a = analyze(data, { terms: [1, 2, A2, B2] });
    expect(a.terms.map((e) => e.letters)).toEqual(['A', 'B', 'A^2']);
    expect(a.aliased).toHaveLength(1);
    expect(a.aliased[0].letters).toBe('B^2');
    expect(a.aliased[0].combination).toEqual([{ name: 'Time^2', letters: 'A^2', weight: 1 }]);
  });

  it('refuses a square of two factors or of a factor the study lacks, before fitting', () => {
    expect(() => analyze(data, { terms: [1, A2 | 2] })).toThrow(/squares inside interactions/);
    expect(() => analyze(data, { terms: [1, squareTerm(2)] })).toThrow(/refers to a factor the study does not have/);
  });
});
