import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { laserData } from '../../helpers/half-fraction.ts';

// The fraction's alias structure (I = ABCD: AB = CD, AC = BD, AD = BC) is from Montgomery,
// Design and Analysis of Experiments, 8th ed., section 8.2; the responses are invented.
describe('analyze: floor data, one off-target setting in a half fraction', () => {
  const planned = analyze(laserData());
  const off = analyze(laserData(0.9)); // Power logged at 89 where the plan said 90 (70..90: 0.9 coded)

  it('fits the alias chains, not the separate terms, and lists the rest as aliased', () => {
    const labels = (a: typeof off) => a.terms.map((t) => t.estimates ?? t.letters);
    expect(labels(off)).toEqual(labels(planned));
    expect(labels(off)).toEqual(['A', 'B', 'C', 'D', 'AB + CD', 'AC + BD', 'AD + BC']);
    expect(off.aliased.map((a) => a.letters)).toEqual(['BC', 'BD', 'CD']);
    expect(off.df.residual).toBe(planned.df.residual);
  });
  it('uses the actual settings: the estimates differ from the planned fit but stay close to it', () => {
    let differ = false;
    off.terms.forEach((t, j) => {
      const p = planned.terms[j];
      if (Math.abs(t.effect - p.effect) > 1e-9) differ = true;
      expect(Math.abs(t.effect - p.effect)).toBeLessThan(0.25);
    });
    expect(differ).toBe(true);
    // no wild effects: every effect stays below the largest planned one plus a margin
    const largest = Math.max(...planned.terms.map((t) => Math.abs(t.effect)));
    off.terms.forEach((t) => expect(Math.abs(t.effect)).toBeLessThan(largest + 0.25));
  });
  it('the nominal plan gives the pure error (centers at N2) and the center runs; the half-normal points are the chains', () => {
    expect(off.df.pureError).toBe(1);
    expect(off.curvature?.nCenter).toBe(3);
    expect(off.halfNormal.map((h) => h.letters).sort()).toEqual(planned.halfNormal.map((h) => h.letters).sort());
  });
});
