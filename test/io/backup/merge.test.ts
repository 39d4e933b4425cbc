/**
 * planMerge on small hand-made records (invented): unions by id, set-aside clashes with the
 * field that differs and their dependants, idempotence and order independence.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { planMerge, type MergeBase } from '../../../src/io/backup/merge.ts';
import type { RunRevision, StudyRecord } from '../../../src/core/study/study.ts';

const study = (id: string, title = 'Trial'): StudyRecord => ({ id, title, device: 'd', createdAt: '2024-01-01T00:00:00Z', purpose: '', factors: [], responses: [], design: { runs: [] } }) as unknown as StudyRecord;
const rev = (id: string, runId: string, n: number, parents: string[] = [], reading = 70, extra: Partial<RunRevision> = {}): RunRevision =>
  ({ id, runId, studyId: 's1', plannedRun: 1, rev: n, device: 'd', parents, restoredFrom: null, savedAt: '2024-01-01T00:00:00Z', actual: [], readings: [[reading]], loggedAt: null, operator: null, notes: '', excluded: false, reason: '', ...extra }) as RunRevision;

function baseOf(studies: StudyRecord[], revisions: RunRevision[]): MergeBase {
  const byRun = new Map<string, RunRevision[]>();
  for (const r of revisions) byRun.set(r.runId, [...(byRun.get(r.runId) ?? []), r]);
  return { studies: new Map(studies.map((s) => [s.id, s])), revisions: new Map(revisions.map((r) => [r.id, r])), historyOf: (id) => byRun.get(id) ?? [], blocks: new Map() };
}

describe('planMerge', () => {
  it('adds what is new and counts what is already there', () => {
    const have = [rev('a', 'run1', 1)];
    const plan = planMerge(baseOf([study('s1')], have), { studies: [study('s1')], revisions: [...have, rev('b', 'run1', 2, ['a'], 71)] });
    expect(plan.newRevisions.map((r) => r.id)).toEqual(['b']);
    expect(plan.unchangedRevisions).toBe(1);
    expect(plan.unchangedStudies).toBe(1);
    expect(plan.runs.map((r) => [r.id, r.revisionId])).toEqual([['run1', 'b']]);
    expect(plan.setAside).toEqual([]);
  });
  it('sets aside a clashing revision with the field that differs, and every revision built on it, in any chain length', () => {
    const have = [rev('a', 'run1', 1)];
    const file = [rev('a', 'run1', 1, [], 99), rev('b', 'run1', 2, ['a']), rev('c', 'run1', 3, ['b']), rev('x', 'run2', 1, [], 50, { plannedRun: 2 })];
    // File order must not matter: given newest first.
    const plan = planMerge(baseOf([study('s1')], have), { studies: [study('s1')], revisions: [...file].reverse() });
    expect(plan.setAside.map((s) => [s.id, s.field])).toEqual([
      ['a', 'readings[0][0]'],
      ['b', null],
      ['c', null],
    ]);
    expect(plan.setAside[2].reason).toBe('Revision c of run 1 builds on revision b, which was set aside.');
    expect(plan.setAside[0].record).toEqual(file[0]); // the file's version, kept
    expect(plan.newRevisions.map((r) => r.id)).toEqual(['x']);
    expect(plan.runs.map((r) => r.id)).toEqual(['run2']);
  });
  it('a revision restored from a set-aside one is set aside too', () => {
    const have = [rev('a', 'run1', 1)];
    const file = [rev('a', 'run1', 1, [], 99), rev('b', 'run1', 2, [], 70, { restoredFrom: 'a' })];
    expect(planMerge(baseOf([study('s1')], have), { studies: [study('s1')], revisions: file }).setAside.map((s) => s.id)).toEqual(['a', 'b']);
  });
  it('a clashing study is set aside with its field, and its new revisions with it', () => {
    const plan = planMerge(baseOf([study('s1')], []), { studies: [study('s1', 'Other title')], revisions: [rev('a', 'run1', 1)] });
    expect(plan.setAside.map((s) => [s.kind, s.id, s.field])).toEqual([
      ['study', 's1', 'title'],
      ['revision', 'a', null],
    ]);
    expect(plan.newStudies).toEqual([]);
    expect(plan.newRevisions).toEqual([]);
  });
  it('a logged run that is another planned run on the device is set aside, naming both, instead of refusing the file', () => {
    const have = [rev('a', 'run1', 1)];
    const plan = planMerge(baseOf([study('s1')], have), { studies: [study('s1')], revisions: [rev('z', 'run1', 2, [], 70, { plannedRun: 3 }), rev('y', 'run9', 1)] });
    expect(plan.setAside.map((s) => [s.id, s.field])).toEqual([['z', 'runId']]);
    expect(plan.setAside[0].reason).toMatch(/run 1 of study s1 on this device but run 3 of study s1 in the file/);
    expect(plan.newRevisions.map((r) => r.id)).toEqual(['y']);
  });
  it('merging the same file twice sets aside the same records and adds nothing the second time', () => {
    const have = [rev('a', 'run1', 1)];
    const file = { studies: [study('s1')], revisions: [rev('a', 'run1', 1, [], 99), rev('n', 'run2', 1)] };
    const first = planMerge(baseOf([study('s1')], have), file);
    const after = [...have, ...first.newRevisions];
    const second = planMerge(baseOf([study('s1')], after), file);
    expect(second.newRevisions).toEqual([]);
    expect(second.setAside.map((s) => s.id)).toEqual(first.setAside.map((s) => s.id));
  });
  it('the plan does not depend on the order of the file\'s records', () => {
    const have = [rev('a', 'run1', 1), rev('b', 'run1', 2, ['a'])];
    const file = [rev('a', 'run1', 1, [], 98), rev('b', 'run1', 2, ['a']), rev('c', 'run1', 3, ['b']), rev('d', 'run2', 1), rev('e', 'run2', 2, ['d'], 71), rev('f', 'run1', 2, ['a'], 75, { device: 'e' })];
    const key = (p: ReturnType<typeof planMerge>) => JSON.stringify([p.newRevisions.map((r) => r.id).sort(), p.setAside.map((s) => s.id).sort(), p.runs, p.conflicts]);
    const expected = key(planMerge(baseOf([study('s1')], have), { studies: [study('s1')], revisions: file }));
    fc.assert(
      fc.property(fc.shuffledSubarray(file, { minLength: file.length }), (shuffled) => {
        expect(key(planMerge(baseOf([study('s1')], have), { studies: [study('s1')], revisions: shuffled }))).toBe(expected);
      }),
      { numRuns: 100 },
    );
  });
  it('an empty file plans nothing (degenerate input)', () => {
    const plan = planMerge(baseOf([], []), { studies: [], revisions: [] });
    expect([plan.newStudies, plan.newRevisions, plan.runs, plan.setAside, plan.conflicts]).toEqual([[], [], [], [], []]);
  });
});
