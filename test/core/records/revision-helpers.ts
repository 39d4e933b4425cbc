/** An INVENTED study record and revisions of it for the record-check tests (not real data). */
import type { RunRevision, StudyRecord } from '../../../src/core/study/study.ts';
import { coatingPlan } from '../../store/helpers.ts';

export const study: StudyRecord = { ...coatingPlan(), id: 's-1', device: 'd-1', createdAt: '2024-05-02T16:00:00.000Z' };
export const studies = new Map([[study.id, study]]);

/** A revision of planned run 1 (the 2^3 corner at all-low settings: 160 °C, 2 m/min, 30 g/min). */
export function revision(over: Partial<RunRevision> = {}): RunRevision {
  return {
    id: 'r-1',
    runId: 'run-1',
    studyId: 's-1',
    plannedRun: 1,
    rev: 1,
    device: 'd-1',
    parents: [],
    restoredFrom: null,
    savedAt: '2024-05-02T16:05:00.000Z',
    actual: [160, 2, 30],
    readings: [[68.1, 68.4], [80.2]],
    loggedAt: '2024-05-02T07:25:00.000Z',
    operator: 'Shift A (invented)',
    notes: 'first panel',
    excluded: false,
    reason: '',
    ...over,
  };
}
