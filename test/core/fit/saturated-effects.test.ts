import { describe, expect, it } from 'vitest';
import { saturatedEffects } from '../../../src/core/fit/saturated-effects.ts';
import { termValue } from '../../../src/core/model/term.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

function full(k: number): number[][] {
  return Array.from({ length: 1 << k }, (_, c) => Array.from({ length: k }, (_, f) => ((c >> f) & 1 ? 1 : -1)));
}

describe('saturatedEffects', () => {
  const filtration = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });

  it('the unreplicated 2^4 (Montgomery 8th ed., Example 6.2): all 15 effects, each its contrast over 8 (A 21.625, AC -18.125 as printed)', () => {
    const coded = filtration.coded.map((r) => [...r]);
    const sat = saturatedEffects(4, coded, filtration.y, null);
    expect(sat).toHaveLength(15);
    for (const s of sat) {
      const contrast = coded.reduce((acc, row, i) => acc + termValue(s.term, row) * filtration.y[i], 0);
      expect(s.effect).toBeCloseTo(contrast / 8, 10);
      expect(s.aliases).toEqual([]);
    }
    expect(sat.find((s) => s.term === 0b1)!.effect).toBeCloseTo(21.625, 10);
    expect(sat.find((s) => s.term === 0b101)!.effect).toBeCloseTo(-18.125, 10);
  });

  it('a half fraction 2^(4-1) with D = ABC (Montgomery 8th ed., section 8.2): 7 effects up to two-factor terms, AB, AC, AD each carrying its alias of weight +1 (I = ABCD)', () => {
    const rows = full(3).map((r) => [...r, r[0] * r[1] * r[2]]);
    const y = rows.map((x) => 10 + 3 * x[0] + 2 * x[1] * x[2] + x[3]);
    const sat = saturatedEffects(4, rows, y, null);
    expect(sat.map((s) => s.term)).toEqual([0b1, 0b10, 0b100, 0b1000, 0b11, 0b101, 0b1001]);
    for (const s of sat) {
      if (s.term <= 0b1000 && (s.term & (s.term - 1)) === 0) {
        expect(s.aliases).toEqual([]); // a main effect's alias is a three-factor term, beyond the set
        continue;
      }
      expect(s.aliases).toHaveLength(1);
      expect(s.aliases[0].term).toBe(s.term ^ 0b1111);
      expect(s.aliases[0].weight).toBeCloseTo(1, 12);
    }
    // y has 2 BC = 2 AD: the AD chain's effect is 4; D's is 2, A's 6.
    expect(sat.find((s) => s.term === 0b1001)!.effect).toBeCloseTo(4, 12);
    expect(sat.find((s) => s.term === 0b1000)!.effect).toBeCloseTo(2, 12);
    expect(sat.find((s) => s.term === 0b1)!.effect).toBeCloseTo(6, 12);
  });

  it('the 2^4 less one run, settings off target: 15 effects from the actual settings, the set from the nominal ones (the 4-factor term left out)', () => {
    const nominal = filtration.coded.map((r) => [...r]).slice(1);
    const y = filtration.y.slice(1);
    const actual = nominal.map((r, i) => r.map((v, f) => v + ((i * 7 + f * 3) % 5 - 2) * 0.01));
    const exact = saturatedEffects(4, nominal, y, null);
    const off = saturatedEffects(4, nominal, y, null, actual);
    expect(exact.map((s) => s.term)).toEqual(off.map((s) => s.term));
    expect(exact).toHaveLength(14);
    // Small setting errors move the estimates a little, not a lot.
    exact.forEach((s, i) => expect(Math.abs(off[i].effect - s.effect)).toBeLessThan(2));
    expect(off.some((s, i) => s.effect !== exact[i].effect)).toBe(true);
  });
});
