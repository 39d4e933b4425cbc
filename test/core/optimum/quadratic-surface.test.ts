import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { InputError } from '../../../src/core/errors.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { quadraticSurface, surfaceGradient, surfaceValue } from '../../../src/core/optimum/quadratic-surface.ts';
import { compilePredictor } from '../../../src/core/predict/compiled-predictor.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { syntheticModel } from './helpers.ts';

describe('quadraticSurface: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2 (yield)', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const model = analyze(data, { terms: parseTerms('quadratic', data.factors) }).model;
  const s = quadraticSurface(model);

  it('has the printed second-order model (section 11.3.2, from memory: 79.94 + 0.995 x1 + 0.515 x2 - 1.376 x1^2 - 1.001 x2^2 + 0.25 x1x2)', () => {
    expect(s.b0).toBeCloseTo(79.94, 2);
    expect(s.b[0]).toBeCloseTo(0.995, 3);
    expect(s.b[1]).toBeCloseTo(0.515, 3);
    expect(s.B[0][0]).toBeCloseTo(-1.376, 3);
    expect(s.B[1][1]).toBeCloseTo(-1.001, 3);
    expect(s.B[0][1]).toBeCloseTo(0.125, 3);
    expect(s.B[1][0]).toBe(s.B[0][1]);
  });

  it('gives the same fitted value as the model\'s own predictor at every design point', () => {
    const predictor = compilePredictor(model);
    for (const x of [[-1, -1], [1, -1], [-1, 1], [1, 1], [0, 0], [1.414, 0], [0, -1.414], [0.3, 0.7]]) {
      expect(surfaceValue(s, x)).toBeCloseTo(predictor.fit(x), 10);
    }
  });
});

describe('quadraticSurface: the definitions (invented models)', () => {
  it('reads the doc example: b from the main effects, the squares on the diagonal, half of each interaction off it', () => {
    const m = syntheticModel(2, 1, { b0: 80, b: [1, 0.5], B: [[-1.4, 0.125], [0.125, -1]] });
    const s = quadraticSurface(m);
    expect(s.b0).toBe(80);
    expect(s.b).toEqual([1, 0.5]);
    expect(s.B).toEqual([[-1.4, 0.125], [0.125, -1]]);
    expect(surfaceValue(s, [0, 0])).toBe(80);
    // 80 + 1 + 0.5 - 1.4 - 1 + 2 * 0.125 = 79.35 (by hand)
    expect(surfaceValue(s, [1, 1])).toBeCloseTo(79.35, 12);
  });

  it('the gradient b + 2Bx matches central differences of the value (property, 3 to 6 factors)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 6 }), fc.integer({ min: 1, max: 1e6 }), fc.array(fc.double({ min: -2, max: 2, noNaN: true }), { minLength: 6, maxLength: 6 }), (k, seed, raw) => {
        const s = quadraticSurface(syntheticModel(k, seed));
        const x = raw.slice(0, k);
        const g = surfaceGradient(s, x);
        const h = 1e-5;
        for (let i = 0; i < k; i++) {
          const up = x.slice();
          const down = x.slice();
          up[i] += h;
          down[i] -= h;
          // A quadratic's central difference is exact up to round-off.
          expect(g[i]).toBeCloseTo((surfaceValue(s, up) - surfaceValue(s, down)) / (2 * h), 5);
        }
      }),
      { numRuns: 50 },
    );
  });

  it('refuses a third-order term, with a message', () => {
    const data = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
    const threeWay = analyze(data, { terms: parseTerms('A*B*C', data.factors) }).model;
    expect(() => quadraticSurface(threeWay)).toThrow(InputError);
    expect(() => quadraticSurface(threeWay)).toThrow(/order 1 and 2 only/);
  });
});
