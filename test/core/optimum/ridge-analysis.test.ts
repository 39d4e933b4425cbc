import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ridgeAnalysis, ridgePoint } from '../../../src/core/optimum/ridge-analysis.ts';
import { quadraticSurface, surfaceValue, type QuadraticSurface } from '../../../src/core/optimum/quadratic-surface.ts';
import { pcg32 } from '../../../src/core/design/random.ts';
import { InputError } from '../../../src/core/errors.ts';
import { syntheticModel, uniform } from './helpers.ts';

const surface = (b0: number, b: number[], B: number[][]): QuadraticSurface => ({ b0, b, B, factors: [] });
const norm = (x: readonly number[]) => Math.sqrt(x.reduce((a, v) => a + v * v, 0));

describe('ridgePoint: hand-worked cases', () => {
  it('a plane y = x1 + x2 rises fastest along (1, 1)/sqrt2 (by hand)', () => {
    const x = ridgePoint(surface(0, [1, 1], [[0, 0], [0, 0]]), 2, 'max');
    expect(x[0]).toBeCloseTo(Math.SQRT2, 12);
    expect(x[1]).toBeCloseTo(Math.SQRT2, 12);
  });

  it('the hard case: y = -x1^2 + x2^2 (b = 0) is highest on the x2 axis and lowest on the x1 axis (by hand)', () => {
    const s = surface(0, [0, 0], [[-1, 0], [0, 1]]);
    const hi = ridgePoint(s, 0.5, 'max');
    expect(Math.abs(hi[0])).toBeLessThan(1e-12);
    expect(Math.abs(hi[1])).toBeCloseTo(0.5, 12);
    const lo = ridgePoint(s, 0.5, 'min');
    expect(Math.abs(lo[0])).toBeCloseTo(0.5, 12);
    expect(Math.abs(lo[1])).toBeLessThan(1e-12);
  });

  it('radius 0 is the center; a negative or non-finite radius is refused', () => {
    expect(ridgePoint(surface(0, [1], [[1]]), 0, 'max')).toEqual([0]);
    expect(() => ridgePoint(surface(0, [1], [[1]]), -1, 'max')).toThrow(InputError);
    expect(() => ridgePoint(surface(0, [1], [[1]]), Infinity, 'max')).toThrow(/finite number of 0 or more/);
  });
});

describe('ridgePoint and ridgeAnalysis: properties on invented surfaces', () => {
  it('ridge points lie on their spheres and no random point on the sphere beats them', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.double({ min: 0.05, max: 3, noNaN: true }), fc.boolean(), (k, seed, r, max) => {
        const s = quadraticSurface(syntheticModel(k, seed));
        const x = ridgePoint(s, r, max ? 'max' : 'min');
        expect(norm(x)).toBeCloseTo(r, 9);
        const best = surfaceValue(s, x);
        const rng = pcg32(seed + 3);
        let beyond = -Infinity; // the most any random point on the sphere beats the ridge point by
        for (let i = 0; i < 300; i++) {
          const d = Array.from({ length: k }, () => uniform(rng, -1, 1));
          const n = norm(d);
          const v = surfaceValue(s, d.map((e) => (e / n) * r));
          beyond = Math.max(beyond, max ? v - best : best - v);
        }
        expect(beyond).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(best)));
      }),
      { numRuns: 200 },
    );
  }, 60_000);

  it('the table runs 0.1, 0.2, ... up to the largest radius, with the fit and intervals of the model', () => {
    const m = syntheticModel(2, 11);
    const t = ridgeAnalysis(m, 'max', 1.414);
    expect(t.map((p) => p.radius)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1, 1.1, 1.2, 1.3, 1.4]);
    for (const p of t) {
      expect(p.fit).toBeCloseTo(surfaceValue(quadraticSurface(m), p.coded), 9);
      expect(p.pi![0]).toBeLessThan(p.fit);
      expect(p.pi![1]).toBeGreaterThan(p.fit);
      // coded -> real: factors run 10..20, so real = 15 + 5 x coded
      p.coded.forEach((c, i) => expect(p.real[i]).toBeCloseTo(15 + 5 * c, 9));
    }
    expect(() => ridgeAnalysis(m, 'max', 0)).toThrow(/largest radius above 0, got 0/);
  });
});
