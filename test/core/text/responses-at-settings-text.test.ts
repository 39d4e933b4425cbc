import { describe, expect, it } from 'vitest';
import { noValueWord, overallMissing, RESPONSES_AT_LIMITS } from '../../../src/core/text/responses-at-settings-text.ts';

// Wording checks only (no published source applies): each sentence names what is missing and what to do.
describe('the quick card block of all responses: its words', () => {
  it('a plain word for each reason, never a number or a dash', () => {
    const words = (['not-fitted', 'transformed', 'no-limits', 'not-available'] as const).map(noValueWord);
    expect(new Set(words).size).toBe(4);
    for (const w of words) expect(w).toMatch(/^[a-z ]+$/);
  });

  it('no overall D names one response or several, and points to the all-responses screen', () => {
    expect(overallMissing(['Gloss'])).toBe('No overall D: Gloss has no d here. Open the all-responses screen to see why and to set its goal or limits.');
    expect(overallMissing(['Gloss', 'Haze', 'Thickness'])).toContain('Gloss, Haze and Thickness have no d here');
    expect(overallMissing(['Gloss', 'Haze'])).toContain('set their goal');
  });

  it('the limits line says where the limits come from and where to change them', () => {
    expect(RESPONSES_AT_LIMITS).toMatch(/logged values.*all-responses screen\.$/);
  });
});
