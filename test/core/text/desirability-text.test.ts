import { describe, expect, it } from 'vitest';
import { entryOrderMessage, goalMeaning, noSettingMeetsAll, notFittedMessage, overallWords, targetOrderMessage, transformedMessage } from '../../../src/core/text/desirability-text.ts';

// Wording checks (this tool's own sentences; the meaning of d per Derringer and Suich 1980,
// Journal of Quality Technology 12, 214-219).
describe('desirability text', () => {
  it('no setting meets all limits: names each response that misses, with its value and limit', () => {
    expect(noSettingMeetsAll([{ name: 'Gloss', unit: 'GU', fit: 62.04, limit: 70, side: 'below' }])).toBe(
      'No setting inside the tested box brings every response within its acceptable values (overall desirability 0). At the nearest setting found, Gloss is predicted at 62.04 GU, below its acceptable 70 GU. Widen that limit, set a response to Ignore, or, where the machine\'s rated limits allow, plan runs beyond the tested box.',
    );
    const two = noSettingMeetsAll([
      { name: 'A', fit: 1, limit: 2, side: 'below' },
      { name: 'B', fit: 9, limit: 8, side: 'above' },
    ]);
    expect(two).toContain('A is predicted at 1, below its acceptable 2 and B is predicted at 9, above its acceptable 8.');
    expect(two).toContain('Widen those limits');
    expect(noSettingMeetsAll([])).not.toContain('nearest setting');
  });

  it('order messages say what to type', () => {
    expect(entryOrderMessage('Scrap', 'min', 2, 8)).toBe('Scrap: to minimize, the ideal value must be below the acceptable one, got acceptable 2 and ideal 8. Type an ideal value below 2.');
    expect(targetOrderMessage('T', 1, 5, 3)).toMatch(/lowest < target < highest/);
  });

  it('each goal has its meaning, and the overall words follow D', () => {
    for (const g of ['max', 'min', 'target', 'ignore'] as const) expect(goalMeaning(g).length).toBeGreaterThan(20);
    expect(goalMeaning('min')).toContain('1 at or below the ideal value');
    expect(overallWords(1)).toBe('Every response at its ideal value.');
    expect(overallWords(0.3)).toBe('Every response within its acceptable values.');
    expect(overallWords(0)).toBe('Some response outside its acceptable values.');
    expect(transformedMessage('Gloss')).toContain('As measured');
    expect(notFittedMessage('Gloss', 'No runs.')).toBe('Gloss cannot be used yet: No runs. Set its goal to Ignore to weigh the others.');
  });
});
