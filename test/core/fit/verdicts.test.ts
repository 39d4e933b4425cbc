import { describe, expect, it } from 'vitest';
import { isWarning } from '../../../src/core/fit/verdicts.ts';

describe('isWarning', () => {
  const c = { kind: 'curvature', reason: null, p: 0.5, alpha: 0.05, estimate: 0, nCenter: 3, nFactorial: 4 } as const;
  it('warns for curved or untestable curvature and significant lack of fit; states the rest', () => {
    expect(isWarning({ ...c, outcome: 'curved' })).toBe(true);
    expect(isWarning({ ...c, outcome: 'untestable', reason: 'no-repeats' })).toBe(true);
    expect(isWarning({ ...c, outcome: 'flat' })).toBe(false);
    expect(isWarning({ kind: 'lack-of-fit', outcome: 'significant', p: 0.01, alpha: 0.05 })).toBe(true);
    expect(isWarning({ kind: 'lack-of-fit', outcome: 'not-significant', p: 0.5, alpha: 0.05 })).toBe(false);
  });
  it('every other verdict is a warning, even one with nothing in it (degenerate input)', () => {
    expect(isWarning({ kind: 'not-orthogonal' })).toBe(true);
    expect(isWarning({ kind: 'aliased', count: 0, carried: [], withInterceptOrBlocks: false })).toBe(true);
  });
});
