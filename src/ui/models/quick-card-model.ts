/**
 * The quick card: settings in real units for every factor (numeric ones by slider or typed
 * number, categorical ones by their two levels), and the prediction of the chosen response
 * there from the fitted model, with its intervals, the baseline and each term's contribution,
 * the tested-range check and the standing caution. A number that cannot be read gets a message
 * and leaves the prediction as it was.
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import { parseNumber, toCoded, toReal } from '../../core/factor/coding.ts';
import type { Factor } from '../../core/factor/factor.ts';
import { CAUTION } from '../../core/predict/caution.ts';
import { predict, type Prediction } from '../../core/predict/predict.ts';
import type { Setting } from '../../core/study/study.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { analyseResponse, type AnalysisResult, type ModelChoice } from './analysis-model.ts';
import { loadStudyData, type StudyData } from './study-data.ts';

/** How far the sliders reach, in coded units: half a range beyond each tested end. */
export const SLIDER_REACH = 1.5;

/** A real setting rounded for showing and typing (4 significant digits). */
export function roundReal(x: number): number {
  return Number(x.toPrecision(4));
}

function centerOf(f: Factor): Setting {
  return f.kind === 'numeric' ? roundReal(toReal(f, 0) as number) : f.levels[0];
}

export type PredictionResult = { readonly ok: true; readonly prediction: Prediction } | { readonly ok: false; readonly message: string };

export const QuickCardModel = createModel((store: Store, studyId: string) => {
  const data = signal<StudyData | null>(null);
  const problem = signal<Problem | null>(null);
  const responseIndex = signal(0);
  const choice = signal<ModelChoice>('two-way');
  const settings = signal<Setting[]>([]);
  /** What is in each number field (may be a half-typed number). */
  const texts = signal<string[]>([]);
  const fieldErrors = signal<(string | null)[]>([]);

  const analysis = computed<AnalysisResult | null>(() => (data.value ? analyseResponse(data.value, responseIndex.value, choice.value) : null));

  const prediction = computed<PredictionResult | null>(() => {
    const a = analysis.value;
    const d = data.value;
    if (!a || !d) return null;
    if (!a.ok) return { ok: false, message: a.message };
    try {
      const input: [string, Setting][] = d.study.factors.map((f, i) => [f.name, settings.value[i]]);
      return { ok: true, prediction: predict(a.analysis.model, input) };
    } catch (err) {
      return { ok: false, message: problemOf(err).message };
    }
  });

  function put(i: number, value: Setting, text: string) {
    const s = [...settings.peek()];
    s[i] = value;
    settings.value = s;
    const t = [...texts.peek()];
    t[i] = text;
    texts.value = t;
    const e = [...fieldErrors.peek()];
    e[i] = null;
    fieldErrors.value = e;
  }

  return {
    data: data as ReadonlySignal<StudyData | null>,
    problem: problem as ReadonlySignal<Problem | null>,
    responseIndex: responseIndex as ReadonlySignal<number>,
    settings: settings as ReadonlySignal<Setting[]>,
    texts: texts as ReadonlySignal<string[]>,
    fieldErrors: fieldErrors as ReadonlySignal<(string | null)[]>,
    analysis,
    prediction,
    /** Coded value of each factor at the current settings. */
    coded: computed<number[]>(() => {
      const d = data.value;
      if (!d) return [];
      return d.study.factors.map((f, i) => {
        try {
          return toCoded(f, settings.value[i]);
        } catch {
          return 0;
        }
      });
    }),
    /** The caution lines: the prediction's own, or the standing ones before there is a prediction. */
    caution: computed<readonly string[]>(() => {
      const p = prediction.value;
      return p && p.ok ? p.prediction.caution : CAUTION;
    }),

    async load() {
      try {
        const d = await loadStudyData(store, studyId);
        const start = d.study.factors.map(centerOf);
        settings.value = start;
        texts.value = start.map(String);
        fieldErrors.value = start.map(() => null);
        data.value = d;
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
    chooseResponse(i: number) {
      responseIndex.value = i;
    },
    /** From a slider, in coded units. */
    setCoded(i: number, x: number) {
      const f = data.peek()?.study.factors[i];
      if (!f || f.kind !== 'numeric' || !Number.isFinite(x)) return;
      const real = roundReal(toReal(f, x) as number);
      put(i, real, String(real));
    },
    /** From a number field, in real units: a number that cannot be used changes nothing. */
    setText(i: number, text: string) {
      const f = data.peek()?.study.factors[i];
      if (!f || f.kind !== 'numeric') return;
      const t = [...texts.peek()];
      t[i] = text;
      texts.value = t;
      const x = parseNumber(text.trim());
      let message: string | null = null;
      if (!Number.isFinite(x)) message = `${f.name}: type a number (use a point for decimals). The prediction still uses ${settings.peek()[i]}${f.unit ? ' ' + f.unit : ''}.`;
      else if (f.scale === 'log' && x <= 0) message = `${f.name} is on a log scale and needs a positive number. The prediction still uses ${settings.peek()[i]}.`;
      if (message) {
        const e = [...fieldErrors.peek()];
        e[i] = message;
        fieldErrors.value = e;
        return;
      }
      put(i, x, text);
    },
    setLevel(i: number, label: string) {
      put(i, label, label);
    },
    /** Back to the center of every numeric factor. */
    reset() {
      const d = data.peek();
      if (!d) return;
      const start = d.study.factors.map(centerOf);
      settings.value = start;
      texts.value = start.map(String);
      fieldErrors.value = start.map(() => null);
    },
  };
});
