/**
 * A study's run sheet: its planned runs in run order with their planned settings in real units,
 * whether each is logged (and excluded), whether typing is waiting in a draft, and whether its
 * edits diverged (two current revisions, each shown).
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import type { RunKind } from '../../core/design/design.ts';
import { meanReading, plannedSettings, type LoggedRun, type Setting, type StudyRecord } from '../../core/study/study.ts';
import type { Draft } from '../../store/db.ts';
import { listDrafts } from '../../store/drafts.ts';
import { farOutsideSettings } from '../../core/factor/far-outside.ts';
import { farOutsideText } from '../../core/text/far-outside-text.ts';
import type { DivergedRun } from '../../core/study/diverged-runs.ts';
import { listDivergedRuns, listRuns } from '../../store/runs.ts';
import { getStudy } from '../../store/studies.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';

export interface SheetRow {
  readonly run: number;
  readonly kind: RunKind;
  readonly block: number;
  readonly planned: readonly Setting[];
  /** Logged runs of this planned run (usually none or one). */
  readonly logged: readonly LoggedRun[];
  /** Mean of each response's readings of the first logged run, or null. */
  readonly means: readonly (number | null)[];
  readonly excluded: boolean;
  readonly hasDraft: boolean;
  /** The run's current revisions when its edits diverged (changed in two places), else null. */
  readonly diverged: DivergedRun | null;
  /** The strong warnings for logged actual settings far outside the planned range (empty when none). */
  readonly farOutside: readonly string[];
}

/** True when the run is logged (not excluded) with no reading of any response yet: its settings are kept, the reading can come later. */
export function awaitsReading(row: SheetRow): boolean {
  return row.logged.length > 0 && !row.excluded && row.means.every((m) => m === null);
}

export const RunSheetModel = createModel((store: Store, studyId: string) => {
  const study = signal<StudyRecord | null>(null);
  const runs = signal<LoggedRun[]>([]);
  const drafts = signal<Draft[]>([]);
  const diverged = signal<DivergedRun[]>([]);
  const problem = signal<Problem | null>(null);

  const rows = computed<SheetRow[]>(() => {
    const s = study.value;
    if (!s) return [];
    return [...s.design.runs]
      .sort((a, b) => a.run - b.run)
      .map((p) => {
        const logged = runs.value.filter((r) => r.plannedRun === p.run);
        const first = logged[0];
        return {
          run: p.run,
          kind: p.kind,
          block: p.block,
          planned: plannedSettings(s, p.run),
          logged,
          means: s.responses.map((_, i) => (first ? meanReading(first.readings[i] ?? []) : null)),
          excluded: logged.length > 0 && logged.every((r) => r.excluded),
          hasDraft: drafts.value.some((d) => d.plannedRun === p.run),
          diverged: diverged.value.find((d) => d.plannedRun === p.run) ?? null,
          farOutside: logged.flatMap((r) => farOutsideSettings(s.factors, r.actual).map((far) => farOutsideText(`Run ${p.run}`, s.factors[far.factor], far))),
        };
      });
  });

  return {
    study: study as ReadonlySignal<StudyRecord | null>,
    problem: problem as ReadonlySignal<Problem | null>,
    rows,
    loggedCount: computed(() => rows.value.filter((r) => r.logged.length > 0).length),
    /** The first planned run in run order not logged yet, or null when all are. */
    nextRun: computed(() => rows.value.find((r) => r.logged.length === 0)?.run ?? null),
    async load() {
      try {
        const [s, r, d] = await Promise.all([getStudy(store, studyId), listRuns(store, studyId), listDrafts(store, studyId)]);
        diverged.value = await listDivergedRuns(store, studyId, r);
        runs.value = r;
        drafts.value = d;
        study.value = s;
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
  };
});
