/** A study and the current state of its logged runs, read together for the analysis screens. */
import type { LoggedRun, StudyRecord } from '../../core/study/study.ts';
import { listRuns } from '../../store/runs.ts';
import { getStudy } from '../../store/studies.ts';
import type { Store } from '../../store/store.ts';

export interface StudyData {
  readonly study: StudyRecord;
  readonly runs: readonly LoggedRun[];
}

export async function loadStudyData(store: Store, studyId: string): Promise<StudyData> {
  const [study, runs] = await Promise.all([getStudy(store, studyId), listRuns(store, studyId)]);
  return { study, runs };
}
