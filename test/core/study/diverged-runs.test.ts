import { describe, expect, it } from 'vitest';
import { divergedRuns } from '../../../src/core/study/diverged-runs.ts';
import { currentRun, type RunRevision } from '../../../src/core/study/study.ts';

// Invented revisions of one run (not real data): a first save, then two edits from it.
function rev(id: string, r: number, parents: string[], device: string, gloss: number): RunRevision {
  return {
    id, runId: 'run-1', studyId: 'study', plannedRun: 3, rev: r, device, parents, restoredFrom: null, savedAt: '2024-05-02T12:00:00.000Z',
    actual: [160], readings: [[gloss]], loggedAt: null, operator: null, notes: '', excluded: false, reason: '',
  };
}

describe('divergedRuns', () => {
  const a = rev('a', 1, [], 'dev-1', 88.6);
  const b = rev('b', 2, ['a'], 'dev-1', 88.9);
  const c = rev('c', 2, ['a'], 'dev-2', 87.1);
  const byId = new Map([a, b, c].map((r) => [r.id, r]));

  it('lists a run with two current revisions: the one the revision order makes current, and the other', () => {
    const run = currentRun([a, b, c]);
    const [d] = divergedRuns([run], (id) => byId.get(id));
    // compareRevisions: same counter, so the device id decides ("dev-2" > "dev-1").
    expect(d.current.id).toBe('c');
    expect(d.current.id).toBe(run.revisionId);
    expect(d.others.map((r) => r.id)).toEqual(['b']);
    expect(d.oneDevice).toBe(false);
    expect(d.plannedRun).toBe(3);
  });

  it('two tabs of one device are one device', () => {
    const c1 = { ...c, device: 'dev-1' };
    const [d] = divergedRuns([currentRun([a, b, c1])], (id) => new Map([a, b, c1].map((r) => [r.id, r])).get(id));
    expect(d.oneDevice).toBe(true);
  });

  it('degenerate input: no runs, a run with one head, and a head that cannot be found list nothing', () => {
    expect(divergedRuns([], () => undefined)).toEqual([]);
    expect(divergedRuns([currentRun([a, b])], (id) => byId.get(id))).toEqual([]);
    expect(divergedRuns([currentRun([a, b, c])], (id) => (id === 'c' ? undefined : byId.get(id)))).toEqual([]);
  });
});
