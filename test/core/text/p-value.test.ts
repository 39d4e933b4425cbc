import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { pPhrase, pValue, SMALLEST_P_SHOWN } from '../../../src/core/text/p-value.ts';

describe('pValue and pPhrase: the one p-value wording', () => {
  it('four decimals, rounded half away as toFixed does', () => {
    // The AB test of Montgomery's 2^2 yield example (8th ed., Table 6.2): F = SS_AB / MS_E =
    // (25/3) / (94/24) on 1 and 8 df; its p from jstat (a general-purpose reference) is 0.18278.
    const p = 1 - jStat.centralF.cdf(200 / 94, 1, 8);
    expect(pValue(p)).toBe('0.1828');
    expect(pPhrase(0.02)).toBe('p = 0.0200');
    expect(pValue(1)).toBe('1.0000');
  });
  it('below 0.0001 only says so (common practice)', () => {
    expect(SMALLEST_P_SHOWN).toBe(1e-4);
    expect(pValue(2e-6)).toBe('<0.0001');
    expect(pPhrase(0)).toBe('p < 0.0001');
    expect(pValue(1e-4)).toBe('0.0001');
  });
  it('not available: a dash in a table, words in a sentence (degenerate input)', () => {
    expect(pValue(null)).toBe('-');
    expect(pValue(undefined)).toBe('-');
    expect(pValue(Number.NaN)).toBe('-');
    expect(pPhrase(null)).toBe('p not available');
  });
});
