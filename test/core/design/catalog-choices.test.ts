import { describe, expect, it } from 'vitest';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { catalogChoices, plackettBurmanChoices } from '../../../src/core/design/catalog-choices.ts';
import { MAX_DESIGN_FACTORS } from '../../../src/core/design/max-design-factors.ts';
import type { FactorSpec } from '../../../src/core/factor/factor.ts';

const summary = (k: number) => catalogChoices(k).map((c) => [c.fraction, c.runs, c.resolution]);

describe('catalogChoices', () => {
  it('gives the resolutions of the standard fractions', () => {
    // Montgomery, Design and Analysis of Experiments, 8th ed., Table 8.14 (from memory):
    // 2^(4-1)_IV; 2^(5-1)_V, 2^(5-2)_III; 2^(6-1)_VI, 2^(6-2)_IV, 2^(6-3)_III;
    // 2^(7-1)_VII, 2^(7-2)_IV, 2^(7-3)_IV, 2^(7-4)_III.
    expect(summary(4)).toEqual([['full', 16, null], ['1/2', 8, 4]]);
    expect(summary(5)).toEqual([['full', 32, null], ['1/2', 16, 5], ['1/4', 8, 3]]);
    expect(summary(6)).toEqual([['full', 64, null], ['1/2', 32, 6], ['1/4', 16, 4], ['1/8', 8, 3]]);
    expect(summary(7)).toEqual([['full', 128, null], ['1/2', 64, 7], ['1/4', 32, 4], ['1/8', 16, 4], ['1/16', 8, 3]]);
  });
  it('offers only the full factorial for 2 and 3 factors (the catalog starts at 8 runs)', () => {
    expect(summary(2)).toEqual([['full', 4, null]]);
    expect(summary(3)).toEqual([['full', 8, null]]);
  });
  it('agrees with the resolution of the design the builder makes, for every factor count', () => {
    for (let k = 2; k <= MAX_DESIGN_FACTORS; k++) {
      const factors = Array.from({ length: k }, (_, i): FactorSpec => ({ kind: 'numeric', name: `x${i + 1}`, low: 0, high: 1 }));
      for (const c of catalogChoices(k)) {
        if (c.fraction === 'full') continue;
        const d = buildDesign({ factors, fraction: c.fraction, randomize: false });
        expect([k, c.fraction, c.resolution, c.runs]).toEqual([k, c.fraction, d.resolution, d.runs.length]);
      }
    }
  });
  it('refuses a factor count it cannot offer (degenerate and too many)', () => {
    expect(() => catalogChoices(0)).toThrow('Design choices need a whole number of factors from 1 to 15, got 0');
    expect(() => catalogChoices(MAX_DESIGN_FACTORS + 1)).toThrow('got 16');
    expect(() => catalogChoices(2.5)).toThrow('got 2.5');
  });
});

describe('plackettBurmanChoices', () => {
  it('offers each of 12, 20 and 24 runs that has a column per factor (Plackett and Burman 1946: N - 1 columns)', () => {
    expect(plackettBurmanChoices(2)).toEqual([{ runs: 12, unusedColumns: 9 }, { runs: 20, unusedColumns: 17 }, { runs: 24, unusedColumns: 21 }]);
    expect(plackettBurmanChoices(11)).toEqual([{ runs: 12, unusedColumns: 0 }, { runs: 20, unusedColumns: 8 }, { runs: 24, unusedColumns: 12 }]);
    expect(plackettBurmanChoices(12).map((c) => c.runs)).toEqual([20, 24]);
    expect(plackettBurmanChoices(23)).toEqual([{ runs: 24, unusedColumns: 0 }]);
  });

  it('degenerate input: fewer than 2 factors, more than 23 or not a whole number gives no choice', () => {
    expect(plackettBurmanChoices(1)).toEqual([]);
    expect(plackettBurmanChoices(24)).toEqual([]);
    expect(plackettBurmanChoices(2.5)).toEqual([]);
  });
});
