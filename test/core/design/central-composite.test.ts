import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import { centralComposite } from '../../../src/core/design/central-composite.ts';
import { axialDistance, parseAxialDistance } from '../../../src/core/design/axial-distance.ts';
import { blocksOrthogonal } from '../../../src/core/design/block-orthogonality.ts';
import { isRotatable } from '../../../src/core/design/rotatability.ts';
import { predictionVariance } from '../../../src/core/design/prediction-variance.ts';
import { fullQuadraticTerms } from '../../../src/core/design/second-order-terms.ts';
import { termValue } from '../../../src/core/model/term.ts';
import { InputError } from '../../../src/core/errors.ts';
import type { FactorSpec } from '../../../src/core/factor/factor.ts';
import { pcg32 } from '../../../src/core/design/random.ts';

const numeric = (k: number): FactorSpec[] => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 10, high: 20 }));
const count = (runs: readonly { kind: string }[], kind: string) => runs.filter((r) => r.kind === kind).length;

describe('centralComposite: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2', () => {
  // Reaction time 80/90 min, temperature 170/180 degF, 5 center runs, rotatable.
  const plan = centralComposite({
    factors: [{ kind: 'numeric', name: 'Time', unit: 'min', low: 80, high: 90 }, { kind: 'numeric', name: 'Temperature', unit: 'degF', low: 170, high: 180 }],
    centerRuns: 5,
    seed: 3,
  });

  it('13 runs: 4 factorial, 4 axial at alpha = sqrt2, 5 center', () => {
    expect(plan.design.runs).toHaveLength(13); // Montgomery 8th ed., Table 11.6 (from memory): 13 runs
    expect(count(plan.design.runs, 'factorial')).toBe(4);
    expect(count(plan.design.runs, 'axial')).toBe(4);
    expect(count(plan.design.runs, 'center')).toBe(5);
    expect(plan.properties.alpha).toBeCloseTo(1.414, 3); // printed alpha 1.414
    expect(plan.properties.rotatable).toBe(true);
    expect(plan.properties.fullQuadratic).toBe(true);
  });

  it('the axial settings in real units are the printed ones, with the outside-range warning and the caution', () => {
    // Printed settings (test/fixtures/montgomery-8e-ex11-2-ccd-yield.csv): 77.93 and 92.07 min, 167.93 and 182.07 degF
    const [t, u] = plan.properties.axialSettings;
    expect(t.low).toBeCloseTo(77.93, 2);
    expect(t.high).toBeCloseTo(92.07, 2);
    expect(u.low).toBeCloseTo(167.93, 2);
    expect(u.high).toBeCloseTo(182.07, 2);
    expect(t.outside).toBe(true);
    expect(plan.properties.warnings[0]).toBe(
      "Axial runs set Time to 77.93 min and 92.07 min, outside the factorial range 80 to 90 min: check both are within the machine's rated limits before the runs are made.",
    );
    expect(plan.design.notes.some((n) => /rated limits, whatever the model suggests/.test(n))).toBe(true);
  });

  it('the scaled prediction variance at the center equals N (X\'X)^-1_00 from the reference library', () => {
    const pts = plan.design.runs.map((r) => r.coded);
    const terms = fullQuadraticTerms(2);
    const rng = pcg32(1);
    const ref = new MLR(pts.map((p) => terms.map((t) => termValue(t, p))), pts.map(() => [rng.next() / 2 ** 32]), { intercept: true, statistics: true });
    const cov = ref.stdErrorMatrix.to2DArray();
    const s2 = ref.stdError ** 2;
    const spvRef = (x: number[]) => {
      const f = [...terms.map((t) => termValue(t, x)), 1]; // the library puts the intercept last
      return (13 * f.reduce((s, fi, a) => s + fi * f.reduce((q, fj, b) => q + cov[a][b] * fj, 0), 0)) / s2;
    };
    expect(plan.properties.spv!.center).toBeCloseTo(spvRef([0, 0]), 8);
    expect(plan.properties.spv!.axis).toBeCloseTo(spvRef([1, 0]), 8);
    expect(plan.properties.spv!.diagonal).toBeCloseTo(spvRef([Math.SQRT1_2, Math.SQRT1_2]), 8);
    // Rotatable: the same at distance 1 in every direction
    expect(plan.properties.spv!.axis).toBeCloseTo(plan.properties.spv!.diagonal, 9);
  });
});

describe('centralComposite: axial distances and blocks', () => {
  it('rotatable alpha is F^(1/4) for each factor count, with the factorial part of resolution V or more', () => {
    // F: 4, 8, 16 full; 16 (2^(5-1) V), 32 (2^(6-1) VI), 64 (2^(7-1) VII), 64 (2^(8-2) V): common practice (Montgomery 8th ed., Table 11.? from memory)
    const expected: Record<number, number> = { 2: 4, 3: 8, 4: 16, 5: 16, 6: 32, 7: 64, 8: 64 };
    for (let k = 2; k <= 8; k++) {
      const p = centralComposite({ factors: numeric(k), centerRuns: 2, seed: 1 });
      const F = count(p.design.runs, 'factorial');
      expect(F).toBe(expected[k]);
      expect(count(p.design.runs, 'axial')).toBe(2 * k);
      expect(p.properties.alpha).toBeCloseTo(F ** 0.25, 12);
      expect(p.properties.rotatable).toBe(true);
      expect(p.properties.fullQuadratic).toBe(true);
      if (p.design.resolution !== null) expect(p.design.resolution).toBeGreaterThanOrEqual(5);
    }
  });

  it('face-centred: alpha 1, no outside-range warning, not rotatable; every axial run on a face', () => {
    const p = centralComposite({ factors: numeric(3), axialDistance: 'face', centerRuns: 3, seed: 1 });
    expect(p.properties.alpha).toBe(1);
    expect(p.properties.warnings).toEqual([]);
    expect(p.properties.rotatable).toBe(false);
    expect(p.design.runs.every((r) => r.coded.every((c) => Math.abs(c) <= 1))).toBe(true);
  });

  it('orthogonal blocking: the Box and Hunter (1957) alpha makes the blocks orthogonal by the definition; another alpha does not', () => {
    // Montgomery 8th ed., section 11.4.3 (from memory): k = 2, 3 centers in each block -> alpha = 1.414, rotatable and orthogonally blocked
    expect(axialDistance('orthogonal', 2, 4, { nc: 4, nc0: 3, ns: 4, ns0: 3 })).toBeCloseTo(Math.SQRT2, 12);
    for (const [k, n1, n2] of [[2, 3, 3], [3, 4, 2], [4, 2, 2], [5, 6, 1]]) {
      const p = centralComposite({ factors: numeric(k), axialDistance: 'orthogonal', blocks: 2, centerRuns: [n1, n2], seed: 2 });
      expect(p.properties.blocksOrthogonal).toBe(true);
      const runs = p.design.runs;
      expect(new Set(runs.filter((r) => r.kind === 'axial').map((r) => r.block))).toEqual(new Set([2]));
      expect(new Set(runs.filter((r) => r.kind === 'factorial').map((r) => r.block))).toEqual(new Set([1]));
      expect(runs.filter((r) => r.kind === 'center' && r.block === 1)).toHaveLength(n1);
      expect(runs.filter((r) => r.kind === 'center' && r.block === 2)).toHaveLength(n2);
      const face = centralComposite({ factors: numeric(k), axialDistance: 'face', blocks: 2, centerRuns: [n1, n2], seed: 2 });
      expect(face.properties.blocksOrthogonal).toBe(false);
    }
  });

  it('refuses what it cannot build, with what was needed and what came', () => {
    expect(() => centralComposite({ factors: numeric(2), axialDistance: 'orthogonal' })).toThrow(/needs two blocks/);
    expect(() => centralComposite({ factors: numeric(1) })).toThrow('A central composite design takes 2 to 8 factors, got 1');
    expect(() => centralComposite({ factors: numeric(9) })).toThrow(/got 9/);
    expect(() => centralComposite({ factors: numeric(6), fraction: '1/4' })).toThrow(/resolution V or more.*resolution IV/);
    expect(() => centralComposite({ factors: [...numeric(2), { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] }] })).toThrow(/Powder is categorical/);
    expect(() => centralComposite({ factors: numeric(2), centerRuns: [2, 2] })).toThrow(/need 2 blocks/);
    expect(() => centralComposite({ factors: numeric(2), blocks: 3 })).toThrow(/got 3/);
    expect(() => centralComposite({ factors: numeric(2), axialDistance: -1 })).toThrow(InputError);
    expect(() => parseAxialDistance('star')).toThrow('The axial distance is face, rotatable, orthogonal or a number above 0, got "star"');
    expect(parseAxialDistance('1.5')).toBe(1.5);
    expect(parseAxialDistance(' Face ')).toBe('face');
  });
});

describe('design property checks on their own', () => {
  it('isRotatable: a 2^2 with axial at sqrt2 yes, at 1.2 no; predictionVariance: null when the quadratic cannot be estimated', () => {
    const cube = [[-1, -1], [1, -1], [-1, 1], [1, 1]];
    const star = (a: number) => [[-a, 0], [a, 0], [0, -a], [0, a]];
    expect(isRotatable([...cube, ...star(Math.SQRT2), [0, 0]])).toBe(true);
    expect(isRotatable([...cube, ...star(1.2), [0, 0]])).toBe(false);
    expect(predictionVariance([...cube, [0, 0], [0, 0]])).toBeNull(); // squares aliased with each other
    expect(() => predictionVariance([])).toThrow(InputError);
    expect(() => isRotatable([])).toThrow(InputError);
    expect(blocksOrthogonal([[1], [-1]], [1, 1], [1])).toBe(true);
    expect(() => blocksOrthogonal([[1], [-1]], [1], [1])).toThrow(/one block per run \(2\), got 1/);
  });

  it('SPV of the rotatable k = 2 design with 5 center runs, worked by hand: 2.6 at the center, 3.49375 at distance 1', () => {
    // By hand: the intercept-and-squares block of X'X is [[13, 8, 8], [8, 12, 4], [8, 4, 12]], det 640,
    // cofactors C00 = 128, C01 = -64, C11 = 92; Var(b1)/sigma^2 = 1/8. At the center 13 x 128/640 = 2.6;
    // at (1, 0): 13 x ((128 - 2 x 64 + 92)/640 + 1/8) = 13 x 0.26875 = 3.49375.
    const p = centralComposite({ factors: numeric(2), centerRuns: 5, seed: 1 });
    expect(p.properties.spv!.center).toBeCloseTo(2.6, 10);
    expect(p.properties.spv!.axis).toBeCloseTo(3.49375, 10);
    // fewer center runs: the center is estimated worse
    const q = centralComposite({ factors: numeric(2), centerRuns: 1, seed: 1 });
    expect(q.properties.spv!.center).toBeGreaterThan(p.properties.spv!.center);
  });
});
