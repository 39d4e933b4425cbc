import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
import { squareTerm } from '../../../src/core/model/term.ts';
import { cachedPredictor, compilePredictor, type PointInterval } from '../../../src/core/predict/compiled-predictor.ts';
import { InputError } from '../../../src/core/errors.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { fullFactorial, handModel, lcg, numeric, responseData } from './designs.ts';
import { jstatT, referenceColumnsModel, referenceModel } from './reference.ts';

function expectSame(got: PointInterval, ref: ReturnType<ReturnType<typeof referenceModel>['at']>, scale: number) {
  const tol = 1e-8 * scale;
  expect(Math.abs(got.fit - ref.fit)).toBeLessThan(tol);
  expect(Math.abs(got.se! - ref.se)).toBeLessThan(tol);
  expect(Math.abs(got.ciLo! - ref.ci[0])).toBeLessThan(tol);
  expect(Math.abs(got.ciHi! - ref.ci[1])).toBeLessThan(tol);
  expect(Math.abs(got.piLo! - ref.pi[0])).toBeLessThan(tol);
  expect(Math.abs(got.piHi! - ref.pi[1])).toBeLessThan(tol);
}

const points = (k: number, seed: number, count = 12) => {
  const r = lcg(seed);
  return Array.from({ length: count }, () => Array.from({ length: k }, () => (r() - 0.5) * 3)); // some beyond +-1
};

describe('compilePredictor against ml-regression-multivariate-linear 2.0.4 (se_fit = sqrt(x0\' Cov x0)) and jstat t quantiles, intervals per Montgomery 8th ed., Eqs. 10.39-10.41', () => {
  it('orthogonal: Montgomery 8th ed., Example 6.1 plasma etch (2^3, n = 2) under the full model; the covariance is diagonal', () => {
    const data = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
    const terms = termsUpToOrder(3, 3);
    const p = compilePredictor(analyze(data, { terms }).model);
    expect(p.diagonal).toBe(true);
    // 8 residual df (Montgomery Table 6.6); jstat 1.9.6's t quantile is accurate to about 1e-9 relative
    expect(Math.abs(p.tValue! / jstatT(0.975, 8) - 1)).toBeLessThan(1e-8);
    const ref = referenceModel(data, terms);
    for (const x of points(3, 1)) expectSame(p.interval(x), ref.at(x), 1000);
  });

  it('orthogonal with center runs: Montgomery 8th ed., section 6.8 yield data, main effects', () => {
    const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const terms = [1, 2];
    const p = compilePredictor(analyze(data, { terms }).model);
    expect(p.diagonal).toBe(true);
    // Montgomery 8th ed., section 11.2: yhat = 40.44 + 0.775 x1 + 0.325 x2
    expect(p.fit([1, 1])).toBeCloseTo(364 / 9 + 0.775 + 0.325, 10);
    const ref = referenceModel(data, terms);
    for (const x of points(2, 2)) expectSame(p.interval(x), ref.at(x), 100);
  });

  it('non-orthogonal: a 2^4 less 3 runs, off-target settings and 3 center runs (invented response), order-2 model', () => {
    const r = lcg(7);
    const coded = [...fullFactorial(4).filter((_, i) => ![2, 9, 13].includes(i)), [0, 0, 0, 0], [0, 0, 0, 0], [0, 0, 0, 0]].map((row) =>
      row.map((v) => v + (r() - 0.5) * 0.2),
    );
    const y = coded.map((x) => 20 + 3 * x[0] - 2 * x[1] + 1.5 * x[0] * x[2] + r() * 2); // invented
    const data = responseData([numeric('A'), numeric('B'), numeric('C'), numeric('D')], coded, y);
    const terms = termsUpToOrder(4, 2);
    const a = analyze(data, { terms });
    const p = compilePredictor(a.model);
    expect(p.diagonal).toBe(false);
    const ref = referenceModel(data, terms);
    for (const x of points(4, 3)) expectSame(p.interval(x), ref.at(x), 100);
    // x0' C x0 at a run is its leverage (Montgomery 8th ed., section 10.7): agrees with the analysis
    coded.forEach((x, i) => expect(p.varianceFactor(x)).toBeCloseTo(a.runs[i].leverage, 10));
  });

  it('blocks: the prediction is for an average block (block columns 0), as the reference with the same effect coding', () => {
    const r = lcg(11);
    const coded = [...fullFactorial(3), ...fullFactorial(3)];
    const blocks = coded.map((_, i) => (i < 8 ? 1 : 2));
    const y = coded.map((x, i) => 50 + 4 * x[0] + x[1] + (i < 8 ? 3 : -3) + r()); // invented
    const data = responseData([numeric('A'), numeric('B'), numeric('C')], coded, y, blocks);
    const terms = termsUpToOrder(3, 2);
    const p = compilePredictor(analyze(data, { terms }).model);
    const ref = referenceModel(data, terms);
    for (const x of points(3, 4)) expectSame(p.interval(x), ref.at(x), 100);
  });

  it('many factors, main effects only (term-by-term products instead of the subset table), random settings (invented response)', () => {
    const r = lcg(5);
    const k = 9;
    const coded = Array.from({ length: 30 }, () => Array.from({ length: k }, () => (r() < 0.5 ? -1 : 1) + (r() - 0.5) * 0.1));
    const y = coded.map((x) => x.reduce((s, v, i) => s + (i + 1) * v, 0) + r()); // invented
    const data = responseData(Array.from({ length: k }, (_, i) => numeric(`F${i + 1}`)), coded, y);
    const terms = termsUpToOrder(k, 1);
    const p = compilePredictor(analyze(data, { terms }).model);
    const ref = referenceModel(data, terms);
    for (const x of points(k, 6)) expectSame(p.interval(x), ref.at(x), 100);
  });

  it('property: random non-orthogonal designs and models agree with the reference (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 5 }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 2 ** 31 - 1 }), (k, order, seed) => {
        const r = lcg(seed);
        const terms = termsUpToOrder(k, Math.min(order, k));
        const n = terms.length + 1 + 4 + Math.floor(r() * 6);
        const coded = Array.from({ length: n }, () => Array.from({ length: k }, () => (r() - 0.5) * 2.2));
        const y = coded.map((x) => 10 + 5 * x[0] - 3 * x[1] + r() * 3); // invented
        const data = responseData(Array.from({ length: k }, (_, i) => numeric(`F${i + 1}`)), coded, y);
        const p = compilePredictor(analyze(data, { terms }).model);
        const ref = referenceModel(data, terms);
        for (const x of points(k, seed + 1, 3)) expectSame(p.interval(x), ref.at(x), 1e4);
      }),
      { numRuns: 60 },
    );
  });

  it('fills a given result object without allocating another, and remembers compiled models', () => {
    const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const model = analyze(data, { terms: [1, 2] }).model;
    const p = compilePredictor(model);
    const out: PointInterval = { fit: 0, se: null, ciLo: null, ciHi: null, piLo: null, piHi: null };
    expect(p.interval([0.5, -0.5], out)).toBe(out);
    expect(out.fit).toBeCloseTo(364 / 9 + 0.775 * 0.5 - 0.325 * 0.5, 12); // Montgomery 8th ed., section 11.2 model
    expect(cachedPredictor(model)).toBe(cachedPredictor(model));
    expect(cachedPredictor(model, 0.9)).not.toBe(cachedPredictor(model));
  });

  it('residual df 0: fit only, intervals null (Montgomery 8th ed., Example 6.2, unreplicated 2^4 under the full model)', () => {
    const data = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', {
      factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'],
      response: 'Filtration rate',
    });
    const p = compilePredictor(analyze(data, { terms: termsUpToOrder(4, 4) }).model);
    expect(p.tValue).toBeNull();
    const r = p.interval([0, 0, 0, 0]);
    expect(r.fit).toBeCloseTo(70.0625, 10); // the intercept (Montgomery Table 6.11 data: mean 70.06)
    expect([r.se, r.ciLo, r.ciHi, r.piLo, r.piHi]).toEqual([null, null, null, null, null]);
  });

  it('degenerate: an intercept-only model; inconsistent models, a bad level and a wrong number of settings throw InputError', () => {
    const only = handModel([numeric('A')], [], [7], { n: 4 });
    const r = compilePredictor(only).interval([0.3]);
    expect(r.fit).toBe(7);
    expect(r.se).toBeCloseTo(Math.sqrt(1 / 4), 15); // sigma sqrt(1/n), by hand
    expect(Math.abs((r.piHi! - r.fit) / (jstatT(0.975, 3) * Math.sqrt(1 + 1 / 4)) - 1)).toBeLessThan(1e-8); // jstat 1.9.6, to its accuracy
    const good = handModel([numeric('A'), numeric('B')], [1, 2], [1, 2, 3]);
    expect(() => compilePredictor({ ...good, coef: Float64Array.from([1, 2]) })).toThrow(/needs 3 coefficients/);
    expect(() => compilePredictor({ ...good, covUnscaled: new Float64Array(4) })).toThrow(/3 x 3 covariance/);
    expect(() => compilePredictor({ ...good, terms: [1, 4] })).toThrow(/refers to a factor/);
    expect(() => compilePredictor({ ...good, coef: Float64Array.from([1, Number.NaN, 3]) })).toThrow(/finite number/);
    expect(() => compilePredictor({ ...good, factors: [] })).toThrow(InputError);
    expect(() => compilePredictor(good, 1)).toThrow(/between 0 and 1/);
    expect(() => compilePredictor(good).fit([1])).toThrow(/needs 2 coded settings/);
  });
});

describe('compilePredictor with squares, against ml-regression-multivariate-linear 2.0.4 on columns written by hand', () => {
  it('central composite design (Montgomery 8th ed., Example 11.2 yield), full quadratic model: subset-table path', () => {
    const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
    const p = compilePredictor(analyze(data, { terms: parseTerms('quadratic', data.factors) }).model);
    expect(p.diagonal).toBe(false); // the squares are correlated with the intercept
    const ref = referenceColumnsModel(data, (x) => [x[0], x[1], x[0] * x[1], x[0] * x[0], x[1] * x[1]]);
    for (const x of points(2, 21)) expectSame(p.interval(x), ref.at(x), 100);
  });

  it('five factors with two squares (term-by-term path), three-level random settings (invented response)', () => {
    const r = lcg(31);
    const k = 5;
    const coded = Array.from({ length: 30 }, () => Array.from({ length: k }, () => Math.floor(r() * 3) - 1 + (r() - 0.5) * 0.05));
    const y = coded.map((x) => 10 + 2 * x[0] - x[2] - 3 * x[0] * x[0] + 1.5 * x[2] * x[2] + r()); // invented
    const data = responseData(Array.from({ length: k }, (_, i) => numeric(`F${i + 1}`)), coded, y);
    const terms = [...termsUpToOrder(k, 1), squareTerm(0, data.factors), squareTerm(2, data.factors)];
    const p = compilePredictor(analyze(data, { terms }).model);
    const ref = referenceColumnsModel(data, (x) => [...x, x[0] * x[0], x[2] * x[2]]);
    for (const x of points(k, 22)) expectSame(p.interval(x), ref.at(x), 100);
  });

  it('refuses a model holding the square of a categorical factor', () => {
    const good = handModel([numeric('A'), { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] }], [1, 2], [1, 2, 3]);
    expect(() => compilePredictor({ ...good, terms: [1, squareTerm(1)] })).toThrow(/Powder is categorical/);
  });
});
