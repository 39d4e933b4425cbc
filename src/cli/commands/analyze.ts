/** `analyze FILE --factors ... --response ...`: the full analysis of one response. */
import { analyze as analyzeCore } from '../../core/fit/analyze.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { loadModelInput, modelOptionSpec, modelOptionUsage } from '../model-options.ts';
import { analysisJson } from '../report/analysis-json.ts';
import { analysisText } from '../report/analysis-text.ts';

export const analyze: Command = {
  summary: 'effects, ANOVA, curvature and Lenth\'s method for one response',
  usage: `Usage: npm run --silent cli -- analyze FILE --factors A,B,C --response NAME [options]\n\n${modelOptionUsage}`,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, modelOptionSpec);
    const { data, terms, transform } = loadModelInput(positionals, values);
    const result = analyzeCore(data, { terms, transform });
    return values.json ? JSON.stringify(analysisJson(result), null, 2) : analysisText(result);
  },
};
