/**
 * Adding the axial block to a logged two-level study, on the phone: the axial distance and the
 * center-run count chosen, a preview of the block (core augmentStudy: what the augmented design
 * can estimate, the axial settings in real units, a warning for each that lies past the
 * factorial range) before the tap, then the block saved as an added block of the same study
 * (purpose 'axial', the store's addPlannedRuns), so the logged runs are reused as they are.
 * The run order's seed is drawn once when the model is made, so the runs saved are the runs
 * previewed.
 */
import { computed, createModel, signal } from '@preact/signals';
import { augmentStudy, type Augmentation } from '../../core/design/augment-study.ts';
import type { AxialDistance } from '../../core/design/axial-distance.ts';
import { drawSeed } from '../../core/design/random.ts';
import { readNumber } from '../../core/factor/read-setting.ts';
import { addPlannedRuns } from '../../store/added-blocks.ts';
import type { Store } from '../../store/store.ts';
import { problemOf } from '../lib/problem.ts';
import type { Outcome } from './next-runs-model.ts';
import type { StudyAnalysis } from './study-analysis-model.ts';

/** The axial distances offered on the phone (a typed number stays on the command line). */
export type AxialChoice = Exclude<AxialDistance, number>;

export const AxialBlockModel = createModel((store: Store, shared: StudyAnalysis) => {
  const distance = signal<AxialChoice>('orthogonal');
  const centerText = signal<string | null>(null);
  const saving = signal(false);
  const saved = signal<string | null>(null);
  const saveProblem = signal<string | null>(null);
  let seed: number | null = null;
  let seedProblem: string | null = null;
  try {
    seed = drawSeed();
  } catch (err) {
    seedProblem = problemOf(err).message;
  }

  const plan = computed(() => shared.data.value?.study ?? null);
  /** The axial runs already in the plan (the study was augmented before), in run order. */
  const existing = computed(() => plan.value?.design.runs.filter((r) => r.kind === 'axial') ?? []);
  /** Center runs the study's plan has so far: the default count for the new block (at least 1). */
  const centersSoFar = computed(() => Math.max(1, plan.value?.design.runs.filter((r) => r.kind === 'center').length ?? 0));
  const centers = computed(() => centerText.value ?? String(centersSoFar.value));

  const preview = computed<Outcome<Augmentation> | null>(() => {
    const d = shared.data.value;
    if (!d || existing.value.length > 0) return null;
    if (seedProblem !== null) return { ok: false, message: seedProblem };
    try {
      const n = readNumber(centers.value, 'The number of center runs');
      return { ok: true, value: augmentStudy(d.study, d.runs, { axialDistance: distance.value, centerRuns: n, seed: seed ?? 0 }) };
    } catch (err) {
      return { ok: false, message: problemOf(err).message };
    }
  });

  return {
    distance: computed(() => distance.value),
    centers,
    existing,
    preview,
    saving: computed(() => saving.value),
    saved: computed(() => saved.value),
    saveProblem: computed(() => saveProblem.value),
    chooseDistance(d: AxialChoice) {
      distance.value = d;
      saved.value = null;
    },
    setCenters(t: string) {
      centerText.value = t;
      saved.value = null;
    },
    /** Saves the previewed block (nothing when the preview is a problem, or while saving). */
    async add(studyId: string) {
      const p = preview.peek();
      if (!p || !p.ok || saving.peek()) return;
      saving.value = true;
      saveProblem.value = null;
      try {
        const block = await addPlannedRuns(store, studyId, 'axial', p.value.added.map((r) => ({ kind: r.kind, coded: r.coded })), p.value.about);
        const first = block.runs[0].run;
        const last = block.runs[block.runs.length - 1].run;
        saved.value = `Added runs ${first} to ${last} to the run sheet as block ${block.runs[0].block}. Log them there like any other run.`;
        await shared.load();
      } catch (err) {
        saveProblem.value = problemOf(err).message;
      } finally {
        saving.value = false;
      }
    },
  };
});
