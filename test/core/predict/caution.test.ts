import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/core/predict/caution.ts';

describe('CAUTION', () => {
  it('states the three points every prediction carries (the issue text: estimate inside the tested range, rated limits, site procedures and qualified staff)', () => {
    expect(CAUTION).toHaveLength(3);
    expect(CAUTION[0]).toMatch(/statistical estimate.*inside the tested range/);
    expect(CAUTION[1]).toMatch(/rated limits/);
    expect(CAUTION[2]).toMatch(/Site procedures and qualified staff decide/);
  });

  it('degenerate: it cannot be changed by a caller', () => {
    expect(Object.isFrozen(CAUTION)).toBe(true);
    expect(() => (CAUTION as string[]).push('x')).toThrow(TypeError);
  });
});
