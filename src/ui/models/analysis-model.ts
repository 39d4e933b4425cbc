/**
 * The Effects screen's view of a study's shared analysis (study-analysis-model.ts): the shown
 * response's effects ranked by size, and which two-factor interaction the interaction chart
 * shows. Nothing here is worked out twice: the analysis itself belongs to the shared model.
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import type { Analysis, TermEstimate } from '../../core/fit/analysis.ts';
import { isInteraction, termOrder, type Term } from '../../core/model/term.ts';
import type { AnalysisResult, StudyAnalysis } from './study-analysis-model.ts';

/** The model's two-factor terms, largest |effect| first. */
export function twoFactorTerms(a: Analysis): TermEstimate[] {
  return a.terms.filter((t) => isInteraction(t.term) && termOrder(t.term) === 2).sort((x, y) => Math.abs(y.effect) - Math.abs(x.effect));
}

export const AnalysisModel = createModel((shared: StudyAnalysis) => {
  /** The two-factor term the person picked for the interaction chart; null for the default. */
  const interaction = signal<Term | null>(null);
  const result = computed<AnalysisResult | null>(() => shared.shown.value?.result.value ?? null);

  return {
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
    }) as ReadonlySignal<Term | null>,
    chooseInteraction(t: Term) {
      interaction.value = t;
    },
  };
});
