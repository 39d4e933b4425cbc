/**
 * The start of every screen that shows a study's shared analysis (Effects, the quick card, Next
 * runs, and the axial-runs card inside it): open the study's one analysis model and read its runs
 * again each time the screen opens (a run may have been logged or restored since), then, while
 * rendering, take the study and the response on display once both are there.
 */
import { useEffect } from 'preact/hooks';
import type { StudyData } from '../models/study-data.ts';
import { openStudyAnalysis, type ResponseAnalysis, type StudyAnalysis } from '../models/study-analysis-model.ts';
import type { Store } from '../../store/store.ts';

/** The study's shared analysis (openStudyAnalysis), read again when the screen opens. */
export function useStudyAnalysis(store: Store, studyId: string): StudyAnalysis {
  const shared = openStudyAnalysis(store, studyId);
  useEffect(() => void shared.load(), []);
  return shared;
}

/** The study read and the response on display. */
export interface ShownStudy {
  readonly data: StudyData;
  readonly study: StudyData['study'];
  readonly shown: ResponseAnalysis;
  readonly response: ResponseAnalysis['response'];
}

/** The study and the response on display, or null while it is being read or its reading failed (StudyPending shows which). */
export function shownStudy(shared: StudyAnalysis): ShownStudy | null {
  const data = shared.data.value;
  const shown = shared.shown.value;
  if (shared.problem.value || !data || !shown) return null;
  return { data, study: data.study, shown, response: shown.response };
}
