import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { divergedRuns } from '../../../src/core/study/diverged-runs.ts';
import { currentRun, type RunRevision } from '../../../src/core/study/study.ts';
import { divergedNote, revisionValuesText } from '../../../src/core/text/diverged-text.ts';

// An invented study and run (not real data).
const study = {
  factors: defineFactors([{ kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' }]),
  responses: [{ name: 'Gloss', unit: 'GU', goal: 'maximize' as const }],
};
function rev(id: string, r: number, parents: string[], device: string, temp: number, gloss: number[]): RunRevision {
  return {
    id, runId: 'run-1', studyId: 'study', plannedRun: 3, rev: r, device, parents, restoredFrom: null, savedAt: '2024-05-02T12:00:00.000Z',
    actual: [temp], readings: [gloss], loggedAt: null, operator: null, notes: '', excluded: false, reason: '',
  };
}

describe('divergedNote', () => {
  const a = rev('a', 1, [], 'dev-1', 160, [88.6]);
  const b = rev('b', 2, ['a'], 'dev-1', 160, [88.8, 89]);
  const c = rev('c', 2, ['a'], 'dev-2', 161, [87.1]);
  const [d] = divergedRuns([currentRun([a, b, c])], (id) => new Map([a, b, c].map((r) => [r.id, r])).get(id));

  it('names the run, where it changed, both values and the one used', () => {
    const note = divergedNote(study, d);
    expect(note).toMatch(/^Run 3 has 2 current revisions \(changed on two devices from the same revision\)/);
    // The mean of 88.8 and 89 is 88.9 (by hand); the setting differs, so it is named too.
    expect(note).toContain('the one used holds Oven temperature 161 °C, Gloss 87.1 GU');
    expect(note).toContain('the other holds Oven temperature 160 °C, Gloss 88.9 GU');
    expect(note).toContain('Both are kept');
  });

  it('names only the settings that differ, and says when a value is missing', () => {
    const empty = rev('e', 2, ['a'], 'dev-1', 160, []);
    expect(revisionValuesText(study, empty, [empty, b])).toBe('Gloss not measured');
  });
});
