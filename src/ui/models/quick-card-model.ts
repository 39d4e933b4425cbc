/**
 * The quick card: settings in real units for every factor (numeric ones by slider or typed
 * number, categorical ones by their two levels), and the prediction of the shown response there
 * from the model fitted in the study's shared analysis (study-analysis-model.ts, so the model
 * chosen on the Effects screen is the one used here), with its intervals, the baseline and each
 * term's contribution, the tested-range check and the standing caution; with several responses,
 * each one's prediction and d and the overall D there (responses-at-settings.ts). A number that
 * cannot be read gets a message and leaves the prediction as it was.
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import { toCoded, toReal } from '../../core/factor/coding.ts';
import type { Factor } from '../../core/factor/factor.ts';
import { readSetting } from '../../core/factor/read-setting.ts';
import { CAUTION } from '../../core/predict/caution.ts';
import { predict, type Prediction } from '../../core/predict/predict.ts';
import type { Setting } from '../../core/study/study.ts';
import { setting } from '../lib/format.ts';
import { problemOf } from '../lib/problem.ts';
import { responsesAtSettings, type ResponsesAtSettings } from './responses-at-settings.ts';
import type { AnalysisResult, StudyAnalysis } from './study-analysis-model.ts';

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

interface Entry {
  readonly settings: readonly Setting[];
  /** What is in each number field (may be a half-typed number). */
  readonly texts: readonly string[];
  readonly errors: readonly (string | null)[];
}

export const QuickCardModel = createModel((shared: StudyAnalysis) => {
  /** What the person has set; null until they set something (then the centers are shown). */
  const typed = signal<Entry | null>(null);
  const factors = computed<readonly Factor[]>(() => shared.data.value?.study.factors ?? []);
  const entry = computed<Entry>(() => {
    const t = typed.value;
    if (t && t.settings.length === factors.value.length) return t;
    const start = factors.value.map(centerOf);
    return { settings: start, texts: start.map(String), errors: start.map(() => null) };
  });

  const analysis = computed<AnalysisResult | null>(() => shared.shown.value?.result.value ?? null);

  const prediction = computed<PredictionResult | null>(() => {
    const a = analysis.value;
    if (!a) return null;
    if (!a.ok) return { ok: false, message: a.message };
    try {
      const input: [string, Setting][] = factors.value.map((f, i) => [f.name, entry.value.settings[i]]);
      return { ok: true, prediction: predict(a.analysis.model, input) };
    } catch (err) {
      return { ok: false, message: problemOf(err).message };
    }
  });

  /** Coded value of each factor at the current settings. */
  const coded = computed<number[]>(() =>
    factors.value.map((f, i) => {
      try {
        return toCoded(f, entry.value.settings[i]);
      } catch {
        return 0;
      }
    }),
  );

  function update(i: number, patch: { setting?: Setting; text: string; error: string | null }) {
    const e = entry.peek();
    const settings = [...e.settings];
    if (patch.setting !== undefined) settings[i] = patch.setting;
    const texts = [...e.texts];
    texts[i] = patch.text;
    const errors = [...e.errors];
    errors[i] = patch.error;
    typed.value = { settings, texts, errors };
  }

  return {
    settings: computed(() => entry.value.settings),
    texts: computed(() => entry.value.texts),
    fieldErrors: computed(() => entry.value.errors),
    analysis,
    prediction,
    coded,
    /** With two or more responses: each one's prediction and d, and the overall D, at these settings (null with one). */
    allResponses: computed<ResponsesAtSettings | null>(() => (shared.responses.value.length > 1 ? responsesAtSettings(shared.responses.value, coded.value) : null)),
    /** The caution lines: the prediction's own, or the standing ones before there is a prediction. */
    caution: computed<readonly string[]>(() => {
      const p = prediction.value;
      return p && p.ok ? p.prediction.caution : CAUTION;
    }) as ReadonlySignal<readonly string[]>,

    /** From a slider, in coded units. */
    setCoded(i: number, x: number) {
      const f = factors.peek()[i];
      if (!f || f.kind !== 'numeric' || !Number.isFinite(x)) return;
      const real = roundReal(toReal(f, x) as number);
      update(i, { setting: real, text: String(real), error: null });
    },
    /** From a number field, in real units: a number that cannot be used changes nothing but the message. */
    setText(i: number, text: string) {
      const f = factors.peek()[i];
      if (!f || f.kind !== 'numeric') return;
      try {
        update(i, { setting: readSetting(f, text), text, error: null });
      } catch (err) {
        const still = setting(entry.peek().settings[i], f.unit);
        update(i, { text, error: `${problemOf(err).message}. The prediction still uses ${still}.` });
      }
    },
    setLevel(i: number, label: string) {
      update(i, { setting: label, text: label, error: null });
    },
    /** Back to the center of every numeric factor. */
    reset() {
      typed.value = null;
    },
  };
});
