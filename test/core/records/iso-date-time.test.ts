import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isIsoDateTime } from '../../../src/core/records/iso-date-time.ts';
import { time } from '../../../src/core/records/field-checks.ts';

describe('isIsoDateTime', () => {
  it('accepts RFC 3339 section 5.8 examples and the picker\'s local value', () => {
    // RFC 3339 section 5.8 (examples).
    for (const t of ['1985-04-12T23:20:50.52Z', '1996-12-19T16:39:57-08:00', '1937-01-01T12:00:27.87+00:20']) expect(isIsoDateTime(t), t).toBe(true);
    // HTML Living Standard, "local date and time string" (what input type=datetime-local gives).
    for (const t of ['2026-03-01T14:05', '2026-03-01T14:05:30', '2026-03-01T14:05:30.250']) expect(isIsoDateTime(t), t).toBe(true);
  });
  it('refuses what Date.parse accepts but is not ISO 8601', () => {
    // Each of these is read by V8's Date.parse (checked below), so Date.parse alone would let them in.
    const loose = ['May 2, 2024', '2024-05-02 10:00', 'Thu, 02 May 2024 10:00:00 GMT', '2024/05/02', '1', '2024-05-02'];
    for (const t of loose) {
      expect(Number.isNaN(Date.parse(t)), t).toBe(false);
      expect(isIsoDateTime(t), t).toBe(false);
    }
  });
  it('checks the calendar: 29 February only in a Gregorian leap year, no 31st of a 30-day month', () => {
    expect(isIsoDateTime('2024-02-29T00:00Z')).toBe(true); // divisible by 4
    expect(isIsoDateTime('2000-02-29T00:00Z')).toBe(true); // divisible by 400
    expect(isIsoDateTime('1900-02-29T00:00Z')).toBe(false); // divisible by 100, not 400
    expect(isIsoDateTime('2026-02-29T14:05')).toBe(false);
    expect(isIsoDateTime('2026-04-31T14:05')).toBe(false);
    expect(isIsoDateTime('2026-13-01T14:05')).toBe(false);
    expect(isIsoDateTime('2026-03-00T14:05')).toBe(false);
    expect(isIsoDateTime('2024-5-2T10:00')).toBe(false);
    expect(isIsoDateTime('2026-03-01T24:00')).toBe(false);
    expect(isIsoDateTime('2026-03-01T14:05+24:00')).toBe(false);
  });
  it('agrees with Date on every real instant written by toISOString', () => {
    fc.assert(
      fc.property(fc.date({ min: new Date('0001-01-01T00:00:00Z'), max: new Date('9999-12-31T23:59:59Z'), noInvalidDate: true }), (d) => {
        expect(isIsoDateTime(d.toISOString())).toBe(true);
      }),
      { numRuns: 500 },
    );
  });
  it('refuses empty text and junk around a good time (degenerate input)', () => {
    expect(isIsoDateTime('')).toBe(false);
    expect(isIsoDateTime(' 2026-03-01T14:05')).toBe(false);
    expect(isIsoDateTime('2026-03-01T14:05\n')).toBe(false);
  });
});

describe('time (field check)', () => {
  it('names the field, what it needs with an example, and what came', () => {
    expect(() => time('2024-05-02 10:00', 'payload.revisions[0].savedAt')).toThrow('payload.revisions[0].savedAt: needs a date and time (ISO 8601, e.g. 2026-03-01T14:05 or 2026-03-01T14:05:00Z), got "2024-05-02 10:00"');
    expect(time('2026-03-01T14:05', 'loggedAt')).toBe('2026-03-01T14:05');
  });
});
