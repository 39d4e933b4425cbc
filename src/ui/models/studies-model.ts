/** The studies on this device with how many of their planned runs are logged. */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import type { StudyRecord } from '../../core/study/study.ts';
import { addedPlannedRuns, listStudies, loggedPlannedRuns } from '../../store/study-list.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { isDemo } from '../demo/is-demo.ts';

export interface StudySummary {
  readonly study: StudyRecord;
  /** Planned runs: the study's own plan and every block added to it (the run sheet's count). */
  readonly planned: number;
  /** Planned runs with at least one logged run. */
  readonly logged: number;
  readonly demo: boolean;
}

export const StudiesModel = createModel((store: Store) => {
  const studies = signal<StudyRecord[] | null>(null);
  const loggedCounts = signal<Record<string, number>>({});
  const addedCounts = signal<Record<string, number>>({});
  const problem = signal<Problem | null>(null);
  return {
    problem: problem as ReadonlySignal<Problem | null>,
    loading: computed(() => studies.value === null && problem.value === null),
    summaries: computed<StudySummary[]>(() =>
      (studies.value ?? []).map((study) => ({
        study,
        planned: study.design.runs.length + (addedCounts.value[study.id] ?? 0),
        logged: loggedCounts.value[study.id] ?? 0,
        demo: isDemo(study),
      })),
    ),
    async load() {
      try {
        // Both reads at once: the list is the first screen, and its first card its largest paint.
        const [all, logged, added] = await Promise.all([listStudies(store), loggedPlannedRuns(store), addedPlannedRuns(store)]);
        loggedCounts.value = Object.fromEntries(logged);
        addedCounts.value = Object.fromEntries(added);
        studies.value = all;
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
  };
});
