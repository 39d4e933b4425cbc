import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { chooseFit } from '../../../src/core/fit/choose-fit.ts';
import { estimateTerms } from '../../../src/core/fit/estimate-terms.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { parseTerms, termsUpToOrder } from '../../../src/core/model/formula.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('estimateTerms', () => {
  const d = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
  const c = chooseFit(d, { terms: termsUpToOrder(3, 3) });
  const e = estimateTerms(c.fit, d.factors, c.blockLevels, 0.05);

  it('effects of Example 6.1 (Montgomery 8th ed., Table 6.5) and se = sigma / sqrt(N) for a coefficient (section 6.4)', () => {
    const byLetters = Object.fromEntries(e.terms.map((t) => [t.letters, t]));
    expect(byLetters.A.effect).toBeCloseTo(-101.625, 10);
    expect(byLetters.AC.effect).toBeCloseTo(-153.625, 10);
    expect(byLetters.A.name).toBe('Gap');
    const sigma = Math.sqrt(18020.5 / 8); // printed SS_E on 8 df
    expect(e.sigma).toBeCloseTo(sigma, 9);
    expect(byLetters.A.se).toBeCloseTo(sigma / 4, 9);
    // t and the 95% interval from jstat's t distribution on 8 df
    expect(byLetters.A.p).toBeCloseTo(2 * (1 - jStat.studentt.cdf(Math.abs(byLetters.A.t!), 8)), 10);
    expect(byLetters.A.ci![1] - byLetters.A.coef).toBeCloseTo(jStat.studentt.inv(0.975, 8) * (sigma / 4), 6); // jstat's inverse is good to about 1e-9 relative
    expect(e.labels[0]).toEqual({ name: 'Intercept', letters: 'I' });
    expect(e.blockOffsets).toBeNull();
  });

  it('names what an estimate carries when the runs cannot separate terms (C = AB in a 2^(3-1))', () => {
    const factors = defineFactors(['Speed', 'Feed', 'Depth'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 1 })));
    const coded = [[-1, -1, 1], [1, -1, -1], [-1, 1, -1], [1, 1, 1], [0, 0, 0]];
    const data = { factors, response: 'Finish', coded, y: [10, 14, 11, 19, 13], blocks: null, labels: ['1', '2', '3', '4', '5'], messages: [] };
    const f = chooseFit(data, { terms: parseTerms('A + B + C + A:B', factors) });
    const est = estimateTerms(f.fit, factors, f.blockLevels, 0.05);
    expect(est.aliased.map((a) => a.letters)).toEqual(['AB']);
    expect(est.terms.find((t) => t.letters === 'C')!.estimates).toBe('C + AB');
    expect(est.aliasedWithInterceptOrBlocks).toBe(false);
  });

  it('block offsets sum to zero, the last one implied', () => {
    const blocked = { ...d, blocks: d.y.map((_, i) => (i < 8 ? 1 : 2)) };
    const f = chooseFit(blocked);
    const est = estimateTerms(f.fit, d.factors, f.blockLevels, 0.05);
    expect(est.blockOffsets!.map((b) => b.block)).toEqual([1, 2]);
    expect(est.blockOffsets![0].offset + est.blockOffsets![1].offset).toBeCloseTo(0, 12);
  });

  it('degenerate input: with no residual df every se, t, p and interval is null, never NaN', () => {
    const f = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const fit = chooseFit(f, { terms: termsUpToOrder(4, 4) });
    const est = estimateTerms(fit.fit, f.factors, fit.blockLevels, 0.05);
    expect(est.sigma).toBeNull();
    expect(est.terms.every((t) => t.se === null && t.t === null && t.p === null && t.ci === null)).toBe(true);
    expect(est.intercept.coef).toBeCloseTo(70.0625, 10); // printed mean of the 16 runs
  });
});
