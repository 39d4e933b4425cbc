import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { effectShown, lenthTableDifferences, lenthTableText, lenthTermText, responseScale } from '../../../src/core/text/lenth-table-effects.ts';
import { shortNumber } from '../../../src/core/text/number-text.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const factors = defineFactors(['A', 'B', 'C'].map((name) => ({ kind: 'numeric' as const, name, low: -1, high: 1 })));
const cube = [[-1, -1, -1], [1, -1, -1], [-1, 1, -1], [1, 1, -1], [-1, -1, 1], [1, -1, 1], [-1, 1, 1], [1, 1, 1]];
const base = { factors, response: 'y', blocks: null, messages: [] as string[] };
const fmt = (x: number) => shortNumber(x);

describe('the effects as shown: round-off zeros are 0, and Lenth\'s list and the table are one number or labelled', () => {
  it('an exact fit (invented y = 10.5 + 0.1 A + 0.3 C): the absent terms\' round-off effects show as 0, and the lists agree', () => {
    const y = cube.map(([a, , c]) => 10.5 + 0.1 * a + 0.3 * c);
    const an = analyze({ ...base, coded: cube, y, labels: cube.map((_, i) => String(i + 1)) }, { terms: termsUpToOrder(3, 3) });
    expect(responseScale(an)).toBeCloseTo(10.9, 12); // 10.5 + 0.1 + 0.3, the largest response value
    const tiny = an.terms.filter((t) => t.effect !== 0 && Math.abs(t.effect) < 1e-12);
    const lenthTiny = an.lenth!.effects.filter((e) => e.effect !== 0 && Math.abs(e.effect) < 1e-12);
    expect(tiny.length + lenthTiny.length).toBeGreaterThan(0); // round-off there before showing
    for (const t of an.terms) {
      // The invented model's own effects: 2 x 0.1 for A, 2 x 0.3 for C, and 0 for every other term.
      const want = t.letters === 'A' ? 0.2 : t.letters === 'C' ? 0.6 : 0;
      if (want === 0) expect(effectShown(an, t.effect)).toBe(0);
      else expect(effectShown(an, t.effect)).toBeCloseTo(want, 12);
    }
    expect(lenthTableDifferences(an, fmt)).toEqual([]);
    expect(lenthTableText([], fmt)).toBeNull();
  });

  it('the unreplicated 2^4 (Montgomery 8th ed., Example 6.2): Lenth judges the same fit as the table, so nothing is labelled', () => {
    const d = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const an = analyze(d, { terms: termsUpToOrder(4, 4) });
    // Montgomery 8th ed., Example 6.2: effect of A 21.625 (Table 6.11).
    expect(effectShown(an, an.terms.find((t) => t.letters === 'A')!.effect)).toBeCloseTo(21.625, 10);
    expect(lenthTableDifferences(an, fmt)).toEqual([]);
  });

  it('actual settings off the plan with center runs (invented): the two fits differ, and both numbers are labelled', () => {
    const coded = [...cube.map((r, i) => (i === 1 ? [0.9, -1, -1] : r)), [0, 0, 0], [0, 0, 0]];
    const y = [10.1, 10.6, 10.0, 10.3, 10.7, 11.4, 10.5, 10.9, 10.5, 10.7];
    const an = analyze({ ...base, coded, y, labels: coded.map((_, i) => String(i + 1)) });
    const diffs = lenthTableDifferences(an, fmt);
    const c = diffs.find((x) => x.letters === 'C')!;
    expect(c.table).toBe(an.terms.find((t) => t.letters === 'C')!.effect);
    expect(c.lenth).toBe(an.lenth!.effects.find((e) => e.letters === 'C')!.effect);
    expect(fmt(c.lenth)).not.toBe(fmt(c.table));
    expect(lenthTableText(diffs, fmt)).toContain(`C ${fmt(c.lenth)} (Lenth) and ${fmt(c.table)} (table)`);
    expect(lenthTermText(c, fmt)).toMatch(new RegExp(`judged it by ${fmt(c.lenth).replace('.', '\\.')}.*the ${fmt(c.table).replace('.', '\\.')} shown`));
    // A coarser format that writes both as one number labels nothing (one number, once written).
    expect(lenthTableDifferences(an, (x) => x.toFixed(0))).toEqual([]);
  });

  it('degenerate input: no runs give scale 0, and no Lenth result gives no label', () => {
    expect(responseScale({ runs: [] })).toBe(0);
    expect(effectShown({ runs: [] }, 1e-300)).toBe(1e-300); // nothing to call it round-off against
    expect(lenthTableDifferences({ runs: [], terms: [], lenth: null }, fmt)).toEqual([]);
  });
});
