import { describe, expect, it } from 'vitest';
import { logMoreRunsText } from '../../../src/core/text/log-more-runs.ts';

// Punctuation only (common practice: one full stop between two sentences, never two).
describe('logMoreRunsText', () => {
  it('ends the fit reason with one full stop before saying what to do', () => {
    const t = logMoreRunsText('Gloss: 0 runs cannot estimate even the intercept and 3 main effects; at least 4 runs are needed');
    expect(t).toBe('Gloss: 0 runs cannot estimate even the intercept and 3 main effects; at least 4 runs are needed. Log more runs, then come back here.');
  });

  it('does not double a stop the reason already has', () => {
    expect(logMoreRunsText('Too few runs.')).toBe('Too few runs. Log more runs, then come back here.');
    expect(logMoreRunsText('Too few runs; ')).toBe('Too few runs. Log more runs, then come back here.');
  });
});
