import { describe, expect, it } from 'vitest';
import { designAliasChains } from '../../../src/core/design/alias-structure.ts';
import { definingRelation } from '../../../src/core/design/defining-relation.ts';
import type { SummaryInput } from '../../../src/core/design/design-note.ts';
import { blockOriginText, designNoteText, designSummary } from '../../../src/core/text/design-text.ts';
import { MONTGOMERY_TABLE_SOURCE } from '../../../src/core/design/blocking.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { InputError } from '../../../src/core/errors.ts';
import { mask } from '../design/helpers.ts';

const letters = 'ABCDEFGHJK'.split('');
const w = (s: string) => ({ mask: mask(s), sign: 1 as const });
const base = (over: Partial<SummaryInput>): SummaryInput => ({
  letters,
  totalRuns: 8,
  factorialRuns: 8,
  centerRuns: 0,
  replicates: 1,
  blocks: 1,
  resolution: null,
  chains: [],
  blockWords: [],
  seed: 7,
  folded: false,
  ...over,
});

describe('designSummary', () => {
  it('reads a resolution IV fraction: main effects clear, two-factor interactions aliased (Box, Hunter and Hunter, 2nd ed., section 6.3)', () => {
    const rel = [w('ABCD')];
    const text = designSummary(base({ resolution: 4, chains: designAliasChains(rel, 4, 3) }));
    expect(text).toBe('8 runs, resolution IV: main effects are clear of two-factor interactions; AB is aliased with CD; AC with BD; AD with BC. Run order randomized (seed 7).');
  });
  it('reads a resolution III fraction: main effects aliased with two-factor interactions', () => {
    const rel = definingRelation([w('ABD'), w('ACE')]);
    const text = designSummary(base({ resolution: 3, chains: designAliasChains(rel, 5, 3) }));
    expect(text).toMatch(/^8 runs, resolution III: main effects are aliased with two-factor interactions: A is aliased with BD and CE; B with AD; C with AE; and 2 more such chains\./);
  });
  it('reads resolution V and a blocked full factorial with centers, replicates and standard order', () => {
    expect(designSummary(base({ totalRuns: 16, factorialRuns: 16, resolution: 5, chains: [] }))).toMatch(/resolution V: main effects and two-factor interactions are clear of each other/);
    const text = designSummary(base({ totalRuns: 40, factorialRuns: 16, centerRuns: 4, replicates: 2, blocks: 2, blockWords: [mask('ABCD')], seed: null }));
    expect(text).toBe('40 runs (16 factorial + 4 center per replicate, 2 replicates, 4 blocks), a full factorial: every main effect and interaction is estimated on its own except ABCD, confounded with blocks. Standard order kept.');
  });
  it('warns when a two-factor interaction is confounded with blocks', () => {
    expect(designSummary(base({ blocks: 8, blockWords: [mask('AB'), mask('ABC')] }))).toMatch(/The two-factor interaction AB cannot be told from the block differences/);
  });
  it('refuses a plan without runs (degenerate input)', () => {
    expect(() => designSummary(base({ totalRuns: 0 }))).toThrow(InputError);
  });
});

describe('designNoteText and blockOriginText', () => {
  it('writes each note from its facts', () => {
    expect(designNoteText({ kind: 'seed-drawn', seed: 7 })).toBe('Seed 7 was drawn for this plan and is recorded with it: the same seed gives the same run order on any device.');
    expect(designNoteText({ kind: 'center-uneven', centerRuns: 3, blocks: 2 })).toBe('Center runs: 3 do not divide evenly over 2 blocks; the first blocks get one more.');
    expect(designNoteText({ kind: 'blocked-two-factor', words: ['AB', 'CD'] })).toBe('Warning: the two-factor interactions AB, CD are confounded with blocks.');
    expect(designNoteText({ kind: 'center-categorical', factors: ['Powder'], centerRuns: 1, perReplicate: 2 })).toMatch(/Powder has no middle, .* its levels \(1 center run becomes 2 per replicate\)\.$/);
    expect(designNoteText({ kind: 'split-plot', factors: ['Oven', 'Line'] })).toMatch(/^Warning: Oven, Line are kept sorted .* their effects look more certain than they are\.$/);
    expect(designNoteText({ kind: 'block-words', words: ['ABC'], origin: { kind: 'given' } })).toBe('Block words: ABC, from the block words given.');
  });

  it('a foldover note names at most 12 separated pairs, and says when it separates none (degenerate input)', () => {
    const pairs = Array.from({ length: 14 }, (_, i) => [`X${i}`, `Y${i}`] as const);
    const base = { kind: 'foldover', fold: 'all', from: 9, to: 16, severalBlocks: false, droppedWord: 'ABD' } as const;
    const text = designNoteText({ ...base, separated: pairs });
    expect(text).toMatch(/^Foldover: runs 9 to 16 in standard order are the mirror image/);
    expect(text).toContain('X11 from Y11 and 2 more pairs');
    expect(text).not.toContain('X12 from');
    expect(designNoteText({ ...base, fold: { letter: 'D', name: 'Time' }, separated: [] })).toMatch(/signs of D \(Time\) switched.*It separates no pair/);
  });

  it('says where block words came from', () => {
    expect(blockOriginText({ kind: 'table' })).toBe(MONTGOMERY_TABLE_SOURCE);
    expect(blockOriginText({ kind: 'highest-order', k: 9 })).toMatch(/^the 9-factor interaction/);
    expect(blockOriginText({ kind: 'minimum-aberration', k: 10, q: 3 })).toMatch(/2\^\(10-3\) fraction/);
    expect(blockOriginText({ kind: 'search', stopped: false, budget: 5 })).toMatch(/^exhaustive search/);
    expect(blockOriginText({ kind: 'search', stopped: true, budget: 5 })).toMatch(/stopped after 5 candidates/);
  });

  it("buildDesign's notes are its typed notes in words, and a foldover is a fact of the plan", () => {
    const factors = Array.from({ length: 7 }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 1 }));
    const d = buildDesign({ factors, fraction: '1/16', foldover: 'all', seed: 2 });
    expect(d.notes).toEqual(d.noteFacts.map(designNoteText));
    expect(d.foldover).toBe('all');
    expect(d.noteFacts.map((n) => n.kind)).toContain('foldover');
    const one = buildDesign({ factors, fraction: '1/16', foldover: 'X4', seed: 2 });
    expect(one.foldover).toBe('D');
    expect(buildDesign({ factors, fraction: '1/16', seed: 2 }).foldover).toBeNull();
  });
});
