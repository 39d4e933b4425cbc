import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildDesign, type DesignSpec } from '../../../src/core/design/build-design.ts';
import type { Design } from '../../../src/core/design/design.ts';
import { parseLetterWord } from '../../../src/core/design/word.ts';
import { InputError } from '../../../src/core/errors.ts';
import type { FactorSpec } from '../../../src/core/factor/factor.ts';
import { termOrder } from '../../../src/core/model/term.ts';
import { column, dot } from './helpers.ts';

const L = 'ABCDEFGHJKLMNOP'.split('');

function numeric(k: number): FactorSpec[] {
  return Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 10 * i, high: 10 * i + 5 }));
}

function factorialRows(d: Design): number[][] {
  return d.runs.filter((r) => r.kind === 'factorial').map((r) => [...r.coded]);
}

/** Every effect mask whose column is constant over the factorial runs, with its sign. */
function constantWords(d: Design): Map<number, number> {
  const rows = factorialRows(d);
  const out = new Map<number, number>();
  for (let m = 1; m < 2 ** d.factors.length; m++) {
    const col = column(m, rows);
    if (col.every((x) => x === col[0])) out.set(m, col[0]);
  }
  return out;
}

describe('buildDesign: examples from the literature', () => {
  it('2^(7-3) from the catalog: resolution IV, seven words of length 4, AB = CE = DF (Chen, Sun and Wu 1993 design 7-3.1, from memory)', () => {
    const d = buildDesign({ factors: numeric(7), fraction: '1/8', seed: 7 });
    expect(d.runs.length).toBe(16);
    expect(d.generators).toEqual(['E=ABC', 'F=ABD', 'G=ACD']);
    expect(d.resolution).toBe(4);
    expect(d.wordLengths).toEqual({ 4: 7 });
    expect(d.definingRelation.length).toBe(7);
    expect(d.aliases).toContainEqual(['AB', 'CE', 'DF']);
    expect(d.aliases).toContainEqual(['A', 'BCE', 'BDF', 'CDG', 'EFG']);
    expect(d.summary).toMatch(/^16 runs, resolution IV: main effects are clear of two-factor interactions; AB is aliased with CE and DF/);
    expect(d.seed).toBe(7);
  });

  it('2^(5-2) from typed generators D=AB, E=-AC: I = ABD = -ACE = -BCDE (Montgomery, 8th ed., section 8.3, sign-reversed generator)', () => {
    const d = buildDesign({ factors: numeric(5), generators: ['D=AB', 'E=-AC'], randomize: false });
    expect(d.definingRelation).toEqual(['ABD', '-ACE', '-BCDE']);
    expect(d.resolution).toBe(3);
    expect(d.wordLengths).toEqual({ 3: 2, 4: 1 });
    expect(d.aliases[0]).toEqual(['A', 'BD', '-CE']);
  });

  it('2^4 in 2 blocks confounds ABCD (Montgomery, 8th ed., Table 7.8, from memory), 8 runs a block', () => {
    const d = buildDesign({ factors: numeric(4), blocks: 2, seed: 3 });
    expect(d.blockWords).toEqual(['ABCD']);
    expect(d.resolution).toBeNull();
    expect(d.runs.filter((r) => r.block === 1).length).toBe(8);
    expect(d.runs.slice(0, 8).every((r) => r.block === 1)).toBe(true);
    expect(d.notes.join(' ')).toMatch(/Table 7\.8/);
  });

  it('keeps standard (Yates) order when asked, with a note on why randomizing matters', () => {
    const d = buildDesign({ factors: numeric(3), randomize: false });
    expect(d.runs.map((r) => r.standardOrder)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(d.runs[1].coded).toEqual([1, -1, -1]);
    expect(d.seed).toBeNull();
    expect(d.notes.join(' ')).toMatch(/drift/);
  });

  it('draws and records a seed when none is given', () => {
    const d = buildDesign({ factors: numeric(3) });
    expect(Number.isInteger(d.seed)).toBe(true);
    expect(d.notes.join(' ')).toContain(`Seed ${d.seed} was drawn`);
  });

  it('repeats center runs at each combination of categorical levels and spreads them over blocks', () => {
    const d = buildDesign({
      factors: [...numeric(3), { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] }],
      centerRuns: 3,
      blocks: 2,
      seed: 1,
    });
    const centers = d.runs.filter((r) => r.kind === 'center');
    expect(centers.length).toBe(6);
    expect(centers.every((r) => r.standardOrder === null && r.coded.slice(0, 3).every((x) => x === 0))).toBe(true);
    expect(centers.filter((r) => r.block === 1).length).toBe(4);
    expect(d.notes.join(' ')).toMatch(/Powder has no middle, so each center run is repeated at every combination of its levels/);
    expect(d.notes.join(' ')).toMatch(/do not divide evenly/);
  });

  it('numbers replicates and their blocks, each replicate complete', () => {
    const d = buildDesign({ factors: numeric(3), replicates: 2, blocks: 2, centerRuns: 2, seed: 9 });
    expect(d.runs.length).toBe(20);
    expect(new Set(d.runs.map((r) => r.block))).toEqual(new Set([1, 2, 3, 4]));
    for (const rep of [1, 2]) {
      expect(d.runs.filter((r) => r.replicate === rep && r.kind === 'factorial').map((r) => r.standardOrder).sort((a, b) => a! - b!)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    }
  });

  it('folds over the 2^(7-4) into a resolution IV design, the halves as blocks (Box, Hunter and Hunter, 2nd ed., section 6.8)', () => {
    const d = buildDesign({ factors: numeric(7), fraction: '1/16', foldover: 'all', seed: 2 });
    expect(d.runs.length).toBe(16);
    expect(d.resolution).toBe(4);
    expect(d.wordLengths).toEqual({ 4: 7 });
    expect(d.blockWords.length).toBe(1);
    expect(d.notes.join(' ')).toMatch(/The combined design separates A from BD/);
  });

  it('folds over one factor to free it and its two-factor interactions (Montgomery, 8th ed., section 8.6)', () => {
    const d = buildDesign({ factors: numeric(7), fraction: '1/16', foldover: 'D', seed: 2 });
    expect(d.definingRelation.every((w) => !w.includes('D'))).toBe(true);
    const chainOfD = d.aliases.find((c) => c[0] === 'D')!;
    expect(chainOfD.every((w) => w === 'D' || w.replace('-', '').length >= 3)).toBe(true);
  });

  it('warns that a kept-sorted factor makes the design a split-plot', () => {
    const d = buildDesign({ factors: numeric(3), sortBy: ['X2'], seed: 4 });
    expect(d.notes.join(' ')).toMatch(/X2 is kept sorted.*split-plot.*understates the error for X2/);
    const levels = d.runs.map((r) => r.coded[1]);
    expect(levels).toEqual([...levels].sort((a, b) => a - b));
  });
});

describe('buildDesign: bad input', () => {
  const f7 = numeric(7);
  it('refuses more generators than the run count allows', () => {
    expect(() => buildDesign({ factors: f7, generators: ['C=AB', 'D=AB', 'E=AB', 'F=AB', 'G=AB'] })).toThrow(/5 generators for 7 factors leave 2 basic factors/);
  });
  it('refuses a dependent generator', () => {
    expect(() => buildDesign({ factors: numeric(6), generators: ['E=ABC', 'F=-ABC'] })).toThrow(/dependent/);
  });
  it('refuses a factor with equal low and high, and duplicate names', () => {
    expect(() => buildDesign({ factors: [{ kind: 'numeric', name: 'T', low: 5, high: 5 }, ...numeric(2)] })).toThrow(/T needs two different levels, got 5 and 5/);
    expect(() => buildDesign({ factors: [...numeric(2), { kind: 'numeric', name: 'x1', low: 0, high: 1 }] })).toThrow(/got "x1" twice/);
  });
  it('refuses more than 1024 runs, saying why', () => {
    expect(() => buildDesign({ factors: numeric(11) })).toThrow(/2\^11 factorial runs make 2048 runs, over the limit of 1024 runs for one design \(a plan/);
    expect(() => buildDesign({ factors: numeric(10), centerRuns: 1 })).toThrow(/1024 factorial \+ 1 center runs make 1025 runs/);
    expect(() => buildDesign({ factors: numeric(9), replicates: 3 })).toThrow(/512 factorial runs x 3 replicates make 1536 runs/);
  });
  it('refuses one factor, both a fraction and generators, and odd counts (degenerate input)', () => {
    expect(() => buildDesign({ factors: numeric(1) })).toThrow(/at least 2 factors, got 1/);
    expect(() => buildDesign({ factors: numeric(4), fraction: '1/2', generators: ['D=ABC'] })).toThrow(/not both/);
    expect(() => buildDesign({ factors: numeric(3), blocks: 3 })).toThrow(/1, 2, 4 or 8, got 3/);
    expect(() => buildDesign({ factors: numeric(3), replicates: 0 })).toThrow(/Replicates must be a whole number, 1 or more, got 0/);
    expect(() => buildDesign({ factors: numeric(3), centerRuns: -2 })).toThrow(/Center runs/);
  });
  it('refuses a seed with standard order, a foldover of a full factorial, center runs with categorical factors only, an unknown sort factor', () => {
    expect(() => buildDesign({ factors: numeric(3), randomize: false, seed: 1 })).toThrow(/seed only applies/);
    expect(() => buildDesign({ factors: numeric(3), foldover: 'all' })).toThrow(/no aliases to break/);
    const cats: FactorSpec[] = [
      { kind: 'categorical', name: 'P', levels: ['a', 'b'] },
      { kind: 'categorical', name: 'Q', levels: ['a', 'b'] },
    ];
    expect(() => buildDesign({ factors: cats, centerRuns: 1 })).toThrow(/all 2 factors are categorical/);
    expect(() => buildDesign({ factors: numeric(3), sortBy: ['Nope'] })).toThrow(/unknown factor "Nope"/);
  });
  it('builds nothing when any part is bad: the error comes before a seed is drawn', () => {
    expect(() => buildDesign({ factors: numeric(4), blocks: 2, blockWords: ['ABC', 'ABD'] })).toThrow(InputError);
  });
});

/** A random valid spec: full factorial, catalog fraction or random typed generators; folds, blocks, centers, replicates. */
const specArb: fc.Arbitrary<DesignSpec> = fc
  .record({
    k: fc.integer({ min: 3, max: 7 }),
    mode: fc.constantFrom('full', 'catalog', 'typed'),
    m: fc.integer({ min: 3, max: 6 }),
    pick: fc.array(fc.nat(), { minLength: 7, maxLength: 7 }),
    signs: fc.array(fc.boolean(), { minLength: 7, maxLength: 7 }),
    blocks: fc.constantFrom(1, 2, 4),
    centers: fc.integer({ min: 0, max: 3 }),
    replicates: fc.integer({ min: 1, max: 2 }),
    fold: fc.constantFrom('none', 'all', 'one'),
    seed: fc.nat(),
  })
  .map(({ k, mode, m, pick, signs, blocks, centers, replicates, fold, seed }) => {
    const spec: { -readonly [K in keyof DesignSpec]: DesignSpec[K] } = { factors: numeric(k), centerRuns: centers, replicates, seed, blocks };
    let fraction = false;
    if (mode === 'catalog' && k >= 4) {
      spec.fraction = `1/${2 ** Math.min(k - 3, 1 + (pick[0] % (k - 3)))}`;
      fraction = true;
    } else if (mode === 'typed') {
      const mm = Math.min(m, k - 1);
      if (k <= 2 ** mm - 1) {
        const cands: number[] = [];
        for (let c = 1; c < 2 ** mm; c++) if (termOrder(c) >= 2) cands.push(c);
        const chosen: number[] = [];
        for (let g = 0; g < k - mm; g++) {
          const left = cands.filter((c) => !chosen.includes(c));
          chosen.push(left[pick[g] % left.length]);
        }
        spec.generators = chosen.map((c, g) => {
          const rhs = L.slice(0, mm).filter((_, i) => (c >> i) & 1).join('');
          return `${L[mm + g]}=${signs[g] ? '-' : ''}${rhs}`;
        });
        fraction = true;
      }
    }
    if (fraction && fold !== 'none') spec.foldover = fold === 'all' ? 'all' : L[pick[6] % k];
    return spec as DesignSpec;
  });

/** Builds the spec, or returns null when the request is one the builder rightly refuses. */
function tryBuild(spec: DesignSpec): Design | null {
  try {
    return buildDesign(spec);
  } catch (e) {
    if (e instanceof InputError) return null;
    throw e;
  }
}

describe('buildDesign: properties', () => {
  it('factor columns are balanced and mutually orthogonal over the factorial runs', () => {
    fc.assert(
      fc.property(specArb, (spec) => {
        const d = tryBuild(spec);
        if (!d) return;
        const rows = factorialRows(d);
        const k = d.factors.length;
        for (let i = 0; i < k; i++) {
          expect(dot(column(1 << i, rows), rows.map(() => 1))).toBe(0);
          for (let j = i + 1; j < k; j++) expect(dot(column(1 << i, rows), column(1 << j, rows))).toBe(0);
        }
        // Center runs do not disturb balance of the categorical columns either.
        const all = d.runs.map((r) => [...r.coded]);
        for (let i = 0; i < k; i++) expect(all.reduce((s, r) => s + r[i], 0)).toBe(0);
      }),
      { numRuns: 120 },
    );
  });

  it('the defining relation is exactly the set of constant columns, with their signs; resolution is the shortest word', () => {
    fc.assert(
      fc.property(specArb, (spec) => {
        const d = tryBuild(spec);
        if (!d) return;
        const constant = constantWords(d);
        const reported = d.definingRelation.map((w) => parseLetterWord(w, L));
        expect(new Map(reported.map((w) => [w.mask, w.sign]))).toEqual(constant);
        const lengths = reported.map((w) => termOrder(w.mask));
        expect(d.resolution).toBe(lengths.length ? Math.min(...lengths) : null);
        const wl: Record<number, number> = {};
        for (const n of lengths) wl[n] = (wl[n] ?? 0) + 1;
        expect(d.wordLengths).toEqual(wl);
      }),
      { numRuns: 120 },
    );
  });

  it('effects reported as aliased have equal or negated columns as reported; effects in different chains are orthogonal', () => {
    fc.assert(
      fc.property(specArb, (spec) => {
        const d = tryBuild(spec);
        if (!d) return;
        const rows = factorialRows(d);
        const chains = d.aliases.map((c) => c.map((w) => parseLetterWord(w, L)));
        const flat = chains.flatMap((c, ci) => c.map((w) => ({ ...w, ci })));
        expect(new Set(flat.map((w) => w.mask)).size).toBe(flat.length);
        for (let x = 0; x < flat.length; x++) {
          const cx = column(flat[x].mask, rows);
          for (let y = x + 1; y < flat.length; y++) {
            const cy = column(flat[y].mask, rows);
            if (flat[x].ci === flat[y].ci) expect(cy).toEqual(cx.map((v) => v * flat[x].sign * flat[y].sign));
            else expect(dot(cx, cy)).toBe(0);
          }
        }
        // Every main effect and two-factor interaction is in some chain.
        const k = d.factors.length;
        const masks = new Set(flat.map((w) => w.mask));
        for (let i = 0; i < k; i++) for (let j = i; j < k; j++) expect(masks.has((1 << i) | (1 << j))).toBe(true);
      }),
      { numRuns: 120 },
    );
  });

  it('blocking confounds exactly the reported words and their aliases', () => {
    fc.assert(
      fc.property(specArb, (spec) => {
        const d = tryBuild(spec);
        if (!d) return;
        const fact = d.runs.filter((r) => r.kind === 'factorial');
        const relation = d.definingRelation.map((w) => parseLetterWord(w, L).mask);
        const confounded = new Set<number>();
        for (const w of d.blockWords) {
          const m = parseLetterWord(w, L).mask;
          confounded.add(m);
          for (const r of relation) confounded.add(m ^ r);
        }
        const blocks = [...new Set(fact.map((r) => r.block))];
        const constant = constantWords(d);
        for (let m = 1; m < 2 ** d.factors.length; m++) {
          if (constant.has(m)) continue;
          const inBlocks = blocks.every((b) => new Set(fact.filter((r) => r.block === b).map((r) => column(m, [r.coded])[0])).size === 1);
          expect(inBlocks).toBe(confounded.has(m));
        }
        if (!spec.foldover && (spec.blocks ?? 1) === 1) expect(d.blockWords).toEqual([]);
      }),
      { numRuns: 120 },
    );
  });

  it('the same seed gives the same run order; runs are numbered 1..N; each block is contiguous', () => {
    fc.assert(
      fc.property(specArb, (spec) => {
        const d = tryBuild(spec);
        if (!d) return;
        expect(buildDesign(spec).runs).toEqual(d.runs);
        expect(d.runs.map((r) => r.run)).toEqual(d.runs.map((_, i) => i + 1));
        const order = d.runs.map((r) => r.block);
        expect(order).toEqual([...order].sort((a, b) => a - b));
      }),
      { numRuns: 60 },
    );
  });
});
