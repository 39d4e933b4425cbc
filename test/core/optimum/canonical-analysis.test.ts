import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { canonicalAnalysis, surfaceNature } from '../../../src/core/optimum/canonical-analysis.ts';
import { surfaceGradient } from '../../../src/core/optimum/quadratic-surface.ts';
import { InputError } from '../../../src/core/errors.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { syntheticModel } from './helpers.ts';

describe('canonicalAnalysis: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2 (yield)', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const a = analyze(data, { terms: parseTerms('quadratic', data.factors) });
  const c = canonicalAnalysis(a.model);

  it('gives the printed stationary point, its fitted value and the eigenvalues', () => {
    // Printed (Montgomery 8th ed., section 11.3.2, Example 11.2 continued; from memory):
    // x_s = (0.389, 0.306), time 86.95 min, temperature 176.53 degF, y_s = 80.21,
    // lambda_1 = -0.9634, lambda_2 = -1.4141.
    const s = c.stationary!;
    expect(s.coded[0]).toBeCloseTo(0.389, 3);
    expect(s.coded[1]).toBeCloseTo(0.306, 3);
    expect(s.real[0]).toBeCloseTo(86.95, 2);
    expect(s.real[1]).toBeCloseTo(176.53, 2);
    expect(s.fit).toBeCloseTo(80.21, 2);
    expect(s.inside).toBe(true);
    expect(c.eigenvalues[0]).toBeCloseTo(-0.9634, 3);
    expect(c.eigenvalues[1]).toBeCloseTo(-1.4141, 3);
    expect(c.nature).toBe('maximum');
  });

  it('B holds the squares on its diagonal and half the interaction off it', () => {
    const t = Object.fromEntries(a.terms.map((e) => [e.letters, e.coef]));
    expect(c.surface.B[0][0]).toBe(t['A^2']);
    expect(c.surface.B[1][1]).toBe(t['B^2']);
    expect(c.surface.B[0][1]).toBe(t.AB / 2);
    expect(c.surface.B[1][0]).toBe(t.AB / 2);
    expect(c.surface.b).toEqual([t.A, t.B]);
  });
});

describe('canonicalAnalysis: properties', () => {
  it('the stationary point zeroes the gradient; the fit there is b0 + x_s\'b / 2 (Montgomery 8th ed., Eq. 11.8)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 0, max: 2 ** 31 - 1 }), (k, seed) => {
        const model = syntheticModel(k, seed);
        const c = canonicalAnalysis(model);
        if (!c.stationary) return;
        const g = surfaceGradient(c.surface, c.stationary.coded);
        const scale = Math.max(1, ...c.surface.b.map(Math.abs), ...c.surface.B.flat().map(Math.abs)) * Math.max(1, ...c.stationary.coded.map(Math.abs));
        for (const gi of g) expect(Math.abs(gi)).toBeLessThan(1e-8 * scale);
        const half = c.stationary.coded.reduce((s, x, i) => s + x * c.surface.b[i], 0) / 2;
        expect(c.stationary.fit).toBeCloseTo(c.surface.b0 + half, 6);
      }),
      { numRuns: 200 },
    );
  });

  it('nature follows the signs, and the ridge rule at 0.05 of the largest magnitude (the issue\'s rule)', () => {
    expect(surfaceNature([-1, -2])).toBe('maximum');
    expect(surfaceNature([2, 1])).toBe('minimum');
    expect(surfaceNature([1, -1])).toBe('saddle');
    expect(surfaceNature([-0.049, -1])).toBe('ridge');
    expect(surfaceNature([-0.05, -1])).toBe('maximum');
    expect(() => surfaceNature([0, 0])).toThrow(InputError);
    expect(() => surfaceNature([])).toThrow(InputError);
  });

  it('a singular B has no single stationary point; a categorical factor or a third-order term is refused', () => {
    // y = x1 - x2^2: B = diag(0, -1), singular
    const m = syntheticModel(2, 1, { b: [1, 0], B: [[0, 0], [0, -1]] });
    const c = canonicalAnalysis(m);
    expect(c.stationary).toBeNull();
    expect(c.nature).toBe('ridge');
    const cat = { ...m, factors: [m.factors[0], { kind: 'categorical' as const, name: 'Powder', letter: 'B', levels: ['matte', 'gloss'] as const }] };
    expect(() => canonicalAnalysis(cat)).toThrow(/numeric factors only; Powder is categorical/);
    const cubic = syntheticModel(3, 1);
    expect(() => canonicalAnalysis({ ...cubic, terms: [...cubic.terms.slice(0, -1), 0b111] })).toThrow(/order 1 and 2 only, got ABC/);
  });
});
