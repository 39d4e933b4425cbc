import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../../src/core/predict/caution.ts';
import { CAUTION_MORE, CAUTION_SHORT } from '../../../src/core/text/caution-short.ts';

describe('CAUTION_SHORT', () => {
  it('keeps the three points of the full caution (tested range, rated limits, site procedures and qualified staff)', () => {
    // The points as CAUTION states them (core/predict/caution.ts).
    expect(CAUTION[0]).toMatch(/inside the tested range/);
    expect(CAUTION_SHORT).toMatch(/inside the tested range/);
    expect(CAUTION[1]).toMatch(/rated limits/);
    expect(CAUTION_SHORT).toMatch(/rated limits/);
    expect(CAUTION[2]).toMatch(/Site procedures and qualified staff decide/);
    expect(CAUTION_SHORT).toMatch(/site procedures and qualified staff decide/);
  });
  it('is shorter than the full caution, so it fits in a line or two on a phone', () => {
    expect(CAUTION_SHORT.length).toBeLessThan(CAUTION.join(' ').length / 2);
    expect(CAUTION_MORE.length).toBeGreaterThan(0);
  });
});
