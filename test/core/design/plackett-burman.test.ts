// Reference: Plackett and Burman (1946), Biometrika 33, 305-325 (generating rows for N = 12, 20,
// 24 and the construction by cyclic shifts plus a row of minus signs); the 12-run table as
// reprinted in a university thesis (rows 1 and 2 below); the 0 / +-1/3 partial aliasing of the
// 12-run design (Lin and Draper 1992, Technometrics 34, 423-428, from memory).
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import {
  PLACKETT_BURMAN_GENERATORS,
  plackettBurmanAliasing,
  plackettBurmanContrasts,
  plackettBurmanPoints,
  plackettBurmanTable,
} from '../../../src/core/design/plackett-burman.ts';
import { column, dot, mask } from './helpers.ts';

const signs = (s: string) => [...s].map((c) => (c === '+' ? 1 : -1));
const numeric = (k: number) => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 10 }));

describe('plackettBurmanTable', () => {
  it('uses the generating rows as printed by Plackett and Burman (1946)', () => {
    // As printed for N = 12, 20, 24 (signs of the first run, factor 1 first).
    expect(PLACKETT_BURMAN_GENERATORS[12]).toBe('++-+++---+-');
    expect(PLACKETT_BURMAN_GENERATORS[20]).toBe('++--++++-+-+----++-');
    expect(PLACKETT_BURMAN_GENERATORS[24]).toBe('+++++-+-++--++--+-+----');
    for (const n of [12, 20, 24] as const) {
      const t = plackettBurmanTable(n);
      expect(t[0]).toEqual(signs(PLACKETT_BURMAN_GENERATORS[n]));
      expect(t[n - 1]).toEqual(new Array(n - 1).fill(-1));
    }
    // The 12-run reprint's second run: - + + - + + + - - - +.
    expect(plackettBurmanTable(12)[1]).toEqual(signs('-++-+++---+'));
  });

  it('has entries +-1, balanced columns and pairwise orthogonal columns (N = 12, 20, 24)', () => {
    for (const n of [12, 20, 24]) {
      const t = plackettBurmanTable(n);
      expect(t).toHaveLength(n);
      const cols = Array.from({ length: n - 1 }, (_, j) => t.map((r) => r[j]));
      for (const c of cols) {
        expect(c.every((v) => v === 1 || v === -1)).toBe(true);
        expect(c.reduce((a, b) => a + b, 0)).toBe(0); // balanced: n/2 at each level
      }
      for (let a = 0; a < n - 1; a++) for (let b = a + 1; b < n - 1; b++) expect(dot(cols[a], cols[b])).toBe(0);
    }
  });

  it('refuses a run count it does not offer', () => {
    expect(() => plackettBurmanTable(16)).toThrow(/comes in 12, 20, 24 runs, got 16/);
    expect(() => plackettBurmanTable(NaN)).toThrow(InputError);
  });
});

describe('plackettBurmanPoints', () => {
  it('takes the first k columns, standard order = table row', () => {
    const p = plackettBurmanPoints(20, 4);
    expect(p).toHaveLength(20);
    expect(p[0]).toEqual({ standardOrder: 1, coded: signs('++--') });
    expect(p[19].coded).toEqual([-1, -1, -1, -1]);
  });

  it('refuses more factors than the design takes, and fewer than 2', () => {
    expect(() => plackettBurmanPoints(12, 12)).toThrow(/A 12-run Plackett-Burman design takes up to 11 factors, got 12/);
    expect(() => plackettBurmanPoints(20, 20)).toThrow(/up to 19 factors, got 20/);
    expect(() => plackettBurmanPoints(24, 24)).toThrow(/up to 23 factors, got 24/);
    expect(() => plackettBurmanPoints(12, 1)).toThrow(/at least 2 factors, got 1/);
  });
});

describe('plackettBurmanAliasing', () => {
  it('12 runs: every main effect has correlation +-1/3 with every interaction of two other factors', () => {
    const a = plackettBurmanAliasing(12, 11);
    expect(a).toHaveLength(11 * 45); // 11 main effects x C(10, 2) interactions without it
    for (const x of a) expect(Math.abs(x.correlation)).toBeCloseTo(1 / 3, 15);
    const some = a.find((x) => x.effect === mask('A') && x.interaction === mask('BC'))!;
    // Recomputed from the columns as a cross-check of the bookkeeping.
    const rows = plackettBurmanTable(12);
    expect(some.correlation).toBeCloseTo(dot(column(mask('A'), rows), column(mask('BC'), rows)) / 12, 15);
  });

  it('20 and 24 runs: correlations are whole multiples of 1/N and below 1 in size (no full aliasing)', () => {
    for (const n of [20, 24]) {
      for (const x of plackettBurmanAliasing(n, 7)) {
        expect(Math.abs(x.correlation)).toBeLessThan(1);
        expect(Math.abs(x.correlation * n - Math.round(x.correlation * n))).toBeLessThan(1e-12);
      }
    }
    // Some interactions of the 20-run design are correlated with a main effect (it is not a regular fraction).
    expect(plackettBurmanAliasing(20, 5).some((x) => x.correlation !== 0)).toBe(true);
  });

  it('leaves out interactions that contain the main effect (they are orthogonal to it)', () => {
    const a = plackettBurmanAliasing(12, 4);
    expect(a).toHaveLength(4 * 3);
    expect(a.every((x) => (x.effect & x.interaction) === 0)).toBe(true);
    expect(plackettBurmanAliasing(12, 2)).toEqual([]);
  });
});

describe('Plackett-Burman plans from buildDesign', () => {
  it('builds the 12-run plan with center runs, replicates and a seeded order; runs are factorial or center', () => {
    const d = buildDesign({ factors: numeric(7), plackettBurman: 12, centerRuns: 2, replicates: 2, seed: 5 });
    expect(d.runs).toHaveLength(2 * (12 + 2));
    expect(d.runs.filter((r) => r.kind === 'factorial')).toHaveLength(24);
    expect(d.generators).toEqual([]);
    expect(d.definingRelation).toEqual([]);
    expect(d.aliases).toEqual([]);
    expect(d.screening).toEqual({ kind: 'plackett-burman', runs: 12, source: expect.stringContaining('Plackett and Burman (1946)') });
    expect(d.summary).toMatch(/^28 runs \(12 factorial \+ 2 center per replicate, 2 replicates\), a Plackett-Burman screening design for 7 factors: main effects are estimated clear of each other but partly mixed with two-factor interactions \(correlations up to 1\/3\); 4 columns are left unused/);
    expect(d.notes.some((n) => n.startsWith('Partial aliasing:'))).toBe(true);
    // Each replicate holds every row of the table once.
    for (const rep of [1, 2]) {
      const ys = d.runs.filter((r) => r.replicate === rep && r.kind === 'factorial').map((r) => r.standardOrder).sort((a, b) => a! - b!);
      expect(ys).toEqual(Array.from({ length: 12 }, (_, i) => i + 1));
    }
    const table = plackettBurmanTable(12);
    for (const r of d.runs) if (r.standardOrder !== null) expect(r.coded).toEqual(table[r.standardOrder - 1].slice(0, 7));
    // The same seed gives the same order.
    expect(buildDesign({ factors: numeric(7), plackettBurman: 12, centerRuns: 2, replicates: 2, seed: 5 }).runs).toEqual(d.runs);
  });

  it('takes up to 23 factors in 24 runs, in standard order when asked', () => {
    const d = buildDesign({ factors: numeric(23), plackettBurman: 24, randomize: false });
    expect(d.runs.map((r) => r.standardOrder)).toEqual(Array.from({ length: 24 }, (_, i) => i + 1));
    expect(d.summary).toMatch(/for 23 factors: .*interactions \(correlations up to/);
    expect(d.summary).not.toMatch(/left unused/);
  });

  it('refuses more factors than the design allows, and mixing with a fraction, generators, blocks or a foldover', () => {
    expect(() => buildDesign({ factors: numeric(12), plackettBurman: 12 })).toThrow(/takes up to 11 factors, got 12/);
    expect(() => buildDesign({ factors: numeric(5), plackettBurman: 16 })).toThrow(/comes in 12, 20, 24 runs, got 16/);
    expect(() => buildDesign({ factors: numeric(5), plackettBurman: 12, fraction: '1/2' })).toThrow(/does not take a fraction/);
    expect(() => buildDesign({ factors: numeric(5), plackettBurman: 12, blocks: 2 })).toThrow(/does not take blocks/);
    expect(() => buildDesign({ factors: numeric(5), plackettBurman: 12, foldover: 'all' })).toThrow(/does not take a foldover/);
    expect(() => buildDesign({ factors: numeric(5), plackettBurman: 12, generators: ['E=ABCD'] })).toThrow(/does not take generators/);
  });
});

describe('plackettBurmanContrasts', () => {
  it('gives N - 1 orthogonal contrast columns over the runs, the first k equal to the factors', () => {
    const d = buildDesign({ factors: numeric(5), plackettBurman: 12, centerRuns: 3, seed: 11 });
    const c = plackettBurmanContrasts(d);
    expect(c.columns).toHaveLength(11);
    expect(c.factorColumns).toBe(5);
    for (let j = 0; j < 5; j++) expect(c.columns[j]).toEqual(d.runs.map((r) => r.coded[j] + 0));
    for (let a = 0; a < 11; a++) {
      expect(c.columns[a].reduce((s, v) => s + v, 0)).toBe(0);
      for (let b = a + 1; b < 11; b++) expect(dot(c.columns[a], c.columns[b])).toBe(0);
    }
    d.runs.forEach((r, i) => {
      if (r.kind === 'center') for (const col of c.columns) expect(col[i]).toBe(0);
    });
    expect(c.aliasing).toEqual(plackettBurmanAliasing(12, 5));
  });

  it('refuses a plan that is not a Plackett-Burman design', () => {
    const d = buildDesign({ factors: numeric(3), seed: 1 });
    expect(() => plackettBurmanContrasts(d)).toThrow(/need a Plackett-Burman plan/);
  });
});
