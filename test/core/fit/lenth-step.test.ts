import { describe, expect, it } from 'vitest';
import { chooseFit } from '../../../src/core/fit/choose-fit.ts';
import { runKinds } from '../../../src/core/fit/curvature.ts';
import { estimateTerms } from '../../../src/core/fit/estimate-terms.ts';
import { lenthStep, withLenthT } from '../../../src/core/fit/lenth-step.ts';
import { findRepeats } from '../../../src/core/fit/repeats.ts';
import { normalQuantile } from '../../../src/core/dist/normal.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

function step(d: ResponseData) {
  const c = chooseFit(d);
  const e = estimateTerms(c.fit, d.factors, c.blockLevels, 0.05);
  const r = findRepeats({ coded: d.coded, y: d.y, points: d.points, blocks: c.blocks, cells: c.cells, k: d.factors.length });
  return { e, out: lenthStep({ factors: d.factors, coded: d.coded, y: d.y, points: d.points, blocks: c.blocks, kinds: runKinds(d.factors, d.coded), groups: r.groups, terms: e.terms }) };
}

describe('lenthStep', () => {
  const filtration = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });

  it('the unreplicated 2^4 (Montgomery 8th ed., Example 6.2): all 15 effects, PSE 2.625 (by hand from the printed effects), A, C, D, AC, AD marked', () => {
    const { out } = step(filtration);
    expect(out.lenth!.m).toBe(15);
    expect(out.lenth!.pse).toBeCloseTo(2.625, 12);
    expect(out.halfNormal).toHaveLength(15);
    expect(out.halfNormal.filter((p) => p.mark).map((p) => p.letters).sort()).toEqual(['A', 'AC', 'AD', 'C', 'D']);
    expect(out.halfNormal.find((p) => p.letters === 'C')!.mark).toBe('likely'); // 9.875 lies between ME 6.75 and SME 13.7
    // Half-normal positions Phi^-1(0.5 + 0.5 (i - 0.5) / m) (Daniel 1959), smallest effect first.
    expect(out.halfNormal[0].quantile).toBeCloseTo(normalQuantile(0.5 + 0.25 / 15), 14);
    expect(Math.abs(out.halfNormal[14].effect)).toBeCloseTo(21.625, 10);
  });

  it('replicated factorial runs (Montgomery 8th ed., Example 6.1): no Lenth, the model effects unmarked', () => {
    const etch = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
    const { e, out } = step(etch);
    expect(out.lenth).toBeNull();
    expect(out.halfNormal).toHaveLength(e.terms.length);
    expect(out.halfNormal.every((p) => p.mark === undefined)).toBe(true);
  });

  it('withLenthT: effect / PSE, e.g. A = 21.625 / 2.625; unchanged when the PSE is 0', () => {
    const { e } = step(filtration);
    const t = withLenthT(e.terms, 2.625);
    expect(t[0].lenthT).toBeCloseTo(21.625 / 2.625, 10);
    expect(withLenthT(e.terms, 0).every((x) => x.lenthT === undefined)).toBe(true);
  });

  it('degenerate input: fewer than two factorial runs give no Lenth', () => {
    const out = lenthStep({ factors: filtration.factors, coded: filtration.coded, y: filtration.y, blocks: null, kinds: filtration.y.map((_, i) => (i === 0 ? 'factorial' : 'other')), groups: Int32Array.from(filtration.y.map((_, i) => i)), terms: [] });
    expect(out.lenth).toBeNull();
    expect(out.halfNormal).toEqual([]);
  });

  it('the labels of the saturated set follow the factors: renamed factors, then the first names again, are written afresh (the kept labels are by names and chains)', () => {
    // A 2^4 half fraction (D = ABC, Montgomery 8th ed., section 8.2) so that the chains carry aliases.
    const half = { ...filtration, coded: filtration.coded.filter((r) => r[0] * r[1] * r[2] * r[3] === 1), y: filtration.y.filter((_, i) => filtration.coded[i][0] * filtration.coded[i][1] * filtration.coded[i][2] * filtration.coded[i][3] === 1) };
    half.labels = half.y.map((_, i) => String(i + 1));
    const labels = (d: ResponseData) => step(d).out.halfNormal.map((p) => `${p.name}|${p.letters}`).sort();
    const first = labels(half);
    expect(first).toContain('Temperature:Pressure|AB + CD');
    const renamed = { ...half, factors: half.factors.map((f, i) => ({ ...f, name: `F${i}`, letter: 'WXYZ'[i] })) };
    const second = labels(renamed);
    expect(second).toContain('F0:F1|WX + YZ');
    expect(labels(half)).toEqual(first);
  });
});
