/** Path and confirmation runs kept out of the model unless asked for. The study and readings are INVENTED. */
import { describe, expect, it } from 'vitest';
import { addedRuns, withAddedBlocks } from '../../../src/core/study/added-block.ts';
import { responseDataFromRuns } from '../../../src/core/study/run-data.ts';
import type { LoggedRun } from '../../../src/core/study/study.ts';
import { inventedBlock, inventedStudy } from '../../helpers/invented-study.ts';

function logged(plannedRun: number, actual: number[], y: number): LoggedRun {
  return {
    id: `run-${plannedRun}`, revisionId: `rev-${plannedRun}`, revisions: 1, heads: [`rev-${plannedRun}`], studyId: 's-1', plannedRun, rev: 1,
    device: 'dev-1', parents: [], restoredFrom: null, savedAt: '2024-05-03T10:00:00.000Z',
    actual, readings: [[y]], loggedAt: null, operator: null, notes: '', excluded: false, reason: '',
  };
}

describe('responseDataFromRuns and added runs', () => {
  const s = inventedStudy();
  const path = inventedBlock('b-1', addedRuns(s, [{ kind: 'path', coded: [2, 2] }]));
  const plan = withAddedBlocks(s, [path]);
  const conf = inventedBlock('b-2', addedRuns(plan, [{ kind: 'confirmation', coded: [1, 1] }]), 'confirmation');
  const full = withAddedBlocks(s, [path, conf]);
  // Temperature 160..200 (center 180, half-range 20), Time 10..20 (center 15, half-range 5).
  const runs = [logged(1, [160, 10], 50), logged(2, [200, 10], 60), logged(3, [160, 20], 55), logged(4, [200, 20], 66), logged(5, [180, 15], 58), logged(6, [220, 25], 70), logged(7, [200, 20], 65)];

  it('leaves path and confirmation runs out by default, and says so', () => {
    const d = responseDataFromRuns(full, runs, 'Gloss');
    expect(d.labels).toEqual(['1', '2', '3', '4', '5']);
    expect(d.messages).toEqual(['2 path and confirmation runs kept out of the model (they are judged against it)']);
    expect(d.blocks).toBeNull();
  });
  it('takes them in when asked, coded from their actual settings and in their own blocks', () => {
    const d = responseDataFromRuns(full, runs, 'Gloss', { includeJudged: true });
    expect(d.labels).toEqual(['1', '2', '3', '4', '5', '6', '7']);
    expect(d.coded[5]).toEqual([2, 2]); // (220 - 180) / 20, (25 - 15) / 5
    expect(d.blocks).toEqual([1, 1, 1, 1, 1, 2, 3]);
    expect(d.messages).toEqual([]);
  });
  it('with no logged runs: nothing to fit and no note', () => {
    const d = responseDataFromRuns(full, [], 'Gloss');
    expect(d.y).toEqual([]);
    expect(d.messages).toEqual([]);
  });
});
