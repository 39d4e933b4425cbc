import { describe, expect, it } from 'vitest';
import { designAliasChains } from '../../../src/core/design/alias-structure.ts';
import { definingRelation } from '../../../src/core/design/defining-relation.ts';
import type { SummaryInput } from '../../../src/core/design/design-note.ts';
import { designSummary } from '../../../src/core/text/design-text.ts';
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
    expect(text).toBe('8 runs, resolution IV: main effects are clear of two-factor interactions; AB is aliased with CD; AC with BD; AD with BC. Run order randomised (seed 7).');
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
