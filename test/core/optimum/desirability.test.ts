import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkDesirability, desirability, overallDesirability, type DesirabilitySpec } from '../../../src/core/optimum/desirability.ts';
import { InputError } from '../../../src/core/errors.ts';
import { desirabilityAt, maximizeDesirability } from '../../../src/core/optimum/desirability-search.ts';
import { syntheticModel } from './helpers.ts';

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

// Derringer and Suich (1980), Journal of Quality Technology 12, 214-219: the tire tread compound,
// four responses fitted as full quadratics in three coded factors (silica x1, silane x2, sulfur
// x3) from a 20-run central composite design. Goals as printed: PICO abrasion index y1 maximize,
// d = 0 at 120 and 1 at 170; 200% modulus y2 maximize, 1000 to 1300; elongation at break y3
// target 500 within 400 to 600; hardness y4 target 67.5 within 60 to 75; all shapes 1. The
// published compromise x = (-0.05, 0.145, -0.868) with y1 = 129.4, y3 = 465.7, y4 = 68, d1 =
// 0.189, d2 = 1, d3 = 0.656, d4 = 0.932 and D = 0.583. The coefficients and the printed figures
// are from memory (not checked against the page in this session).
describe('desirability: the published tire tread compromise (Derringer and Suich 1980, from memory)', () => {
  // [b0, x1, x2, x3, x1^2, x2^2, x3^2, x1x2, x1x3, x2x3], from memory.
  const fits = {
    pico: [139.12, 16.49, 17.88, 10.91, 4.01, -3.45, -1.57, 5.13, 7.13, 7.88],
    modulus: [1261.13, 268.15, 246.5, -102.6, -83.57, -124.82, 199.2, 69.38, -104.38, -94.13],
    elongation: [400.38, -99.67, -31.4, -73.92, 7.93, 17.31, 0.43, 8.75, 6.25, 1.25],
    hardness: [68.91, -1.41, 4.32, 1.63, 1.56, 0.06, -0.32, -1.63, 0.13, -0.25],
  };
  const model = (c: number[], name: string) => ({
    ...syntheticModel(3, 1, { b0: c[0], b: [c[1], c[2], c[3]], B: [[c[4], c[7] / 2, c[8] / 2], [c[7] / 2, c[5], c[9] / 2], [c[8] / 2, c[9] / 2, c[6]]] }),
    response: name,
  });
  const models = [model(fits.pico, 'PICO'), model(fits.modulus, 'Modulus'), model(fits.elongation, 'Elongation'), model(fits.hardness, 'Hardness')];
  const specs: DesirabilitySpec[] = [
    { name: 'PICO', goal: 'max', low: 120, high: 170 },
    { name: 'Modulus', goal: 'max', low: 1000, high: 1300 },
    { name: 'Elongation', goal: 'target', low: 400, target: 500, high: 600 },
    { name: 'Hardness', goal: 'target', low: 60, target: 67.5, high: 75 },
  ];
  const published = [-0.05, 0.145, -0.868];

  it('the printed predictions, individual desirabilities and D at the published setting', () => {
    const p = desirabilityAt(models, specs, published);
    const [y1, y2, y3, y4] = p.responses;
    expect(y1.fit).toBeCloseTo(129.4, 0); // printed 129.4
    expect(y3.fit).toBeCloseTo(465.7, 0); // printed 465.7
    expect(y4.fit).toBeCloseTo(68, 1); // printed 68
    expect(y2.fit).toBeGreaterThan(1300); // at or above HIGH: d2 = 1 as printed
    expect(y1.d).toBeCloseTo(0.189, 2);
    expect(y2.d).toBe(1);
    expect(y3.d).toBeCloseTo(0.656, 2);
    expect(y4.d).toBeCloseTo(0.932, 2);
    expect(p.D).toBeCloseTo(0.583, 3); // printed D = 0.583
  });

  it('the search inside the box [-1, 1]^3, which holds the published point, does at least as well', () => {
    const best = maximizeDesirability(models, specs);
    expect(best.D).toBeGreaterThanOrEqual(desirabilityAt(models, specs, published).D - 1e-9);
    for (const c of best.coded) expect(Math.abs(c)).toBeLessThanOrEqual(1);
  });
});
