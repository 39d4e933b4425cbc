import { describe, expect, it } from 'vitest';
import { boundNote, boxCoxText } from '../../../src/core/text/bound-text.ts';

// Wording, not numbers: the bound is quoted as given, the suggestion as the screen's scale name (common practice).
describe('bound text', () => {
  it('a bound of 0 reads "cannot be negative"; another bound is quoted', () => {
    expect(boundNote('Roughness', 0)).toMatch(/^Roughness cannot be negative: the Log, Square root and Inverse scales keep every prediction above 0/);
    expect(boundNote('Temperature rise', 20.5)).toMatch(/^Temperature rise cannot go below 20\.5: .* above 20\.5/);
  });
  it('the Box-Cox line names the scale and, with a bound, what it was worked on', () => {
    expect(boxCoxText('log', 'Roughness', 0)).toBe('Box-Cox suggests: Log');
    expect(boxCoxText('sqrt', 'Temperature rise', 20)).toBe('Box-Cox suggests: Square root (for Temperature rise minus its lowest value 20)');
    expect(boxCoxText('none', 'Gloss', null)).toBe('Box-Cox suggests: as measured');
    expect(boxCoxText('power=0.3', 'Gloss', null)).toBe('Box-Cox suggests: power=0.3'); // degenerate: a power with no screen name stays a token
  });
});
