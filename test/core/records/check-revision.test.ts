import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { checkRevision } from '../../../src/core/records/check-revision.ts';
import { revision, studies } from './revision-helpers.ts';

describe('checkRevision', () => {
  it('gives back a sound revision field for field, with text trimmed where the values check trims it', () => {
    const r = revision({ operator: '  Shift A (invented) ' });
    expect(checkRevision(r, 'r', studies)).toEqual({ ...r, operator: 'Shift A (invented)' });
  });
  it('refuses, naming the path: an unknown field, a study not in the file, a run not in the plan, a counter of 0, bad values', () => {
    expect(() => checkRevision({ ...revision(), version: 1 }, 'r', studies)).toThrow('r: has no field "version" in this format');
    expect(() => checkRevision(revision({ studyId: 's-9' }), 'r', studies)).toThrow('r.studyId: needs a study in this file, got "s-9", which it does not hold');
    // The invented plan has 2^3 = 8 corners and 2 center runs: runs 1 to 10.
    expect(() => checkRevision(revision({ plannedRun: 11 }), 'r', studies)).toThrow('r.plannedRun: needs a run of the plan of "Invented demo: coating line trial" (1 to 10), got 11');
    expect(() => checkRevision(revision({ rev: 0 }), 'r', studies)).toThrow(/^r\.rev: needs a whole number from 1 to/);
    expect(() => checkRevision(revision({ readings: [[Number.NaN], []] }), 'r', studies)).toThrow('r.readings[0][0]: needs a finite number, got NaN');
    expect(() => checkRevision(revision({ actual: [160, 2] }), 'r', studies)).toThrow('r: Actual settings: needs one per factor (3), got 2');
    expect(() => checkRevision(revision({ excluded: true, reason: ' ' }), 'r', studies)).toThrow('r: Excluded: an excluded run needs a reason, got none');
    expect(() => checkRevision(revision({ savedAt: 'now' }), 'r', studies)).toThrow('r.savedAt: needs a date and time (ISO 8601, e.g. 2026-03-01T14:05 or 2026-03-01T14:05:00Z), got "now"');
  });
  it('degenerate input: not an object, or no studies to check against', () => {
    expect(() => checkRevision(null, 'r', studies)).toThrow(new InputError('r: needs an object, got nothing'));
    expect(() => checkRevision(revision(), 'r', new Map())).toThrow(/r\.studyId: needs a study in this file/);
  });
});
