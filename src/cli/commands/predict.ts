/** `predict FILE --factors ... --response ... --at "A=180,B=gloss"`: a prediction at real settings. */
import { analyze } from '../../core/fit/analyze.ts';
import { predict as predictCore } from '../../core/predict/predict.ts';
import { parseAssignments, parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { loadModelInput, modelOptionSpec, modelOptionUsage } from '../model-options.ts';
import { predictionJson } from '../report/prediction-json.ts';
import { predictionText } from '../report/prediction-text.ts';

const spec = { ...modelOptionSpec, at: { type: 'string' } } as const;

export const atUsage = `  --at "A=180,B=gloss"  settings in real units, each factor by its name or letter; a numeric factor
                       not given is held at its center, a categorical factor must be given`;

export const predict: Command = {
  summary: 'fitted value, its intervals and the contribution of each term at real settings',
  usage: `Usage: npm run --silent cli -- predict FILE --factors A,B,C --response NAME --at "A=180,B=gloss" [options]

The fit with its standard error, the 95% confidence interval for the mean response, the 95%
prediction interval for one new run, and the baseline plus each term's contribution.

${atUsage}
${modelOptionUsage}`,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, spec);
    const { data, terms, transform } = loadModelInput(positionals, values);
    const at = values.at === undefined ? [] : parseAssignments(values.at, '--at');
    const result = predictCore(analyze(data, { terms, transform }).model, at);
    return values.json ? JSON.stringify(predictionJson(result), null, 2) : predictionText(result);
  },
};
