import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boxExtreme, boxOptimum, boxTarget, MAX_BOX_FACTORS } from '../../../src/core/optimum/box-optimum.ts';
import { quadraticSurface, surfaceValue, type QuadraticSurface } from '../../../src/core/optimum/quadratic-surface.ts';
import { pcg32 } from '../../../src/core/design/random.ts';
import { InputError } from '../../../src/core/errors.ts';
import { syntheticModel, uniform } from './helpers.ts';

const surface = (b0: number, b: number[], B: number[][]): QuadraticSurface => ({ b0, b, B, factors: [] });

describe('boxExtreme: hand-worked cases', () => {
  it('an interior maximum: y = x1 - x1^2 - x2^2 peaks at (0.5, 0) with 0.25 (calculus: dy/dx1 = 1 - 2 x1 = 0)', () => {
    const r = boxExtreme(surface(0, [1, 0], [[-1, 0], [0, -1]]), 'max');
    expect(r.coded[0]).toBeCloseTo(0.5, 12);
    expect(r.coded[1]).toBeCloseTo(0, 12);
    expect(r.fit).toBeCloseTo(0.25, 12);
  });

  it('a saddle whose optimum lies on an edge: y = 0.3 x1 + x1^2 - x2^2 - 0.5 x2 (by hand: x1 = +1, x2 = -0.25, y = 1.3625)', () => {
    // On the edge x1 = 1: y = 1.3 - x2^2 - 0.5 x2, stationary at x2 = -0.25 -> 1.3 + 0.0625
    const r = boxExtreme(surface(0, [0.3, -0.5], [[1, 0], [0, -1]]), 'max');
    expect(r.coded[0]).toBeCloseTo(1, 12);
    expect(r.coded[1]).toBeCloseTo(-0.25, 12);
    expect(r.fit).toBeCloseTo(1.3625, 12);
  });

  it('a tie is broken by the point nearest the center: y = x1^2 - x2^2 has its maximum 1 at (+-1, 0)', () => {
    const r = boxExtreme(surface(0, [0, 0], [[1, 0], [0, -1]]), 'max');
    expect(Math.abs(r.coded[0])).toBe(1);
    expect(r.coded[1]).toBe(0);
    const m = boxExtreme(surface(0, [0, 0], [[1, 0], [0, -1]]), 'min');
    expect(m.coded[0]).toBe(0);
    expect(Math.abs(m.coded[1])).toBe(1);
  });

  it('refuses no factors and more than MAX_BOX_FACTORS', () => {
    expect(() => boxExtreme(surface(0, [], []), 'max')).toThrow(InputError);
    const k = MAX_BOX_FACTORS + 1;
    const big = surface(0, new Array(k).fill(0), Array.from({ length: k }, () => new Array(k).fill(0)));
    expect(() => boxExtreme(big, 'max')).toThrow(/up to 10 factors, got 11/);
  });
});

describe('boxOptimum: properties on invented surfaces', () => {
  it('the box optimum is no worse than any of many random points in the box', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.boolean(), (k, seed, max) => {
        const s = quadraticSurface(syntheticModel(k, seed));
        const r = boxExtreme(s, max ? 'max' : 'min');
        expect(r.coded.every((v) => Math.abs(v) <= 1)).toBe(true);
        const rng = pcg32(seed + 1);
        let beyond = -Infinity; // the most any random point beats the optimum by
        for (let i = 0; i < 500; i++) {
          const x = Array.from({ length: k }, () => uniform(rng, -1, 1));
          const v = surfaceValue(s, x);
          beyond = Math.max(beyond, max ? v - r.fit : r.fit - v);
        }
        expect(beyond).toBeLessThanOrEqual(1e-9);
      }),
      { numRuns: 150 },
    );
  }, 60_000);

  it('a target inside the range is met, and no point nearer the center crosses it', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.double({ min: 0.05, max: 0.95, noNaN: true }), (k, seed, q) => {
        const s = quadraticSurface(syntheticModel(k, seed));
        const lo = boxExtreme(s, 'min').fit;
        const hi = boxExtreme(s, 'max').fit;
        const target = lo + q * (hi - lo);
        const r = boxTarget(s, target);
        expect(r.fit).toBeCloseTo(target, 6);
        const radius = Math.sqrt(r.coded.reduce((a, v) => a + v * v, 0));
        const side = Math.sign(s.b0 - target);
        const rng = pcg32(seed + 7);
        let crossed = 0; // random points nearer the center on the other side of the target
        for (let i = 0; i < 400; i++) {
          const dir = Array.from({ length: k }, () => uniform(rng, -1, 1));
          const n = Math.sqrt(dir.reduce((a, v) => a + v * v, 0));
          const t = uniform(rng, 0, 0.999) * radius;
          const x = dir.map((v) => (v / n) * t);
          if (x.some((v) => Math.abs(v) > 1)) continue;
          if (Math.sign(surfaceValue(s, x) - target) * side < 0) crossed++;
        }
        expect(crossed).toBe(0);
      }),
      { numRuns: 150 },
    );
  }, 60_000);

  it('a target beyond the range gives the box extreme; a non-finite target is refused', () => {
    const s = surface(0, [1, 0], [[0, 0], [0, 0]]);
    const r = boxOptimum(s, { kind: 'target', target: 2 });
    expect(r.coded).toEqual([1, 0]);
    expect(r.fit).toBe(1);
    const half = boxOptimum(s, { kind: 'target', target: 0.5 });
    expect(half.coded[0]).toBeCloseTo(0.5, 9);
    expect(half.coded[1]).toBeCloseTo(0, 9);
    expect(() => boxTarget(s, Number.NaN)).toThrow(/finite number, got NaN/);
  });
});
