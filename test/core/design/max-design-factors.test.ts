import { describe, expect, it } from 'vitest';
import { catalogEntries, catalogFraction } from '../../../src/core/design/catalog.ts';
import { MAX_DESIGN_FACTORS } from '../../../src/core/design/max-design-factors.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('MAX_DESIGN_FACTORS', () => {
  it('is the largest factor count of the catalog: the saturated 2^(15-11) in 16 runs', () => {
    // A 16-run two-level design has 15 columns besides the mean, so at most 15 factors
    // (Montgomery 8th ed., section 8.5, saturated resolution III designs; from memory).
    const most = Math.max(...catalogEntries().map((e) => e.factors));
    expect(MAX_DESIGN_FACTORS).toBe(most);
    const sat = catalogFraction(15, 11);
    expect(sat.runs).toBe(16);
    expect(sat.generators.length).toBe(11);
  });
  it('degenerate input: one factor more than the limit has no catalog fraction', () => {
    expect(() => catalogFraction(MAX_DESIGN_FACTORS + 1, 12)).toThrow(InputError);
  });
});
