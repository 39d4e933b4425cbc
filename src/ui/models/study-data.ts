/** A study, the current state of its logged runs and the runs whose edits diverged, read together for the analysis screens. */
import type { DivergedRun } from '../../core/study/diverged-runs.ts';
import type { LoggedRun, StudyRecord } from '../../core/study/study.ts';
import { listDivergedRuns, listRuns } from '../../store/runs.ts';
import { getStudy } from '../../store/studies.ts';
import type { Store } from '../../store/store.ts';

export interface StudyData {
  readonly study: StudyRecord;
  readonly runs: readonly LoggedRun[];
  /** Runs with two or more current revisions (named in the analysis notes). */
  readonly diverged: readonly DivergedRun[];
}

export async function loadStudyData(store: Store, studyId: string): Promise<StudyData> {
  const [study, runs] = await Promise.all([getStudy(store, studyId), listRuns(store, studyId)]);
  return { study, runs, diverged: await listDivergedRuns(store, studyId, runs) };
}
