import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { InputError } from '../../../src/core/errors.ts';
import { lenth, LENTH_MIN_CONTRASTS } from '../../../src/core/fit/lenth.ts';

// The 15 effects of the unreplicated 2^4 filtration rate experiment, as printed in Montgomery,
// Design and Analysis of Experiments, 8th ed., Example 6.2 (Table 6.11).
const FILTRATION = [21.625, 3.125, 9.875, 14.625, 0.125, -18.125, 16.625, 2.375, -0.375, -1.125, 1.875, 4.125, -1.625, -2.625, 1.375];

describe("lenth (Lenth 1989, Technometrics 31, 469-473)", () => {
  it('PSE of the filtration effects, worked by hand from the printed effects', () => {
    // |c| sorted: median 2.625, s0 = 3.9375; the ten below 2.5 s0 = 9.84 have median (1.625 + 1.875) / 2 = 1.75;
    // PSE = 1.5 x 1.75 = 2.625.
    const l = lenth(FILTRATION);
    expect(l.m).toBe(15);
    expect(l.df).toBe(5);
    expect(l.pse).toBeCloseTo(2.625, 14);
  });

  it("ME and SME multipliers as Lenth's Table 1 gives them for m = 7, 15, 31, 63 (from memory), checked against jstat's t quantiles at d = m/3", () => {
    const table: [number, number, number][] = [
      [7, 3.76, 9.01],
      [15, 2.57, 5.22],
      [31, 2.22, 4.22],
      [63, 2.08, 3.91],
    ];
    for (const [m, me, sme] of table) {
      const effects = Array.from({ length: m }, (_, i) => (i % 2 ? 1 : -1) * (1 + i / m)); // invented, all near 1
      const l = lenth(effects);
      const gamma = (1 + 0.95 ** (1 / m)) / 2;
      expect(l.me / l.pse).toBeCloseTo(jStat.studentt.inv(0.975, m / 3), 6);
      expect(l.sme / l.pse).toBeCloseTo(jStat.studentt.inv(gamma, m / 3), 5);
      expect(l.me / l.pse).toBeCloseTo(me, 2);
      expect(l.sme / l.pse).toBeCloseTo(sme, 1);
    }
  });

  it("the filtration effects beyond the margins are A, AC, AD, D (SME) and C (ME): Montgomery's conclusion for Example 6.2", () => {
    const l = lenth(FILTRATION);
    const names = ['A', 'B', 'C', 'D', 'AB', 'AC', 'AD', 'BC', 'BD', 'CD', 'ABC', 'ABD', 'ACD', 'BCD', 'ABCD'];
    expect(names.filter((_, i) => Math.abs(FILTRATION[i]) > l.sme).sort()).toEqual(['A', 'AC', 'AD', 'D']);
    expect(names.filter((_, i) => Math.abs(FILTRATION[i]) > l.me && Math.abs(FILTRATION[i]) <= l.sme)).toEqual(['C']);
  });

  it('an effect far out does not move the PSE (the trimming step)', () => {
    const big = [...FILTRATION];
    big[0] = 1e6;
    expect(lenth(big).pse).toBeCloseTo(2.625, 12);
  });

  it(`advises at least ${LENTH_MIN_CONTRASTS} contrasts (Lenth 1989, section 4)`, () => {
    expect(LENTH_MIN_CONTRASTS).toBe(7);
  });

  it('degenerate input: no effects or a non-finite one is refused; all-zero effects give PSE 0; one effect is its own s0', () => {
    expect(() => lenth([])).toThrow(InputError);
    expect(() => lenth([1, Number.NaN])).toThrow(/finite effects, got NaN/);
    expect(lenth([0, 0, 0]).pse).toBe(0);
    // m = 1: s0 = 1.5 x 4 = 6; 4 < 15 is kept; PSE = 1.5 x 4 = 6.
    expect(lenth([-4]).pse).toBe(6);
  });
});
