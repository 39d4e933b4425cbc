/**
 * The analysis of one open study, shared by every screen that shows it (the effects and their
 * charts, the quick card): the study and the current state of its logged runs, read once and
 * re-read when a screen opens; per response, what the person chose for its analysis and the
 * analysis that follows (the same path as the command line's analysis of a backup:
 * responseDataFromRuns, then analyze); and, as view state, which response is on display.
 *
 * One model per study for the whole session (openStudyAnalysis), so a model chosen on the
 * Effects screen is the one the quick card predicts from, and stays chosen while the person
 * moves between the study's screens. Per response the person also chooses a transform (log,
 * square root, inverse), which the quick card and charts then use too; `responses` gives every
 * response's analysis at once.
 */
import { computed, createModel, signal, type ReadonlySignal, type Signal } from '@preact/signals';
import type { Analysis } from '../../core/fit/analysis.ts';
import { analyze } from '../../core/fit/analyze.ts';
import { parseTransform } from '../../core/fit/response-transform.ts';
import { quadraticTerms, termsUpToOrder } from '../../core/model/formula.ts';
import { supportsQuadratic } from '../../core/design/supports-quadratic.ts';
import type { ResponseData } from '../../core/study/response-data.ts';
import type { Response } from '../../core/study/response.ts';
import { responseDataFromRuns } from '../../core/study/run-data.ts';
import { divergedNote } from '../../core/text/diverged-text.ts';
import { screenNotes, type ScreenNote } from '../../core/text/screen-notes-text.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { loadStudyData, type StudyData } from './study-data.ts';

/** Which terms the model holds: main effects only, main effects and two-factor interactions, or those and the squares (quadratic). */
export type ModelChoice = 'main' | 'two-way' | 'quadratic';

export const MODEL_CHOICES: readonly { readonly value: ModelChoice; readonly label: string }[] = [
  { value: 'two-way', label: 'With interactions' },
  { value: 'main', label: 'Main effects only' },
];

/** The quadratic model, offered only for a study whose planned runs can estimate it (see modelChoicesFor). */
export const QUADRATIC_CHOICE = { value: 'quadratic' as const, label: 'Quadratic (with curvature)' };

/** The model choices for a study: the quadratic one too when its planned runs support it (core/design/supports-quadratic.ts). */
export function modelChoicesFor(study: { readonly factors: StudyData['study']['factors']; readonly design: { readonly runs: readonly { readonly coded: readonly number[] }[] } }) {
  return supportsQuadratic(study.factors, study.design.runs.map((r) => r.coded)) ? [...MODEL_CHOICES, QUADRATIC_CHOICE] : MODEL_CHOICES;
}

/** The transform of a response (core/fit/response-transform.ts tokens). */
export type TransformChoice = 'none' | 'log' | 'sqrt' | 'inverse';

export const TRANSFORM_CHOICES: readonly { readonly value: TransformChoice; readonly label: string }[] = [
  { value: 'none', label: 'As measured' },
  { value: 'log', label: 'Log' },
  { value: 'sqrt', label: 'Square root' },
  { value: 'inverse', label: 'Inverse' },
];

/** What the person chose for one response's analysis. */
export interface ResponseSettings {
  readonly model: ModelChoice;
  readonly transform: TransformChoice;
}

/** A response's settings before anything is chosen. */
export const DEFAULT_SETTINGS: ResponseSettings = { model: 'two-way', transform: 'none' };

/** The settings before anything is chosen for a study: main effects for a Plackett-Burman screen (its interactions are only partly aliased). */
export function defaultSettings(study: { readonly design: { readonly screening?: unknown } }): ResponseSettings {
  return study.design.screening ? { model: 'main', transform: 'none' } : DEFAULT_SETTINGS;
}

export type AnalysisResult =
  | {
      readonly ok: true;
      readonly analysis: Analysis;
      readonly data: ResponseData;
      /** The notes in the screen's own words (core/text/screen-notes-text.ts), not the command line's `warnings`. */
      readonly notes: readonly ScreenNote[];
    }
  | { readonly ok: false; readonly message: string };

/** The analysis of one response with the chosen settings, or the reason there is none. */
export function analyzeResponse(d: StudyData, responseIndex: number, settings: ResponseSettings): AnalysisResult {
  const response = d.study.responses[responseIndex];
  if (!response) return { ok: false, message: 'This study has no response to analyze.' };
  try {
    const read = responseDataFromRuns(d.study, d.runs, response.name);
    // Runs with two current revisions are named, with both values, beside the other messages.
    const data = d.diverged.length === 0 ? read : { ...read, messages: [...read.messages, ...d.diverged.map((x) => divergedNote(d.study, x))] };
    const k = d.study.factors.length;
    const terms = settings.model === 'quadratic' ? quadraticTerms(d.study.factors) : termsUpToOrder(k, settings.model === 'main' ? 1 : Math.min(2, k));
    const analysis = analyze(data, { terms, transform: parseTransform(settings.transform) });
    return { ok: true, analysis, data, notes: screenNotes(data.messages, analysis.verdicts, { quadraticOffered: modelChoicesFor(d.study).includes(QUADRATIC_CHOICE) }) };
  } catch (err) {
    return { ok: false, message: problemOf(err).message };
  }
}

/** One response of the study with its settings and its analysis. */
export interface ResponseAnalysis {
  readonly index: number;
  readonly response: Response;
  readonly settings: ReadonlySignal<ResponseSettings>;
  /** Worked out when first read, and again only when the runs or the settings change. */
  readonly result: ReadonlySignal<AnalysisResult>;
}

/** Identifies what an analysis was worked out from: the study, its planned runs (runs may be added later) and each run's current revision. */
function fingerprint(d: StudyData): string {
  return [d.study.id, `planned ${d.study.design.runs.length}`, ...d.runs.map((r) => `${r.id}@${r.revisionId}`).sort()].join('|');
}

export const StudyAnalysisModel = createModel((store: Store, studyId: string) => {
  const data = signal<StudyData | null>(null);
  const problem = signal<Problem | null>(null);
  /** Settings by response name, so they survive a re-read of the runs. */
  const settings = new Map<string, Signal<ResponseSettings>>();
  const shownIndex = signal(0);
  let reading: Promise<void> | null = null;

  function settingsOf(name: string, first: ResponseSettings = DEFAULT_SETTINGS): Signal<ResponseSettings> {
    let s = settings.get(name);
    if (!s) {
      s = signal(first);
      settings.set(name, s);
    }
    return s;
  }

  const responses = computed<readonly ResponseAnalysis[]>(() => {
    const d = data.value;
    if (!d) return [];
    return d.study.responses.map((response, index) => {
      const s = settingsOf(response.name, defaultSettings(d.study));
      return { index, response, settings: s, result: computed(() => analyzeResponse(d, index, s.value)) };
    });
  });

  return {
    data: data as ReadonlySignal<StudyData | null>,
    problem: problem as ReadonlySignal<Problem | null>,
    /** Every response of the study, in declared order, each with its settings and analysis. */
    responses,
    /** View state: the index of the response on display. */
    shownIndex: shownIndex as ReadonlySignal<number>,
    /** The response on display, or null before the study is read. */
    shown: computed<ResponseAnalysis | null>(() => responses.value[shownIndex.value] ?? responses.value[0] ?? null),

    /**
     * Reads the study and its runs: the first time, and again each time a screen opens (a run
     * may have been logged or restored since). The analysis is worked out again only when a run
     * changed; the settings are kept.
     */
    load(): Promise<void> {
      if (reading) return reading;
      reading = (async () => {
        try {
          const d = await loadStudyData(store, studyId);
          const before = data.peek();
          if (!before || fingerprint(before) !== fingerprint(d)) data.value = d;
          problem.value = null;
        } catch (err) {
          problem.value = problemOf(err);
        } finally {
          reading = null;
        }
      })();
      return reading;
    },
    show(i: number) {
      const d = data.peek();
      if (d && Number.isInteger(i) && i >= 0 && i < d.study.responses.length) shownIndex.value = i;
    },
    /** Sets the model of one response (by index); other responses keep theirs. */
    chooseModel(i: number, model: ModelChoice) {
      const r = data.peek()?.study.responses[i];
      if (!r) return;
      const s = settingsOf(r.name, defaultSettings(data.peek()!.study));
      s.value = { ...s.peek(), model };
    },
    /** Sets the transform of one response (by index); the quick card and the charts follow it. */
    chooseTransform(i: number, transform: TransformChoice) {
      const r = data.peek()?.study.responses[i];
      if (!r) return;
      const s = settingsOf(r.name);
      s.value = { ...s.peek(), transform };
    },
  };
});

export type StudyAnalysis = InstanceType<typeof StudyAnalysisModel>;

const open = new WeakMap<Store, Map<string, StudyAnalysis>>();

/** The one analysis model of a study for this session (made on first use). */
export function openStudyAnalysis(store: Store, studyId: string): StudyAnalysis {
  let byStudy = open.get(store);
  if (!byStudy) {
    byStudy = new Map();
    open.set(store, byStudy);
  }
  let m = byStudy.get(studyId);
  if (!m) {
    m = new StudyAnalysisModel(store, studyId);
    byStudy.set(studyId, m);
  }
  return m;
}
