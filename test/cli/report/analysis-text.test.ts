import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { analysisText, effectsTable, fittedEquation } from '../../../src/cli/report/analysis-text.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { curvatureStatement, verdictText } from '../../../src/core/text/verdict-text.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { shortNumber } from '../../../src/core/text/number-text.ts';

describe('analysisText: the report says what the core says, in the same words', () => {
  it('curvature and lack of fit of the section 6.8 example (Montgomery 8th ed.): p 0.8137 for both, stated once each', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const a = analyze(d);
    const text = analysisText(a);
    const curv = a.verdicts.find((v) => v.kind === 'curvature');
    expect(curv?.kind).toBe('curvature');
    if (curv?.kind === 'curvature') expect(text).toContain(curvatureStatement(curv));
    expect(text).toContain('No clear curvature (p = 0.8137)');
    expect(text).toContain('No clear lack of fit (p = 0.8137)');
    expect(text).toContain('p 0.8137'); // the figures line, in the table format
    for (const w of a.warnings) expect(text).toContain(w);
  });

  it("Lenth's lines for the unreplicated 2^4 (Montgomery 8th ed., Example 6.2), largest effect first", () => {
    const d = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const a = analyze(d, { terms: termsUpToOrder(4, 4) });
    const text = analysisText(a);
    expect(text).toContain("Lenth's method over 15 effects (d = 5 df): pseudo standard error 2.625");
    expect(text).toMatch(/beyond the margins: A 21\.63 \(beyond the simultaneous margin\); AC -18\.13/);
    expect(text).toContain(verdictText({ kind: 'no-residual-df' }));
  });

  it('degenerate input: a significant lack of fit is told once, among the notes', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    // Invented: the center runs moved up by 2, so the first-order model misses them.
    const a = analyze({ ...d, y: d.y.map((v, i) => (i >= 4 ? v + 2 : v)) });
    const lof = a.verdicts.find((v) => v.kind === 'lack-of-fit')!;
    expect(lof).toMatchObject({ outcome: 'significant' });
    const text = analysisText(a);
    expect(text.split(verdictText(lof)).length - 1).toBe(1);
  });

  describe('zero up to round-off prints as 0; Lenth\'s effects and the table\'s are one number or labelled', () => {
    const factors = defineFactors(['A', 'B', 'C'].map((name) => ({ kind: 'numeric' as const, name, low: -1, high: 1 })));
    const cube = [[-1, -1, -1], [1, -1, -1], [-1, 1, -1], [1, 1, -1], [-1, -1, 1], [1, -1, 1], [-1, 1, 1], [1, 1, 1]];
    const base = { factors, response: 'y', blocks: null, messages: [] as string[] };

    it('an exact fit (invented y = 10.5 + 0.1 A + 0.3 C): no round-off effects, pseudo standard error 0, no Lenth t', () => {
      const y = cube.map(([a, , c]) => 10.5 + 0.1 * a + 0.3 * c);
      const an = analyze({ ...base, coded: cube, y, labels: cube.map((_, i) => String(i + 1)) }, { terms: termsUpToOrder(3, 3) });
      // The saturated fit's effects of B, AB, ... are round-off (not exactly 0) before printing.
      expect(an.lenth!.effects.some((e) => e.effect !== 0 && Math.abs(e.effect) < 1e-12)).toBe(true);
      const text = analysisText(an);
      expect(text).toContain('pseudo standard error 0, margin of error 0, simultaneous margin 0');
      expect(text).not.toMatch(/e-1[0-9]/); // no figure of round-off size anywhere
      expect(text).not.toMatch(/e\+1[0-9]/); // and no Lenth t divided by round-off
      expect(text).not.toContain("Lenth's effects are those of the saturated fit");
    });

    it('actual settings off the plan with center runs: the two fits differ, and the report labels both numbers', () => {
      // Invented runs: A at 0.9 in run 2, two center runs.
      const coded = [...cube.map((r, i) => (i === 1 ? [0.9, -1, -1] : r)), [0, 0, 0], [0, 0, 0]];
      const y = [10.1, 10.6, 10.0, 10.3, 10.7, 11.4, 10.5, 10.9, 10.5, 10.7];
      const an = analyze({ ...base, coded, y, labels: coded.map((_, i) => String(i + 1)) });
      const text = analysisText(an);
      const c = an.terms.find((t) => t.letters === 'C')!.effect;
      const lc = an.lenth!.effects.find((e) => e.letters === 'C')!.effect;
      expect(Math.abs(c - lc)).toBeGreaterThan(1e-4); // two different estimates of one effect
      expect(text).toContain(`C ${shortNumber(lc)} (Lenth) and ${shortNumber(c)} (table)`);
    });
  });
});

describe('the table of effects and the fitted equation (Trialbook\'s own layout)', () => {
  const etch = () => fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });

  it('ranks the effects by size with the interval 2 x (coef +- t(0.975, df) se) in the response units, p and the verdict (Montgomery 8th ed., Example 6.1)', () => {
    const a = analyze(etch(), { terms: termsUpToOrder(3, 3) });
    const lines = effectsTable(a, 'A/min');
    const rows = lines.slice(2).map((l) => l.trim());
    // Montgomery 8th ed., Table 6.5: C 306.125, AC -153.625, A -101.625 are the three largest.
    expect(rows[0]).toMatch(/^1\. Power \(C\)\s+306\.1 A\/min/);
    expect(rows[1]).toMatch(/^2\. Gap:Power \(AC\)\s+-153\.6 A\/min/);
    expect(rows[2]).toMatch(/^3\. Gap \(A\)\s+-101\.6 A\/min/);
    // The interval's half width by jstat 1.9.6's t quantile on the 8 residual df: 2 x t x se.
    const c = a.terms.find((t) => t.letters === 'C')!;
    const half = 2 * jStat.studentt.inv(0.975, 8) * c.se!;
    expect(rows[0]).toContain(`${(306.125 - half).toPrecision(4)} to ${(306.125 + half).toPrecision(4)} A/min`);
    // Verdicts by p (common practice cut-offs): C p < 0.0001 is clear; B (p about 0.76) is within the noise.
    expect(rows[0]).toMatch(/<0\.0001\s+clear$/);
    expect(rows.find((r) => r.includes('Flow (B)'))).toMatch(/within the noise$/);
    // The column order is our own: effect, size, interval, p, verdict; no coefficient, std error or t column.
    expect(lines[1].split(/\s{2,}/)).toEqual(['effect of, by size', 'size', '95% interval', 'p', 'verdict']);
  });

  it("with no residual df the interval is the effect +- Lenth's margin and the verdict is Lenth's (Montgomery 8th ed., Example 6.2)", () => {
    const d = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
    const a = analyze(d, { terms: termsUpToOrder(4, 4) });
    const rows = effectsTable(a).slice(2);
    // A = 21.625 is beyond the simultaneous margin (Lenth 1989 applied to Example 6.2: PSE 2.625 by hand).
    expect(rows[0]).toMatch(/^1\. Temperature \(A\)\s+21\.63\s+/);
    expect(rows[0]).toContain(`${(21.625 - a.lenth!.me).toPrecision(4)} to ${(21.625 + a.lenth!.me).toPrecision(4)}`);
    expect(rows[0]).toMatch(/-\s+beyond the simultaneous margin$/);
    expect(rows.find((r) => r.includes('(C)'))).toMatch(/beyond the margin$/); // 9.875 between ME 6.75 and SME 13.7
    expect(rows.find((r) => r.includes('(B)'))).toMatch(/within the margin$/);
  });

  it('the fitted equation holds the intercept and each coefficient in coded units, in model order', () => {
    const a = analyze(etch(), { terms: termsUpToOrder(3, 1) });
    const eq = fittedEquation(a);
    expect(eq[1]).toBe(`  Etch rate = ${(776.0625).toPrecision(4)}`); // grand mean of the 16 runs, Montgomery 8th ed., Table 6.4
    expect(eq.slice(2).map((l) => l.trim())).toEqual(['- 50.81 A', '+ 3.688 B', '+ 153.1 C']); // half of -101.625, 7.375, 306.125
    expect(analysisText(a)).toContain(eq.join('\n'));
  });

  it("says which label is -1 when the coding comes from the file's order, and not otherwise", () => {
    const a = analyze(fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration', 'Catalyst'], response: 'Yield' }));
    const brand = { ...a, coding: [...a.coding, { name: 'Supplier', letter: 'C', kind: 'categorical' as const, low: 'north', high: 'south', scale: 'linear' as const }] };
    expect(analysisText(brand, { codingFromFileOrder: true })).toContain('Supplier: north -> -1, south -> +1 (two named levels; "north" is -1 as the first label in the file: give --levels to choose)');
    expect(analysisText(brand)).toContain('Supplier: north -> -1, south -> +1 (two named levels)');
  });
});
