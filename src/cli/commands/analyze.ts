/** `analyze FILE --factors ... --response ...`: the full analysis of one response. */
import { InputError } from '../../core/errors.ts';
import { analyze as analyzeCore } from '../../core/fit/analyze.ts';
import { isSecondOrderModel, secondOrderAnalysis } from '../../core/optimum/second-order-analysis.ts';
import { findResponse } from '../../core/study/run-data.ts';
import { readBackupFile } from '../read-backup-file.ts';
import { selectStudy } from '../../io/backup/select-study.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { goalOfResponse, parseGoal } from '../goal-option.ts';
import { loadModelInput, modelOptionSpec, modelOptionUsage } from '../model-options.ts';
import { analysisJson } from '../report/analysis-json.ts';
import { analysisText } from '../report/analysis-text.ts';
import { confirmationsJson, confirmationsText } from '../report/confirmations-report.ts';
import { confirmationSets, judgeConfirmationSets } from '../../core/predict/confirmation-sets.ts';
import { confirmationRowsOfFile } from '../confirmation-input.ts';
import { secondOrderJson } from '../report/second-order-json.ts';
import { secondOrderText } from '../report/second-order-text.ts';

const spec = { ...modelOptionSpec, goal: { type: 'string' } } as const;

export const analyze: Command = {
  summary: 'effects, ANOVA, curvature and Lenth\'s method for one response',
  usage: `Usage: npm run --silent cli -- analyze FILE --factors A,B,C --response NAME [options]\n\n${modelOptionUsage}
  --goal max|min|target=T
                       with a second-order model (--terms quadratic): the goal of the best
                       setting inside the box (default: the study's goal in a backup, else max);
                       the report then adds the canonical analysis, the ridge and that setting`,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, spec);
    const { data, terms, codingFromFileOrder, transform } = loadModelInput(positionals, values);
    const result = analyzeCore(data, { terms, transform });
    const second = isSecondOrderModel(result.model);
    if (values.goal !== undefined && !second) {
      throw new InputError('--goal needs a second-order model on numeric factors: squares in --terms (such as --terms quadratic) and no categorical factor');
    }
    let goal = values.goal !== undefined ? parseGoal(values.goal) : { kind: 'max' as const };
    if (values.goal === undefined && second && values.study) {
      // A backup's study says what the person wants of the response.
      const study = selectStudy(readBackupFile(positionals[0]), values.study);
      goal = goalOfResponse(findResponse(study, values.response!).response);
    }
    const so = second ? secondOrderAnalysis(result.model, data.coded, goal) : null;
    // Confirmation runs, kept out of the fit, judged against it (on its transformed scale when it has one).
    const judged = judgeConfirmationSets(result.model, confirmationSets(confirmationRowsOfFile(positionals[0], values, result.model.factors)));
    if (values.json) {
      return JSON.stringify({ ...analysisJson(result), ...(so ? { secondOrder: secondOrderJson(so) } : {}), ...(judged.length > 0 ? { confirmations: confirmationsJson(judged, result.model.factors) } : {}) }, null, 2);
    }
    const text = analysisText(result, { ...(data.unit ? { unit: data.unit } : {}), codingFromFileOrder });
    const parts = [text, ...(so ? [secondOrderText(so)] : []), ...(judged.length > 0 ? [confirmationsText(judged, result.model)] : [])];
    return parts.join('\n\n');
  },
};
