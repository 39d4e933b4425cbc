/**
 * The confirmation verdicts of a whole study, as the exports carry them: for each response with
 * planned confirmation runs, the analysis of the runs the model is fitted to (path and
 * confirmation runs kept out, fit/analyze.ts) with the default model, main effects and two-factor
 * interactions, or main effects only for a Plackett-Burman study (the command line's `analyze`
 * without --terms, so `analyze BACKUP --study S --response R` gives the same verdicts), and each
 * set of confirmation runs judged against it (confirmation-sets.ts: the mean of the m runs
 * against y-hat +- t(0.975, df) s sqrt(1/m + x0'(X'X)^-1 x0); Montgomery, Design and Analysis of
 * Experiments, 8th ed., section 10.6, from memory). A response whose runs cannot be analyzed yet
 * carries the reason instead of verdicts, so the export is still written.
 * Cost: one analysis per response with confirmation runs.
 * Example: a study with 3 confirmation runs at one setting -> [{ response: 'Gloss', model: 'two-way', judged: [one set], problem: null }].
 */
import { InputError } from '../errors.ts';
import { analyze } from '../fit/analyze.ts';
import { defaultTerms } from '../model/formula.ts';
import { mainEffect } from '../model/term.ts';
import { responseDataFromRuns } from '../study/run-data.ts';
import type { LoggedRun, StudyPlan } from '../study/study.ts';
import { confirmationRowsOf, confirmationSets, judgeConfirmationSets, type JudgedSet } from './confirmation-sets.ts';

export interface ResponseConfirmations {
  readonly response: string;
  /** The model judged against: 'two-way' (main effects and two-factor interactions) or 'main' (a Plackett-Burman study). */
  readonly model: 'two-way' | 'main';
  readonly judged: readonly JudgedSet[];
  /** Why the response's runs cannot be analyzed yet (its sets then have no verdict), else null. */
  readonly problem: string | null;
}

/** Throws nothing for bad runs (their InputError becomes `problem`); a study without confirmation runs gives []. */
export function studyConfirmations(study: StudyPlan, runs: readonly LoggedRun[]): ResponseConfirmations[] {
  const out: ResponseConfirmations[] = [];
  study.responses.forEach((response, index) => {
    const rows = confirmationRowsOf(study, runs, index);
    if (rows.length === 0) return;
    const sets = confirmationSets(rows);
    const model = study.design.screening ? 'main' : 'two-way';
    try {
      const data = responseDataFromRuns(study, runs, response.name);
      const k = study.factors.length;
      const terms = model === 'main' ? Array.from({ length: k }, (_, i) => mainEffect(i)) : defaultTerms(k);
      out.push({ response: response.name, model, judged: judgeConfirmationSets(analyze(data, { terms }).model, sets), problem: null });
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      out.push({ response: response.name, model, judged: sets.map((set) => ({ set, comparison: null, problem: err.message })), problem: err.message });
    }
  });
  return out;
}
