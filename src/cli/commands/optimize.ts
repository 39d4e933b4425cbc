/**
 * `optimize FILE ... --responses "Y1:max:60:75,Y2:min:2:8" [--at SETTINGS]`: the overall
 * desirability of several responses, at given settings or at the best setting found inside the
 * tested box.
 */
import { InputError } from '../../core/errors.ts';
import { analyze } from '../../core/fit/analyze.ts';
import type { FittedModel } from '../../core/fit/analysis.ts';
import { desirabilityAt, maximizeDesirability } from '../../core/optimum/desirability-search.ts';
import { outsideRange } from '../../core/predict/outside-range.ts';
import { parseSettings } from '../../core/predict/parse-settings.ts';
import { CAUTION } from '../../core/predict/caution.ts';
import { parseAssignments, parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { loadModelInput, modelOptionSpec, modelOptionUsage } from '../model-options.ts';
import { num } from '../report/numbers.ts';
import { parseResponses } from '../responses-option.ts';
import { atUsage } from './predict.ts';

const spec = { ...modelOptionSpec, responses: { type: 'string' }, at: { type: 'string' } } as const;

const USAGE = `Usage: npm run --silent cli -- optimize FILE --factors A,B,C --terms quadratic --responses SPEC [--at SETTINGS] [options]

Several responses at once by their overall desirability D (Derringer and Suich 1980): each
response's prediction becomes d between 0 and 1 by its goal and acceptable limits, and D is the
weighted geometric mean of the d. Without --at: the setting inside the tested box with the
highest D found by a local search from many starting points, each response's prediction with
its 95% prediction interval and d there. With --at: D and each d at those settings.

  --responses "Y1:max:60:75,Y2:min:2:8,Y3:target:9:10:11"
                       NAME:max:LOW:HIGH (d = 0 at or below LOW, 1 at or above HIGH),
                       NAME:min:LOW:HIGH (the mirror image), NAME:target:LOW:T:HIGH (1 at T, 0
                       outside LOW to HIGH); each may end with :w=WEIGHT (importance, default 1)
                       and shapes :r= (max, min) or :s= and :t= (target), default 1
${atUsage}
${modelOptionUsage.replace(/  --response NAME .*\n/, '')}`;

export const optimize: Command = {
  summary: 'the best setting for several responses at once (overall desirability)',
  usage: USAGE,
  async run(argv) {
    const { values, positionals } = parseCommandArgs(argv, spec);
    if (values.response !== undefined) throw new InputError('optimize takes its responses in --responses, not --response');
    if (!values.responses) throw new InputError('Name the responses and their goals with --responses, such as "Yield:max:78:81,Cost:min:10:14"');
    const specs = parseResponses(values.responses);
    const fits = specs.map((s) => {
      const { data, terms } = loadModelInput(positionals, { ...values, response: s.name });
      return { data, model: analyze(data, { terms }).model as FittedModel };
    });
    const models = fits.map((f) => f.model);
    if (values.at !== undefined) {
      const settings = parseSettings(models[0].factors, parseAssignments(values.at, '--at'));
      const coded = settings.map((s) => s.coded);
      const p = desirabilityAt(models, specs, coded);
      const messages = outsideRange(models[0].factors, coded, models[0].extent).map((o) => o.message);
      const out = {
        at: {
          settings: Object.fromEntries(settings.map((s) => [s.name, s.real])),
          D: p.D,
          responses: Object.fromEntries(p.responses.map((r) => [r.name, { fit: r.fit, d: r.d }])),
        },
        messages,
        caution: CAUTION,
      };
      if (values.json) return JSON.stringify(out, null, 2);
      return [
        `Overall desirability at ${settings.map((s) => `${s.name} = ${s.real}`).join(', ')}: D = ${num(p.D)}`,
        ...p.responses.map((r) => `  ${r.name}: fit ${num(r.fit)}, d ${num(r.d)}`),
        ...(messages.length ? ['', ...messages.map((m) => `  - ${m}`)] : []),
        '',
        'Caution',
        ...CAUTION.map((c) => `  - ${c}`),
      ].join('\n');
    }
    const best = maximizeDesirability(models, specs, fits[0].data.coded);
    const names = models[0].factors.map((f) => f.name);
    const out = {
      best: {
        coded: Object.fromEntries(names.map((n, i) => [n, best.coded[i]])),
        real: Object.fromEntries(names.map((n, i) => [n, best.real[i]])),
        D: best.D,
        responses: Object.fromEntries(best.responses.map((r) => [r.name, { fit: r.fit, pi: r.pi, d: r.d }])),
      },
      search: best.search,
      notes: best.notes,
      caution: best.caution,
    };
    if (values.json) return JSON.stringify(out, null, 2);
    const f = models[0].factors;
    return [
      `Best overall desirability found inside the tested box: D = ${num(best.D)}`,
      `  at ${f.map((x, i) => `${x.name} ${typeof best.real[i] === 'number' ? num(best.real[i] as number) : best.real[i]}${x.kind === 'numeric' && x.unit ? ` ${x.unit}` : ''} (coded ${num(best.coded[i])})`).join(', ')}`,
      ...best.responses.map((r) => `  ${r.name}: fit ${num(r.fit)}, 95% PI ${r.pi ? `${num(r.pi[0])} to ${num(r.pi[1])}` : '-'}, d ${num(r.d)}`),
      `  Found by: ${best.search.method}; best start ${best.search.bestStart}; ${best.search.evaluations} evaluations`,
      '',
      'Notes',
      ...best.notes.map((n) => `  - ${n}`),
      '',
      'Caution',
      ...best.caution.map((c) => `  - ${c}`),
    ].join('\n');
  },
};
