import { describe, expect, it } from 'vitest';
import { boxBehnken, BOX_BEHNKEN_ROWS } from '../../../src/core/design/box-behnken.ts';
import type { FactorSpec } from '../../../src/core/factor/factor.ts';

const numeric = (k: number): FactorSpec[] => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 100, high: 200, unit: 'u' }));

describe('boxBehnken: the published table (Box and Behnken 1960, Technometrics 2, 455-475)', () => {
  // Runs before the center runs: 12, 24, 40, 48, 56 (Box and Behnken 1960, as quoted in the issue)
  const tableRuns: Record<number, number> = { 3: 12, 4: 24, 5: 40, 6: 48, 7: 56 };

  for (let k = 3; k <= 7; k++) {
    it(`${k} factors: ${tableRuns[k]} runs plus center runs, every setting -1, 0 or +1, balanced, the full quadratic estimable`, () => {
      const p = boxBehnken({ factors: numeric(k), centerRuns: 3, seed: 5 });
      const table = p.design.runs.filter((r) => r.kind === 'factorial');
      expect(table).toHaveLength(tableRuns[k]);
      expect(p.design.runs).toHaveLength(tableRuns[k] + 3);
      for (const r of p.design.runs) for (const c of r.coded) expect([-1, 0, 1]).toContain(c);
      // No run on a corner of the cube
      expect(p.design.runs.some((r) => r.coded.every((c) => c !== 0))).toBe(false);
      // Balance: every factor at -1 as often as at +1, and equally often at +-1 as every other factor
      const nonzero = Array.from({ length: k }, (_, i) => table.filter((r) => r.coded[i] !== 0).length);
      for (let i = 0; i < k; i++) {
        expect(table.filter((r) => r.coded[i] === 1).length).toBe(table.filter((r) => r.coded[i] === -1).length);
        expect(nonzero[i]).toBe(nonzero[0]);
        // every pair of factors appears together at +-1 in some run (so its interaction is estimable)
        for (let j = i + 1; j < k; j++) expect(table.some((r) => r.coded[i] !== 0 && r.coded[j] !== 0)).toBe(true);
      }
      expect(p.properties.fullQuadratic).toBe(true);
      expect(p.properties.alpha).toBeNull();
      expect(p.properties.axialSettings).toEqual([]);
      expect(p.properties.warnings).toEqual([]);
    });
  }

  it('the 3-factor design is the NIST/SEMATECH e-Handbook table (section 5.3.3.6.2): the 12 edge midpoints of the cube', () => {
    // e-Handbook, Box-Behnken design for 3 factors (from memory): (+-1, +-1, 0), (+-1, 0, +-1), (0, +-1, +-1)
    const p = boxBehnken({ factors: numeric(3), centerRuns: 0, randomize: false });
    const got = p.design.runs.map((r) => r.coded.join(',')).sort();
    const want: string[] = [];
    for (const a of [-1, 1]) for (const b of [-1, 1]) want.push(`${a},${b},0`, `${a},0,${b}`, `0,${a},${b}`);
    expect(got).toEqual(want.sort());
  });

  it('rotatable for 4 and 7 factors and not for 3, 5 or 6 (Box and Behnken 1960, from memory)', () => {
    const rot = [3, 4, 5, 6, 7].map((k) => boxBehnken({ factors: numeric(k), centerRuns: 3, seed: 1 }).properties.rotatable);
    expect(rot).toEqual([false, true, false, false, true]);
  });

  it('the 7-factor rows are a balanced incomplete block design: every pair of factors exactly once', () => {
    const pairs = new Map<string, number>();
    for (const row of BOX_BEHNKEN_ROWS[7]) for (let a = 0; a < row.length; a++) for (let b = a + 1; b < row.length; b++) pairs.set(`${row[a]}${row[b]}`, (pairs.get(`${row[a]}${row[b]}`) ?? 0) + 1);
    expect(pairs.size).toBe(21);
    expect([...pairs.values()].every((n) => n === 1)).toBe(true);
  });

  it('settings in real units run low, center, high; bad requests are refused', () => {
    const p = boxBehnken({ factors: numeric(3), seed: 2 });
    expect(p.design.runs.filter((r) => r.kind === 'center')).toHaveLength(3); // default 3 for 3 factors (from memory)
    expect(() => boxBehnken({ factors: numeric(2) })).toThrow('A Box-Behnken design takes 3 to 7 factors, got 2');
    expect(() => boxBehnken({ factors: numeric(8) })).toThrow(/got 8/);
    expect(() => boxBehnken({ factors: [...numeric(2), { kind: 'categorical', name: 'Die', levels: ['old', 'new'] }] })).toThrow(/Die is categorical/);
    expect(() => boxBehnken({ factors: numeric(3), centerRuns: -1 })).toThrow(/got -1/);
    expect(() => boxBehnken({ factors: numeric(3), randomize: false, seed: 1 })).toThrow(/seed only applies/);
  });
});
