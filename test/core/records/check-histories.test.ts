import { describe, expect, it } from 'vitest';
import { checkHistories, checkUniqueIds } from '../../../src/core/records/check-histories.ts';
import { revision } from './revision-helpers.ts';

// An append-only history: each revision names the ones it was built on (common practice).
describe('checkHistories', () => {
  const first = revision();
  const second = revision({ id: 'r-2', rev: 2, parents: ['r-1'] });
  const restore = revision({ id: 'r-3', rev: 3, parents: ['r-2'], restoredFrom: 'r-1' });
  it('takes whole histories, including a fork from one parent and a restore', () => {
    const fork = revision({ id: 'r-2b', rev: 2, device: 'd-2', parents: ['r-1'] });
    expect(() => checkHistories([first, second, restore, fork], 'revisions')).not.toThrow();
  });
  it('refuses a repeated id, a missing parent, a parent of another run, a counter not above its parent, two plans for one run', () => {
    expect(() => checkHistories([first, first], 'revisions')).toThrow('revisions[1].id: revision ids must differ, got "r-1" twice (also at [0])');
    expect(() => checkHistories([second], 'revisions')).toThrow('revisions[0].parents[0]: needs a revision in this file, got "r-1", which it does not hold');
    const other = revision({ id: 'q-1', runId: 'run-2', plannedRun: 2 });
    expect(() => checkHistories([other, revision({ id: 'r-2', rev: 2, parents: ['q-1'] })], 'revisions')).toThrow('revisions[1].parents[0]: needs a revision of the same logged run, got one of "run-2"');
    expect(() => checkHistories([first, revision({ id: 'r-2', rev: 1, parents: ['r-1'] })], 'revisions')).toThrow('revisions[1].rev: needs a counter above its earlier revision\'s (1), got 1');
    expect(() => checkHistories([first, revision({ id: 'r-2', rev: 2, parents: ['r-1'], plannedRun: 2 })], 'revisions')).toThrow(/logged run "run-1" needs one study and planned run in all its revisions/);
    expect(() => checkHistories([first, revision({ id: 'r-2', rev: 2, restoredFrom: 'r-9' })], 'revisions')).toThrow('revisions[1].restoredFrom: needs a revision in this file, got "r-9", which it does not hold');
  });
  it('degenerate input: no revisions is a whole (empty) history', () => {
    expect(() => checkHistories([], 'revisions')).not.toThrow();
  });
});

describe('checkUniqueIds', () => {
  it('refuses a second record with the same id, naming both places', () => {
    expect(() => checkUniqueIds([{ id: 'a' }, { id: 'b' }], 'studies', 'study')).not.toThrow();
    expect(() => checkUniqueIds([{ id: 'a' }, { id: 'b' }, { id: 'a' }], 'studies', 'study')).toThrow('studies[2].id: study ids must differ, got "a" twice (also at [0])');
  });
  it('degenerate input: an empty list passes', () => {
    expect(() => checkUniqueIds([], 'studies', 'study')).not.toThrow();
  });
});
