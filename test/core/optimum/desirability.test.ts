import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkDesirability, desirability, overallDesirability, type DesirabilitySpec } from '../../../src/core/optimum/desirability.ts';
import { InputError } from '../../../src/core/errors.ts';

// Every expected number below follows from the definitions of Derringer and Suich (1980),
// Journal of Quality Technology 12, 214-219, worked by hand.
describe('desirability: the definitions at and beyond each limit', () => {
  const max: DesirabilitySpec = { name: 'Y1', goal: 'max', low: 60, high: 75 };
  const min: DesirabilitySpec = { name: 'Y2', goal: 'min', low: 2, high: 8 };
  const tgt: DesirabilitySpec = { name: 'Y3', goal: 'target', low: 9, target: 10, high: 11 };

  it('maximise: 0 at and below LOW, linear between, 1 at and above HIGH; shape r bends it', () => {
    expect(desirability(max, 50)).toBe(0);
    expect(desirability(max, 60)).toBe(0);
    expect(desirability(max, 67.5)).toBeCloseTo(0.5, 14);
    expect(desirability(max, 75)).toBe(1);
    expect(desirability(max, 99)).toBe(1);
    expect(desirability({ ...max, r: 2 }, 67.5)).toBeCloseTo(0.25, 14);
  });

  it('minimise is the mirror image', () => {
    expect(desirability(min, 0)).toBe(1);
    expect(desirability(min, 2)).toBe(1);
    expect(desirability(min, 6.5)).toBeCloseTo(0.25, 14);
    expect(desirability(min, 8)).toBe(0);
    expect(desirability(min, 12)).toBe(0);
    expect(desirability({ ...min, r: 0.5 }, 6.5)).toBeCloseTo(0.5, 14);
  });

  it('target: 0 outside [LOW, HIGH], 1 at T, shapes s below and t above', () => {
    expect(desirability(tgt, 8.9)).toBe(0);
    expect(desirability(tgt, 9)).toBe(0);
    expect(desirability(tgt, 9.5)).toBeCloseTo(0.5, 14);
    expect(desirability(tgt, 10)).toBe(1);
    expect(desirability(tgt, 10.75)).toBeCloseTo(0.25, 14);
    expect(desirability(tgt, 11)).toBe(0);
    expect(desirability(tgt, 11.1)).toBe(0);
    expect(desirability({ ...tgt, s: 2 }, 9.5)).toBeCloseTo(0.25, 14);
    expect(desirability({ ...tgt, t: 2 }, 10.5)).toBeCloseTo(0.25, 14);
  });

  it('property: d lies in [0, 1] and never decreases toward the goal', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 200, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: 0.2, max: 5, noNaN: true }), (y, dy, r) => {
        const a = desirability({ ...max, r }, y);
        const b = desirability({ ...max, r }, y + dy);
        expect(a).toBeGreaterThanOrEqual(0);
        expect(b).toBeLessThanOrEqual(1);
        expect(b).toBeGreaterThanOrEqual(a);
        expect(desirability({ ...min, r }, y - dy)).toBeGreaterThanOrEqual(desirability({ ...min, r }, y));
      }),
    );
  });

  it('overall D is the weighted geometric mean, and 0 when any d is 0', () => {
    expect(overallDesirability([0.25, 1], [1, 1])).toBeCloseTo(0.5, 14); // sqrt(0.25 x 1)
    expect(overallDesirability([0.25, 1], [2, 1])).toBeCloseTo(0.25 ** (2 / 3), 14); // (0.25^2 x 1)^(1/3)
    expect(overallDesirability([0.5, 0, 1], [1, 1, 1])).toBe(0);
    expect(overallDesirability([0.8], [3])).toBeCloseTo(0.8, 14);
  });

  it('bad settings are refused with what was needed and what came', () => {
    expect(() => checkDesirability({ ...max, low: 80 })).toThrow('Y1: needs LOW below HIGH, got 80 and 75');
    expect(() => checkDesirability({ ...tgt, target: 12 })).toThrow('Y3: needs LOW < T < HIGH, got 9, 12 and 11');
    expect(() => checkDesirability({ ...tgt, target: undefined })).toThrow(/needs a finite target/);
    expect(() => checkDesirability({ ...max, target: 70 })).toThrow(/needs the goal "target"/);
    expect(() => checkDesirability({ ...max, weight: 0 })).toThrow('Y1: the weight must be a number above 0, got 0');
    expect(() => checkDesirability({ ...max, s: 2 })).toThrow(/takes the shape r, not s or t/);
    expect(() => checkDesirability({ ...tgt, r: 2 })).toThrow(/shapes s \(below T\) and t \(above T\), not r/);
    expect(() => desirability(max, Number.NaN)).toThrow(InputError);
    expect(() => overallDesirability([], [])).toThrow(/at least one response/);
    expect(() => overallDesirability([1.2], [1])).toThrow(/between 0 and 1, got 1.2/);
  });
});
