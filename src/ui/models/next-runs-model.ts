/**
 * What follows an analysis, for one study: a path of steepest ascent or descent from the shown
 * response's model, a solve for a target, planning those settings as runs of the study (a new
 * block through the store's addPlannedRuns, never changing the planned runs already there), and
 * the judgement of logged confirmation runs against the model fitted without them.
 * The analysis is the study's shared one (study-analysis-model.ts), so the model chosen on the
 * Effects screen is the one used here; path and confirmation runs stay out of it.
 */
import { computed, createModel, signal } from '@preact/signals';
import { toReal } from '../../core/factor/coding.ts';
import type { Factor } from '../../core/factor/factor.ts';
import { readNumber } from '../../core/factor/read-setting.ts';
import { shownCoded } from '../../core/factor/shown-setting.ts';
import { confirmationRowsOf, confirmationSets, judgeConfirmationSets } from '../../core/predict/confirmation-sets.ts';
import { parseSettings } from '../../core/predict/parse-settings.ts';
import { predict } from '../../core/predict/predict.ts';
import { solveForTarget, type Solution } from '../../core/predict/solve-for-target.ts';
import { pathSenseForGoal, steepestPath, type PathSense, type SteepestPath } from '../../core/predict/steepest-path.ts';
import { isSquare } from '../../core/model/term.ts';
import type { AddedBlock } from '../../core/study/added-block.ts';
import { meanReading } from '../../core/study/study.ts';
import { confirmationProgress, confirmationScale, confirmationSetPlace, confirmationToken, confirmationVerdict } from '../../core/text/confirmation-text.ts';
import { addPlannedRuns, listBlocks } from '../../store/added-blocks.ts';
import type { Store } from '../../store/store.ts';
import { setting } from '../lib/format.ts';
import { problemOf } from '../lib/problem.ts';
import type { StudyAnalysis } from './study-analysis-model.ts';

export type Outcome<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly message: string };

/**
 * One set of confirmation runs as its card shows it, all from the core's judgement
 * (core/predict/confirmation-sets.ts, the one the command line's report uses) and its words
 * (core/text/confirmation-text.ts): `${place}: ${verdict}` is the report's line for the set.
 */
export interface ConfirmationCard {
  readonly key: string;
  /** Where the runs were made: run numbers, block and setting. */
  readonly place: string;
  /** The note of the block the runs were added in, when found. */
  readonly note: string | null;
  readonly verdict: string;
  /** The verdict's token: confirmed, not-confirmed, no-noise, not-logged or cannot-judge. */
  readonly outcome: string;
  /** How many runs have a value yet, while some are missing. */
  readonly progress: string | null;
}

/** A path block's runs: predicted by the model, observed when logged. */
export interface PathPoint {
  readonly run: number;
  readonly step: number;
  readonly predicted: number;
  readonly observed: number | null;
}

/** Where confirmation runs are planned: the solved setting, or a step of the path. */
export type ConfirmAt = { readonly from: 'solve' } | { readonly from: 'path'; readonly step: number };

function numericIndexes(factors: readonly Factor[]): number[] {
  return factors.flatMap((f, i) => (f.kind === 'numeric' ? [i] : []));
}

function attempt<T>(f: () => T): Outcome<T> {
  try {
    return { ok: true, value: f() };
  } catch (err) {
    return { ok: false, message: problemOf(err).message };
  }
}

export const NextRunsModel = createModel((store: Store, shared: StudyAnalysis) => {
  const blocks = signal<readonly AddedBlock[]>([]);
  const saving = signal(false);
  const saved = signal<string | null>(null);
  const saveProblem = signal<string | null>(null);
  /** The path last turned into runs (its coded steps), so a second tap adds nothing. */
  const addedPath = signal<string | null>(null);

  const factors = computed<readonly Factor[]>(() => shared.data.value?.study.factors ?? []);
  const model = computed(() => {
    const r = shared.shown.value?.result.value;
    return r && r.ok ? r.analysis.model : null;
  });
  const modelProblem = computed(() => {
    const r = shared.shown.value?.result.value;
    return r && !r.ok ? r.message : null;
  });

  // Path inputs: base factor (index into the factors), real step, number of steps, sense.
  const pathBase = signal<number | null>(null);
  const pathStepText = signal('');
  const pathStepsText = signal('5');
  const pathSenseChoice = signal<PathSense | null>(null);

  const pathSense = computed<PathSense>(() => {
    if (pathSenseChoice.value) return pathSenseChoice.value;
    const r = shared.shown.value?.response;
    try {
      return r ? pathSenseForGoal(r) : 'ascent';
    } catch {
      return 'ascent';
    }
  });
  const baseIndex = computed(() => {
    const numeric = numericIndexes(factors.value);
    const chosen = pathBase.value;
    return chosen !== null && numeric.includes(chosen) ? chosen : (numeric[0] ?? null);
  });

  const path = computed<Outcome<SteepestPath> | null>(() => {
    const m = model.value;
    const b = baseIndex.value;
    if (!m || b === null) return null;
    return attempt(() => {
      const f = m.factors[b];
      const step = readNumber(pathStepText.value.replace(',', '.'), `The step of ${f.name}`);
      const steps = readNumber(pathStepsText.value, 'The number of steps');
      return steepestPath(m, { base: f.name, step, steps, sense: pathSense.value });
    });
  });

  // Solve inputs: the factor to move and the target; the others held at their centers.
  const solveFactor = signal<number | null>(null);
  const targetText = signal('');
  const solveIndex = computed(() => {
    const numeric = numericIndexes(factors.value);
    const chosen = solveFactor.value;
    return chosen !== null && numeric.includes(chosen) ? chosen : (numeric[0] ?? null);
  });
  const solution = computed<Outcome<Solution> | null>(() => {
    const m = model.value;
    const i = solveIndex.value;
    if (!m || i === null || targetText.value.trim() === '') return null;
    return attempt(() => {
      const target = readNumber(targetText.value.replace(',', '.'), 'The target');
      const at = m.factors.flatMap((f, j) => (f.kind === 'categorical' ? [[f.name, f.levels[0]] as [string, string]] : []));
      const unit = shared.shown.value?.response.unit;
      return solveForTarget(m, { factor: m.factors[i].name, target, at, ...(unit ? { responseUnit: unit } : {}) });
    });
  });

  // Confirmation planning.
  const confirmCountText = signal('3');

  /** The coded setting of a confirmation source, or a message. */
  function codedAt(at: ConfirmAt): Outcome<readonly number[]> {
    if (at.from === 'path') {
      const p = path.value;
      if (!p || !p.ok) return { ok: false, message: 'Set up the path first.' };
      const s = p.value.steps.find((x) => x.step === at.step);
      if (!s) return { ok: false, message: `The path has no step ${at.step}.` };
      return { ok: true, value: s.coded };
    }
    const s = solution.value;
    const m = model.value;
    if (!s || !s.ok || !m) return { ok: false, message: 'Solve for a target first.' };
    const i = solveIndex.value!;
    return attempt(() => {
      const input = m.factors.map((f, j) => [f.name, j === i ? s.value.setting : f.kind === 'categorical' ? f.levels[0] : (toReal(f, 0) as number)] as [string, number | string]);
      return parseSettings(m.factors, input).map((x) => x.coded);
    });
  }

  // The comparison the core gives (and the command line reports): the mean of each set's runs
  // against the 95% interval for the mean of that many new runs from the shown model, which is
  // fitted without them, on its transformed scale when it has a transform.
  const confirmations = computed<readonly ConfirmationCard[]>(() => {
    const d = shared.data.value;
    const m = model.value;
    const shown = shared.shown.value;
    if (!d || !shown) return [];
    const sets = confirmationSets(confirmationRowsOf(d.study, d.runs, shown.index));
    // Without a model (too few runs logged) a set with values cannot be judged: the model's own message says why.
    const judged = m ? judgeConfirmationSets(m, sets) : sets.map((set) => ({ set, comparison: null, problem: set.values.length > 0 ? modelProblem.value : null }));
    return judged.map((j) => ({
      key: `${j.set.block}|${j.set.runs[0]}`,
      place: confirmationSetPlace(j, d.study.factors),
      note: blocks.value.find((b) => b.purpose === 'confirmation' && b.runs.some((r) => r.run === j.set.runs[0]))?.note ?? null,
      verdict: confirmationVerdict(j),
      outcome: confirmationToken(j),
      progress: confirmationProgress(j),
    }));
  });

  const pathPoints = computed<readonly (readonly PathPoint[])[]>(() => {
    const d = shared.data.value;
    const m = model.value;
    const shown = shared.shown.value;
    if (!d || !m || !shown) return [];
    return blocks.value
      .filter((b) => b.purpose === 'path')
      .map((b) =>
        b.runs.map((r, k) => {
          const logged = d.runs.find((x) => x.plannedRun === r.run && !x.excluded);
          const real = m.factors.map((f, j) => [f.name, toReal(f, r.coded[j])] as [string, number | string]);
          return { run: r.run, step: k + 1, predicted: predict(m, real).fit, observed: logged ? meanReading(logged.readings[shown.index] ?? []) : null };
        }),
      );
  });

  async function refreshBlocks(studyId: string) {
    try {
      blocks.value = await listBlocks(store, studyId);
    } catch (err) {
      saveProblem.value = problemOf(err).message;
    }
  }

  async function add(studyId: string, purpose: AddedBlock['purpose'], runs: { kind: 'path' | 'confirmation'; coded: readonly number[] }[], note: string) {
    if (saving.peek()) return;
    saving.value = true;
    saveProblem.value = null;
    saved.value = null;
    try {
      // Planned at the settings the screen shows (4 significant digits), which the run form then starts from.
      const fs = factors.peek();
      const block = await addPlannedRuns(store, studyId, purpose, runs.map((r) => ({ ...r, coded: shownCoded(fs, r.coded) })), note);
      const first = block.runs[0].run;
      const last = block.runs[block.runs.length - 1].run;
      saved.value = `Added ${block.runs.length === 1 ? `run ${first}` : `runs ${first} to ${last}`} to the run sheet as block ${block.runs[0].block}. Log them there like any other run.`;
      await Promise.all([refreshBlocks(studyId), shared.load()]);
    } catch (err) {
      saveProblem.value = problemOf(err).message;
    } finally {
      saving.value = false;
    }
  }

  return {
    factors,
    model,
    modelProblem,
    blocks: computed(() => blocks.value),
    saving: computed(() => saving.value),
    saved: computed(() => saved.value),
    saveProblem: computed(() => saveProblem.value),
    pathBase: baseIndex,
    pathStepText: computed(() => pathStepText.value),
    pathStepsText: computed(() => pathStepsText.value),
    pathSense,
    path,
    /** The shown model has squares: its best setting is on the quick card, and the first-order path is not offered. */
    pathNeedsFirstOrder: computed(() => model.value?.terms.some(isSquare) ?? false),
    /** True when the path on screen was already turned into planned runs. */
    pathAdded: computed(() => {
      const p = path.value;
      return !!p && p.ok && addedPath.value === JSON.stringify(p.value.steps.filter((s) => s.step > 0).map((s) => s.coded));
    }),
    pathPoints,
    solveIndex,
    targetText: computed(() => targetText.value),
    solution,
    confirmCountText: computed(() => confirmCountText.value),
    confirmations,
    /** Which scale the cards' figures are on, when the shown model is of a transformed response (as the report says it). */
    confirmationScale: computed(() => {
      const m = model.value;
      return m ? confirmationScale(m.transform, m.response) : null;
    }),

    setPathBase: (i: number) => void (pathBase.value = i),
    setPathStep: (t: string) => void (pathStepText.value = t),
    setPathSteps: (t: string) => void (pathStepsText.value = t),
    setPathSense: (s: PathSense) => void (pathSenseChoice.value = s),
    setSolveFactor: (i: number) => void (solveFactor.value = i),
    setTarget: (t: string) => void (targetText.value = t),
    setConfirmCount: (t: string) => void (confirmCountText.value = t),
    refreshBlocks,

    /** Plans the path's steps (1 to the last) as path runs of the study. */
    addPath(studyId: string) {
      const p = path.peek();
      if (!p || !p.ok) return;
      const steps = p.value.steps.filter((s) => s.step > 0);
      const key = JSON.stringify(steps.map((s) => s.coded));
      if (addedPath.peek() === key) return;
      addedPath.value = key;
      const f = p.value.base;
      const note = `Path of steepest ${p.value.sense} for ${p.value.response}: ${f.name} in steps of ${setting(f.step)}, ${steps.length} steps.`;
      void add(studyId, 'path', steps.map((s) => ({ kind: 'path', coded: s.coded })), note);
    },
    /** Plans m confirmation runs at the chosen setting. */
    addConfirmation(studyId: string, at: ConfirmAt) {
      saveProblem.value = null;
      const where = codedAt(at);
      if (!where.ok) {
        saveProblem.value = where.message;
        return;
      }
      let m: number;
      try {
        m = readNumber(confirmCountText.peek(), 'The number of confirmation runs');
      } catch (err) {
        saveProblem.value = problemOf(err).message;
        return;
      }
      if (!Number.isInteger(m) || m < 1 || m > 20) {
        saveProblem.value = `The number of confirmation runs needs a whole number from 1 to 20, got ${confirmCountText.peek().trim()}.`;
        return;
      }
      const response = shared.shown.peek()?.response.name ?? '';
      const note = `${m} confirmation run${m === 1 ? '' : 's'} for ${response} at the ${at.from === 'path' ? `setting of path step ${at.step}` : 'solved setting'}.`;
      void add(studyId, 'confirmation', Array.from({ length: m }, () => ({ kind: 'confirmation' as const, coded: where.value })), note);
    },
  };
});
