import { describe, expect, it } from 'vitest';
import { RIDGE_BEYOND_ONE, ridgeCaption, ridgeReason } from '../../../src/core/text/ridge-text.ts';

// Wording of this tool; when a ridge table helps follows Myers, Montgomery and Anderson-Cook,
// Response Surface Methodology, 3rd ed., section 6.4 (ridge analysis, from memory).
describe('ridge text', () => {
  it('caption by sense', () => {
    expect(ridgeCaption('max', 'Yield')).toBe('Highest Yield at each distance from the center');
    expect(ridgeCaption('min', 'Scrap')).toBe('Lowest Scrap at each distance from the center');
  });
  it('a reason for a saddle, an outside or missing stationary point, a ridge; none for an inside top or bottom', () => {
    expect(ridgeReason('saddle', true)).toMatch(/^The surface is a saddle/);
    expect(ridgeReason('maximum', false)).toMatch(/^The stationary point lies outside the tested box/);
    expect(ridgeReason('minimum', null)).toMatch(/no single stationary point/);
    expect(ridgeReason('ridge', true)).toMatch(/is a ridge/);
    expect(ridgeReason('maximum', true)).toBeNull();
    expect(ridgeReason('minimum', true)).toBeNull();
    expect(RIDGE_BEYOND_ONE).toContain('radius 1');
  });
});
