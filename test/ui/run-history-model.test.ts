import { describe, expect, it } from 'vitest';
import type { RunRevision } from '../../src/core/study/study.ts';
import { describeChanges, historyEntries } from '../../src/ui/models/run-history-model.ts';

const study = {
  factors: [{ kind: 'numeric', name: 'Oven temperature', unit: '°C', low: 160, high: 200, scale: 'linear' }],
  responses: [{ name: 'Gloss', unit: 'GU', goal: 'maximize' }],
} as unknown as Parameters<typeof describeChanges>[0];

function rev(id: string, r: number, parents: string[], over: Partial<RunRevision> = {}): RunRevision {
  return {
    id, runId: 'run', studyId: 's', plannedRun: 3, rev: r, device: 'dev-a', parents, restoredFrom: null,
    // Clocks disagree: the later revision carries the earlier time, and order must not follow it.
    savedAt: new Date(Date.UTC(2024, 0, 10 - r)).toISOString(),
    actual: [160], readings: [[88.6]], loggedAt: null, operator: null, notes: '', excluded: false, reason: '',
    ...over,
  };
}

describe('run history entries', () => {
  it('describes changes in plain words', () => {
    const a = rev('a', 1, []);
    const b = rev('b', 2, ['a'], { readings: [[88.9]], excluded: true, reason: 'seal leak' });
    expect(describeChanges(study, a, b)).toEqual(['Gloss 88.6 -> 88.9', 'excluded: seal leak']);
    expect(describeChanges(study, b, a)).toEqual(['Gloss 88.9 -> 88.6', 'used in the analysis again']);
  });

  it('lists newest first by revision counter, marks current, restores and revisions made from the same one', () => {
    const a = rev('a', 1, []);
    const b = rev('b', 2, ['a'], { notes: 'tab one', device: 'dev-a' });
    const c = rev('c', 2, ['a'], { notes: 'tab two', device: 'dev-b' });
    const d = rev('d', 3, ['b', 'c'], { restoredFrom: 'a' });
    const entries = historyEntries(study, [d, a, c, b]);
    expect(entries.map((e) => e.revision.id)).toEqual(['d', 'c', 'b', 'a']);
    expect(entries.map((e) => e.isCurrent)).toEqual([true, false, false, false]);
    expect(entries[0].restoredFromNumber).toBe(1);
    expect(entries.map((e) => e.sharesParent)).toEqual([false, true, true, false]);
    expect(entries[1].forkOnThisDevice).toBe(false); // dev-a and dev-b: two devices
    expect(entries[1].changes).toEqual(['notes: "tab two"']);
    expect(entries[3].first).toBe(true);
    // The restore is described from the latest revision it was made from.
    expect(entries[0].changes).toEqual(['notes removed']);
  });

  it('edits from the same version saved by one device (two tabs) are in two places, not on two devices', () => {
    const a = rev('a', 1, []);
    const b = rev('b', 2, ['a'], { notes: 'tab one' });
    const c = rev('c', 2, ['a'], { notes: 'tab two' });
    const entries = historyEntries(study, [a, b, c]);
    expect(entries.map((e) => e.sharesParent)).toEqual([true, true, false]);
    expect(entries.slice(0, 2).map((e) => e.forkOnThisDevice)).toEqual([true, true]);
  });
});
