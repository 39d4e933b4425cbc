/**
 * The analysis of one response of a study, from the current state of its logged runs (the same
 * path as the command line's analysis of a backup: responseDataFromRuns, then analyze): the
 * effects ranked by size, the R^2 figures, curvature and the warnings, and which two-factor
 * interaction the interaction chart shows.
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import type { Analysis, TermEstimate } from '../../core/fit/analysis.ts';
import { analyze } from '../../core/fit/analyze.ts';
import { termsUpToOrder } from '../../core/model/formula.ts';
import { isInteraction, termOrder, type Term } from '../../core/model/term.ts';
import type { ResponseData } from '../../core/study/response-data.ts';
import { responseDataFromRuns } from '../../core/study/run-data.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { loadStudyData, type StudyData } from './study-data.ts';

/** Which terms the model holds: main effects only, or main effects and two-factor interactions. */
export type ModelChoice = 'main' | 'two-way';

export const MODEL_CHOICES: readonly { readonly value: ModelChoice; readonly label: string }[] = [
  { value: 'two-way', label: 'With interactions' },
  { value: 'main', label: 'Main effects only' },
];

export type AnalysisResult =
  | { readonly ok: true; readonly analysis: Analysis; readonly data: ResponseData }
  | { readonly ok: false; readonly message: string };

/** The analysis of one response with the chosen terms, or the reason there is none. */
export function analyseResponse(d: StudyData, responseIndex: number, choice: ModelChoice): AnalysisResult {
  const response = d.study.responses[responseIndex];
  if (!response) return { ok: false, message: 'This study has no response to analyse.' };
  try {
    const data = responseDataFromRuns(d.study, d.runs, response.name);
    const k = d.study.factors.length;
    const terms = termsUpToOrder(k, choice === 'main' ? 1 : Math.min(2, k));
    return { ok: true, analysis: analyze(data, { terms }), data };
  } catch (err) {
    return { ok: false, message: problemOf(err).message };
  }
}

/** The model's two-factor terms, largest |effect| first. */
export function twoFactorTerms(a: Analysis): TermEstimate[] {
  return a.terms.filter((t) => isInteraction(t.term) && termOrder(t.term) === 2).sort((x, y) => Math.abs(y.effect) - Math.abs(x.effect));
}

export const AnalysisModel = createModel((store: Store, studyId: string) => {
  const data = signal<StudyData | null>(null);
  const problem = signal<Problem | null>(null);
  const responseIndex = signal(0);
  const choice = signal<ModelChoice>('two-way');
  /** The two-factor term the person picked for the interaction chart; null for the default. */
  const interaction = signal<Term | null>(null);

  const result = computed<AnalysisResult | null>(() => (data.value ? analyseResponse(data.value, responseIndex.value, choice.value) : null));

  return {
    data: data as ReadonlySignal<StudyData | null>,
    problem: problem as ReadonlySignal<Problem | null>,
    responseIndex: responseIndex as ReadonlySignal<number>,
    choice: choice as ReadonlySignal<ModelChoice>,
    result,
    /** The model's terms, largest absolute effect first. */
    ranked: computed<TermEstimate[]>(() => {
      const r = result.value;
      return r && r.ok ? [...r.analysis.terms].sort((a, b) => Math.abs(b.effect) - Math.abs(a.effect)) : [];
    }),
    /** The interaction chart's term: the one picked while the model holds it, else the largest two-factor term by |effect|; null when the model has none. */
    interactionTerm: computed<Term | null>(() => {
      const r = result.value;
      if (!r || !r.ok) return null;
      const two = twoFactorTerms(r.analysis);
      if (two.length === 0) return null;
      return two.some((t) => t.term === interaction.value) ? interaction.value : two[0].term;
    }),
    chooseInteraction(t: Term) {
      interaction.value = t;
    },
    async load() {
      try {
        data.value = await loadStudyData(store, studyId);
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
    chooseResponse(i: number) {
      responseIndex.value = i;
    },
    chooseModel(c: ModelChoice) {
      choice.value = c;
    },
  };
});
