/** `solve FILE ... --target 75 --for A --at "B=gloss"`: the setting of one numeric factor that gives a target. */
import { InputError } from '../../core/errors.ts';
import { parseNumber } from '../../core/factor/coding.ts';
import { analyze } from '../../core/fit/analyze.ts';
import { solveForTarget } from '../../core/predict/solve-for-target.ts';
import { parseAssignments, parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { loadModelInput, modelOptionSpec, modelOptionUsage } from '../model-options.ts';
import { solveJson } from '../report/solve-json.ts';
import { solveText } from '../report/solve-text.ts';
import { atUsage } from './predict.ts';

const spec = { ...modelOptionSpec, at: { type: 'string' }, target: { type: 'string' }, for: { type: 'string' } } as const;

export const solve: Command = {
  summary: 'the setting of one numeric factor that gives a target response, the others held',
  usage: `Usage: npm run --silent cli -- solve FILE --factors A,B,C --response NAME --target 75 --for A [--at "B=gloss"] [options]

  --target VALUE       the response wanted
  --for FACTOR         the numeric factor to solve for (name or letter); it takes no --at setting
${atUsage}
${modelOptionUsage}`,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, spec);
    if (values.target === undefined) throw new InputError('Give the response wanted with --target VALUE');
    const target = parseNumber(values.target);
    if (!Number.isFinite(target)) throw new InputError(`--target needs a number, got "${values.target}"`);
    if (values.for === undefined || values.for.trim() === '') throw new InputError('Name the factor to solve for with --for FACTOR');
    const { data, terms, transform } = loadModelInput(positionals, values);
    const at = values.at === undefined ? [] : parseAssignments(values.at, '--at');
    const result = solveForTarget(analyze(data, { terms, transform }).model, { factor: values.for, target, at, ...(data.unit ? { responseUnit: data.unit } : {}) });
    return values.json ? JSON.stringify(solveJson(result), null, 2) : solveText(result);
  },
};
