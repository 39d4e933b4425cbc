/** `path FILE ... --base A --step 10 --steps 5 [--descent]`: the path of steepest ascent or descent. */
import { InputError } from '../../core/errors.ts';
import { parseNumber } from '../../core/factor/coding.ts';
import { analyze } from '../../core/fit/analyze.ts';
import { steepestPath } from '../../core/predict/steepest-path.ts';
import { parseAssignments, parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { loadModelInput, modelOptionSpec, modelOptionUsage } from '../model-options.ts';
import { pathJson } from '../report/path-json.ts';
import { pathText } from '../report/path-text.ts';

const spec = {
  ...modelOptionSpec,
  at: { type: 'string' },
  base: { type: 'string' },
  step: { type: 'string' },
  steps: { type: 'string' },
  descent: { type: 'boolean' },
} as const;

/** Steps computed when --steps is not given. */
const DEFAULT_STEPS = 5;

export const path: Command = {
  summary: 'the path of steepest ascent (or descent) from the center, with predictions',
  usage: `Usage: npm run --silent cli -- path FILE --factors A,B,C --response NAME --base A --step 10 [--steps 5] [--descent] [options]

The direction in coded units is proportional to the main-effect coefficients (Box and Wilson
1951; Montgomery, Design and Analysis of Experiments, 8th ed., section 11.2).

  --base FACTOR        the numeric factor whose real step you choose (name or letter)
  --step SIZE          its step in real units (on a log scale: the ratio per step, above 1)
  --steps N            steps after the origin (default ${DEFAULT_STEPS})
  --descent            make the response smaller (default: larger)
  --at "B=gloss"       levels of categorical factors (default: the better level by its main effect);
                       a numeric factor given here is held at that setting and does not move
${modelOptionUsage}`,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, spec);
    if (values.base === undefined || values.base.trim() === '') throw new InputError('Name the base factor with --base FACTOR');
    if (values.step === undefined) throw new InputError('Give the base factor\'s step in real units with --step SIZE');
    const step = parseNumber(values.step);
    if (!Number.isFinite(step)) throw new InputError(`--step needs a number, got "${values.step}"`);
    const steps = values.steps === undefined ? DEFAULT_STEPS : parseNumber(values.steps);
    if (!Number.isInteger(steps)) throw new InputError(`--steps needs a whole number, got "${values.steps}"`);
    const { data, terms, transform } = loadModelInput(positionals, values);
    const at = values.at === undefined ? [] : parseAssignments(values.at, '--at');
    const result = steepestPath(analyze(data, { terms, transform }).model, { base: values.base, step, steps, sense: values.descent ? 'descent' : 'ascent', at });
    return values.json ? JSON.stringify(pathJson(result), null, 2) : pathText(result);
  },
};
