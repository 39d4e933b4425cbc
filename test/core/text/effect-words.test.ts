import { describe, expect, it } from 'vitest';
import { effectWords } from '../../../src/core/text/effect-words.ts';

describe('effectWords', () => {
  it('by p: clear below 0.01, likely below 0.05, possible below 0.10, within the noise otherwise (common practice cut-offs)', () => {
    expect(effectWords(0.0001)).toBe('clear');
    expect(effectWords(0.0099)).toBe('clear');
    expect(effectWords(0.01)).toBe('likely');
    expect(effectWords(0.0499)).toBe('likely');
    expect(effectWords(0.05)).toBe('possible');
    expect(effectWords(0.0999)).toBe('possible');
    expect(effectWords(0.1)).toBe('within the noise');
    expect(effectWords(0.83)).toBe('within the noise');
  });

  it("without p, by Lenth's mark: beyond the simultaneous margin, beyond the margin, within the margin", () => {
    expect(effectWords(null, 'active')).toBe('beyond the simultaneous margin');
    expect(effectWords(null, 'likely')).toBe('beyond the margin');
    expect(effectWords(null, null)).toBe('within the margin');
    // A p, when there is one, decides, whatever the mark.
    expect(effectWords(0.2, 'active')).toBe('within the noise');
  });

  it('degenerate input: no p and no Lenth gives null (no test possible); NaN counts as no p', () => {
    expect(effectWords(null)).toBeNull();
    expect(effectWords(undefined)).toBeNull();
    expect(effectWords(Number.NaN)).toBeNull();
  });
});
