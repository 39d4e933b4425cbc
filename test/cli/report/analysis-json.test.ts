import { describe, expect, it } from 'vitest';
import { analysisJson } from '../../../src/cli/report/analysis-json.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('analysisJson', () => {
  it('carries the typed verdicts beside the warnings, as plain data that survives JSON (Montgomery 8th ed., section 6.8 example)', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const out = JSON.parse(JSON.stringify(analysisJson(analyze(d))));
    expect(out.verdicts[0]).toMatchObject({ kind: 'curvature', outcome: 'flat', nCenter: 5, reason: null });
    expect(out.verdicts[0].p).toBeCloseTo(0.8137, 4); // printed P-value of the pure quadratic term (from memory; agrees with jstat, see test/core/fit/analyze.test.ts)
    expect(Array.isArray(out.warnings)).toBe(true);
  });
  it('degenerate input: no verdicts gives an empty list, not a missing key', () => {
    const d = fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration', 'Catalyst'], response: 'Yield' });
    expect(analysisJson(analyze(d)).verdicts).toEqual([]);
  });
  it('keeps the published key blocks[].effect for a block offset: each block mean minus the grand mean (balanced plan)', () => {
    // Montgomery 8th ed., Example 6.1 (plasma etch, two replicates), each replicate taken as a block.
    // In a complete balanced plan a block's offset under sum-to-zero coding is its mean minus the
    // grand mean (common practice; computed here from the readings, not typed in).
    const d = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });
    const blocks = d.y.map((_, i) => (i % 2) + 1); // the file lists the two replicates of each treatment in turn
    const out = JSON.parse(JSON.stringify(analysisJson(analyze({ ...d, blocks }))));
    const mean = (xs: readonly number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
    const grand = mean(d.y);
    expect(out.blocks.map((b: { block: number }) => b.block)).toEqual([1, 2]);
    for (const b of out.blocks) {
      expect(Object.keys(b)).toEqual(['block', 'effect']);
      expect(b.effect).toBeCloseTo(mean(d.y.filter((_, i) => blocks[i] === b.block)) - grand, 9);
    }
  });
  it('degenerate input: an unblocked analysis has blocks null', () => {
    const d = fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration', 'Catalyst'], response: 'Yield' });
    expect(analysisJson(analyze(d)).blocks).toBeNull();
  });
});
