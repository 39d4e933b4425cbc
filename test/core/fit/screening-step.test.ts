import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { screeningStep } from '../../../src/core/fit/screening-step.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { plackettBurmanTable } from '../../../src/core/design/plackett-burman.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { InputError } from '../../../src/core/errors.ts';
import { verdictText } from '../../../src/core/text/verdict-text.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';

const table = plackettBurmanTable(12);
// INVENTED responses of a 12-run screen of 5 factors, A and C made to matter.
const y = table.map((r, i) => 50 + 4 * r[0] - 3 * r[2] + [0.4, -0.3, 0.2, -0.5, 0.1, 0.6, -0.2, 0.3, -0.4, 0.05, -0.1, 0.25][i]);

function data(k: number, rows = table, ys = y, extra: Partial<ResponseData> = {}): ResponseData {
  return {
    factors: defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `F${i + 1}`, low: 0, high: 10 }))),
    response: 'Yield',
    coded: rows.map((r) => r.slice(0, k)),
    y: ys,
    blocks: null,
    labels: rows.map((_, i) => String(i + 1)),
    messages: [],
    screening: { runs: 12, standardOrder: rows.map((_, i) => i + 1) },
    ...extra,
  };
}

describe('screeningStep', () => {
  it('is null for runs that are not from a Plackett-Burman plan', () => {
    const { screening: _s, ...plain } = data(5);
    expect(screeningStep(plain)).toBeNull();
  });

  it('a 12-run plan with 5 factors: main effects A..E, 11 columns (6 unused), largest correlation 1/3 (Lin and Draper 1992, from memory)', () => {
    const s = screeningStep(data(5))!;
    expect(s.terms).toEqual([1, 2, 4, 8, 16]);
    expect(s.contrasts.columns).toHaveLength(11);
    expect(s.contrasts.labels.map((l) => l.letters)).toEqual(['A', 'B', 'C', 'D', 'E', 'col6', 'col7', 'col8', 'col9', 'col10', 'col11']);
    expect(s.contrasts.columns[7]).toEqual(table.map((r) => r[7]));
    expect(s.partialAliasing!.largestCorrelation).toBeCloseTo(1 / 3, 14);
  });

  it('a center run gets 0 in every column; bad indexes and too many factors are refused', () => {
    const rows = [...table, table[0].map(() => 0)];
    const s = screeningStep(data(5, rows, [...y, 50], { screening: { runs: 12, standardOrder: [...table.map((_, i) => i + 1), null] } }))!;
    expect(s.contrasts.columns.every((c) => c[12] === 0)).toBe(true);
    expect(() => screeningStep(data(5, table, y, { screening: { runs: 12, standardOrder: table.map((_, i) => i + 2) } }))).toThrow('Run 12 has standard-order index 13, outside 1 to 12');
    expect(() => screeningStep(data(5, table, y, { screening: { runs: 12, standardOrder: [1, 2] } }))).toThrow(InputError);
    expect(() => screeningStep(data(5, table, y, { screening: { runs: 16, standardOrder: table.map((_, i) => i + 1) } }))).toThrow('comes in 12, 20, 24 runs, got 16');
  });
});

describe('analyze of a Plackett-Burman study', () => {
  it('fits main effects by default and applies Lenth over all 11 orthogonal columns, with the partial-aliasing verdict', () => {
    const a = analyze(data(5));
    expect(a.terms.map((t) => t.letters)).toEqual(['A', 'B', 'C', 'D', 'E']);
    expect(a.df.residual).toBe(6);
    // Replicated? No: 12 distinct points, so Lenth applies, over 11 contrasts (not over interactions).
    expect(a.lenth!.m).toBe(11);
    expect(a.lenth!.effects.map((e) => e.letters).sort()).toEqual(['A', 'B', 'C', 'D', 'E', 'col10', 'col11', 'col6', 'col7', 'col8', 'col9'].sort());
    // Each column's effect is x_j . y / 6 for a complete 12-run plan (Plackett and Burman 1946).
    for (const e of a.lenth!.effects) {
      const j = e.letters.startsWith('col') ? Number(e.letters.slice(3)) - 1 : 'ABCDE'.indexOf(e.letters);
      expect(e.effect).toBeCloseTo(table.reduce((s, r, i) => s + r[j] * y[i], 0) / 6, 10);
    }
    // Margin of error t(0.975, 11/3) x PSE with jstat 1.9.6's t quantile (Lenth 1989, eq. 3).
    expect(a.lenth!.me / a.lenth!.pse).toBeCloseTo(jStat.studentt.inv(0.975, 11 / 3), 6);
    expect(a.lenth!.effects.filter((e) => e.mark).map((e) => e.letters).sort()).toEqual(['A', 'C']);
    const v = a.verdicts.find((x) => x.kind === 'partial-aliasing');
    expect(v).toEqual({ kind: 'partial-aliasing', runs: 12, largestCorrelation: expect.closeTo(1 / 3, 12) });
    expect(a.warnings).toContain(verdictText(v!));
    expect(verdictText(v!)).toMatch(/^This is a 12-run Plackett-Burman screening design, so the main effects are estimated clear of each other but partly mixed with two-factor interactions \(correlations up to 1\/3\)\. Partial aliasing:/);
  });

  it('model terms given by the person are used as given', () => {
    const a = analyze(data(5), { terms: [1, 2, 4, 3] });
    expect(a.terms.map((t) => t.letters)).toEqual(['A', 'B', 'C', 'AB']);
  });

  it('two factors: no interaction of two other factors, so no partial-aliasing verdict; the 12 runs repeat the 4 corners, so pure error, not Lenth', () => {
    const a = analyze(data(2));
    expect(a.verdicts.some((x) => x.kind === 'partial-aliasing')).toBe(false);
    expect(a.lenth).toBeNull();
    expect(a.df.pureError).toBe(8); // 12 runs at 4 distinct points: 12 - 4 = 8 df of pure error
  });
});
