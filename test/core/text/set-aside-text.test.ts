import { describe, expect, it } from 'vitest';
import { setAsideConfirm, setAsideCountLine, setAsideFrom, setAsideSaved, setAsideWhat, setAsideWhy, type SetAsideFacts } from '../../../src/core/text/set-aside-text.ts';

// Wording checks: no published source applies; the expectations are the plain-words rules of the
// set-aside screen (what, which study and run, why, from where), checked phrase by phrase.
const revision: SetAsideFacts = { kind: 'revision', id: 'r1', studyId: 's1', plannedRun: 3, field: 'readings[0][0]', reason: 'r', fromDevice: 'dev-a' };
const study: SetAsideFacts = { kind: 'study', id: 's1', studyId: 's1', plannedRun: null, field: 'title', reason: 'r', fromDevice: null };

describe('set-aside records in plain words', () => {
  it('names a revision by its run and the study by title, or by id when the study is not here', () => {
    expect(setAsideWhat(revision, 'Cure trial')).toBe('A revision of run 3 of "Cure trial"');
    expect(setAsideWhat(revision, null)).toBe('A revision of run 3 of a study that is not on this device (id s1)');
    expect(setAsideWhat(study, 'Cure trial')).toBe('Another copy of the plan of "Cure trial"');
    expect(setAsideWhat(study, null)).toBe('The plan of a study (id s1)');
  });

  it('says why: the field that differs, the whole record, or a record it depends on', () => {
    expect(setAsideWhy(revision)).toMatch(/other content \(readings\[0\]\[0\] differs\)/);
    expect(setAsideWhy({ field: '' })).toMatch(/\(the whole record differs\)/);
    expect(setAsideWhy({ field: null })).toBe('It depends on another record that was set aside.');
  });

  it('names the device that wrote the file, or says the file did not', () => {
    expect(setAsideFrom(revision)).toBe('Written by device dev-a.');
    expect(setAsideFrom(study)).toMatch(/did not say/);
  });

  it('the count line is empty for none (degenerate input) and reads in the singular for one', () => {
    expect(setAsideCountLine(0)).toBe('');
    expect(setAsideCountLine(-1)).toBe('');
    expect(setAsideCountLine(Number.NaN)).toBe('');
    expect(setAsideCountLine(1)).toBe('1 record from imported files was set aside, not merged. It is kept on this device.');
    expect(setAsideCountLine(2)).toMatch(/^2 records .* were set aside, .* They are kept/);
  });

  it('the confirmation names the record and says whether it is in a saved file', () => {
    const unsaved = setAsideConfirm(revision, 'Cure trial', false);
    expect(unsaved).toContain('(A revision of run 3 of "Cure trial")');
    expect(unsaved).toContain('has not been saved to a file');
    expect(setAsideConfirm(revision, 'Cure trial', true)).toContain('It is in the file you saved');
    expect(unsaved).toContain("The device's own records are not changed");
  });

  it('a cancelled share sheet says nothing was sent; a saved file says the records stay', () => {
    expect(setAsideSaved('cancelled', 'f.json', 2)).toMatch(/nothing was sent/);
    expect(setAsideSaved('downloaded', 'f.json', 1)).toBe('f.json (1 set-aside record) is downloading. The records also stay here.');
    expect(setAsideSaved('shared', 'f.json', 2)).toMatch(/^f\.json \(2 set-aside records\) was handed to the share sheet/);
  });
});

describe('both values where the records differ', () => {
  it('numbers short, text quoted, a missing side said as nothing', async () => {
    const { setAsideValues } = await import('../../../src/core/text/set-aside-text.ts');
    expect(setAsideValues({ found: true, value: 75.4 }, { found: true, value: 70.4 })).toBe('In the file: 75.4; on this device: 70.4.');
    expect(setAsideValues({ found: true, value: 'Renamed' }, { found: true, value: 'Cure' })).toBe('In the file: "Renamed"; on this device: "Cure".');
    expect(setAsideValues({ found: false }, { found: true, value: [1, 2] })).toBe('In the file: nothing; on this device: [1,2].');
    expect(setAsideValues({ found: true, value: { a: 'x'.repeat(80) } }, { found: false })).toMatch(/^In the file: \{"a":"x+…; on this device: nothing\.$/);
  });
});
