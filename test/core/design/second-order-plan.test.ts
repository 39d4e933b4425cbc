import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import { axialSettings, secondOrderProperties } from '../../../src/core/design/second-order-plan.ts';
import { fullQuadraticTerms } from '../../../src/core/design/second-order-terms.ts';
import type { DesignRun, RunKind } from '../../../src/core/design/design.ts';
import { defineFactors, type NumericFactor } from '../../../src/core/factor/factor.ts';
import { termValue } from '../../../src/core/model/term.ts';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { pcg32 } from '../../../src/core/design/random.ts';

const factors = defineFactors([
  { kind: 'numeric', name: 'Temperature', unit: 'degC', low: 160, high: 200 },
  { kind: 'numeric', name: 'Time', unit: 'min', low: 10, high: 20 },
]) as readonly NumericFactor[];

/** Runs from coded points, all in `block`, numbered in the order given. */
function runs(points: readonly (readonly [number, number])[], kind: RunKind, block = 1, from = 1): DesignRun[] {
  return points.map((coded, i) => ({ run: from + i, standardOrder: null, replicate: 1, block, originBlock: block, kind, coded }));
}
const corners = [[-1, -1], [1, -1], [-1, 1], [1, 1]] as const;
const centers = (n: number) => Array.from({ length: n }, () => [0, 0] as const);
const star = (a: number) => [[-a, 0], [a, 0], [0, -a], [0, a]] as const;

/** N x'(X'X)^-1 x for the full quadratic model, from the reference library's covariance (intercept last). */
function spvByLibrary(points: readonly (readonly number[])[], x: readonly number[]): number {
  const terms = fullQuadraticTerms(2);
  const rng = pcg32(7);
  const ref = new MLR(points.map((p) => terms.map((t) => termValue(t, p))), points.map(() => [rng.next() / 2 ** 32]), { intercept: true, statistics: true });
  const cov = ref.stdErrorMatrix.to2DArray();
  const s2 = ref.stdError ** 2;
  const f = [...terms.map((t) => termValue(t, x)), 1];
  return (points.length * f.reduce((s, fi, a) => s + fi * f.reduce((q, fj, b) => q + cov[a][b] * fj, 0), 0)) / s2;
}

describe('axialSettings', () => {
  it('gives the real settings at -alpha and +alpha and a warning with the caution words when alpha > 1 (hand computation)', () => {
    // Temperature: center 180, half-range 20; 180 -+ 20 x 1.414 = 151.72 and 208.28.
    const { settings, warnings, warningFacts } = axialSettings(factors, 1.414);
    expect(settings[0]).toMatchObject({ name: 'Temperature', letter: 'A', unit: 'degC', low: 151.72, high: 208.28, outside: true });
    // Time: center 15, half-range 5; 15 -+ 7.07.
    expect(settings[1].low).toBeCloseTo(7.93, 10);
    expect(settings[1].high).toBeCloseTo(22.07, 10);
    expect(warnings).toHaveLength(2);
    expect(warnings[0]).toContain('151.7');
    expect(warnings[0]).toContain('208.3');
    expect(warnings[0]).toMatch(/rated limits/);
    expect(warningFacts.map((w) => w.kind)).toEqual(['axial-outside', 'axial-outside']);
  });

  it('face-centred (alpha 1) stays on the factorial range: no warning', () => {
    const { settings, warnings } = axialSettings(factors, 1);
    expect(settings.map((s) => [s.low, s.high, s.outside])).toEqual([[160, 200, false], [10, 20, false]]);
    expect(warnings).toEqual([]);
  });
});

describe('secondOrderProperties on hand-built runs', () => {
  it('a rotatable two-factor central composite design: 13 runs, rotatable, SPV equal along an axis and a diagonal, as the reference library gives it', () => {
    const a = Math.SQRT2; // rotatable: F^(1/4) = 4^(1/4) (Box and Hunter 1957)
    const all = [...runs(corners, 'factorial'), ...runs(star(a), 'axial', 1, 5), ...runs(centers(5), 'center', 1, 9)];
    const p = secondOrderProperties('central composite', factors, all, a);
    expect(p.runs).toBe(13);
    expect(p.rotatable).toBe(true);
    expect(p.blocks).toBe(1);
    expect(p.blocksOrthogonal).toBeNull();
    expect(p.fullQuadratic).toBe(true);
    const pts = all.map((r) => r.coded);
    expect(p.spv!.center).toBeCloseTo(spvByLibrary(pts, [0, 0]), 8);
    expect(p.spv!.axis).toBeCloseTo(spvByLibrary(pts, [1, 0]), 8);
    expect(p.spv!.diagonal).toBeCloseTo(p.spv!.axis, 9);
    expect(p.caution).toBe(CAUTION);
  });

  it('a face-centred design (the 3^2 factorial) is not rotatable and has no axial warning', () => {
    const all = [...runs(corners, 'factorial'), ...runs(star(1), 'axial', 1, 5), ...runs(centers(1), 'center', 1, 9)];
    const p = secondOrderProperties('central composite', factors, all, 1);
    expect(p.rotatable).toBe(false);
    expect(p.warnings).toEqual([]);
    expect(p.spv!.axis).toBeCloseTo(spvByLibrary(all.map((r) => r.coded), [1, 0]), 8);
    expect(p.spv!.axis).not.toBeCloseTo(p.spv!.diagonal, 3);
  });

  it('a two-level factorial with center runs cannot estimate the full quadratic: no prediction variance', () => {
    const all = [...runs(corners, 'factorial'), ...runs(centers(3), 'center', 1, 5)];
    const p = secondOrderProperties('central composite', factors, all, null);
    expect(p.fullQuadratic).toBe(false);
    expect(p.spv).toBeNull();
    expect(p.axialSettings).toEqual([]);
  });

  it('blocks are orthogonal exactly when the Box-Hunter condition holds (Box and Hunter 1957: alpha = sqrt(k(1 + ns0/ns)/(1 + nc0/nc)))', () => {
    // k = 2, nc = ns = 4: with 3 center runs in each block alpha = sqrt(2 x 1.75 / 1.75) = sqrt 2.
    const a = Math.sqrt((2 * (1 + 3 / 4)) / (1 + 3 / 4));
    const blocked = (axialCenters: number) => [
      ...runs(corners, 'factorial', 1),
      ...runs(centers(3), 'center', 1, 5),
      ...runs(star(a), 'axial', 2, 8),
      ...runs(centers(axialCenters), 'center', 2, 12),
    ];
    expect(secondOrderProperties('central composite', factors, blocked(3), a)).toMatchObject({ blocks: 2, blocksOrthogonal: true });
    // One center run in the axial block breaks the condition at this alpha.
    expect(secondOrderProperties('central composite', factors, blocked(1), a).blocksOrthogonal).toBe(false);
  });
});
