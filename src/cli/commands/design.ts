/**
 * `design`: plans a two-level experiment and prints it as text (default), JSON (--json) or the
 * CSV run sheet (--csv).
 */
import { aliasChain, defaultAliasOrder, definingWordsOf } from '../../core/design/alias-structure.ts';
import { plackettBurmanAliasing, type PartialAlias } from '../../core/design/plackett-burman.ts';
import { correlationText } from '../../core/text/screening-text.ts';
import { formatWord, parseLetterWord } from '../../core/design/word.ts';
import { buildDesign, type DesignSpec } from '../../core/design/build-design.ts';
import { RUN_KIND_NAMES, type Design } from '../../core/design/design.ts';
import { romanResolution } from '../../core/design/defining-relation.ts';
import { plannedSetting } from '../../core/design/planned-settings.ts';
import { InputError } from '../../core/errors.ts';
import { parseNumber } from '../../core/factor/coding.ts';
import type { Factor, FactorSpec } from '../../core/factor/factor.ts';
import { checkNewFactor } from '../../core/factor/new-factor.ts';
import { parseTerms } from '../../core/model/formula.ts';
import { termLetters, termName } from '../../core/model/term.ts';
import { planPower, type PlanPower } from '../../core/plan/power.ts';
import { powerInWords } from '../../core/plan/power-words.ts';
import { factorLabel } from '../../core/study/name-with-unit.ts';
import { isNonFiniteNumberText, whyNotANumber } from '../../io/csv/cell-number.ts';
import { runSheetCsv } from '../../io/csv/run-sheet.ts';
import { parseCommandArgs } from '../args.ts';
import type { Command } from '../command.ts';
import { isSecondOrderRequest, runSecondOrderDesign, SECOND_ORDER_USAGE } from './design-second-order.ts';

const USAGE = `Usage: npm run --silent cli -- design --factor SPEC [--factor SPEC ...] [options]

Plans a two-level factorial experiment: a full factorial, a fraction from the built-in
minimum aberration catalog or from your generators, or a Plackett-Burman screening design;
with center runs, replicates, blocks, a foldover, and a randomized run order; and, given the
effect that matters and the noise, the power of the plan.

Factors (in the order given; they get the letters A, B, C, ... skipping I):
  --factor "Temperature (degC)=160:200"   numeric: both levels are numbers; unit optional
  --factor "Speed (rpm)=100:1000:log"     numeric, coded on a log scale
  --factor "Powder=matte:gloss"           categorical: two named levels, the first coded -1

Design:
  --fraction 1/2 | 1/4 | ...              minimum aberration fraction from the catalog (8 to 128 runs)
  --generators "E=ABCD,F=-ABC"            your generators (letters, or names joined by ':')
  --center-runs N                         center runs per replicate (numeric factors at mid-range)
  --replicates N                          replicates of the whole design
  --blocks 2|4|8                          blocks per replicate
  --block-words "ABCD[,...]"              words confounded with blocks (default: standard table or search)
  --foldover                              add the mirror image (every sign switched)
  --foldover FACTOR                       add the fraction with one factor's signs switched
  --plackett-burman 12|20|24              a Plackett-Burman screening design (up to 11, 19 or 23
                                          factors; fewer factors take its first columns)

Run order:
  --seed N                                seed of the randomized order (drawn and shown when absent)
  --standard-order                        keep standard (Yates) order instead of randomizing
  --sort-by FACTOR                        keep a hard-to-change factor sorted within blocks (repeatable)

Power (a two-sided t test of one main effect in the fitted model):
  --effect DELTA                          the effect that matters, in the response's units
  --sigma SIGMA                           run-to-run standard deviation (from an earlier study's
                                          residual standard deviation, or your estimate)
  --significance 0.05                     significance level of the test
  --power 0.8                             target power for the smallest effect and replicates
  --terms MODEL                           the model, e.g. "A*B*C" (default: main effects and the
                                          two-factor interactions the plan can estimate; main
                                          effects for a Plackett-Burman design)

Output:
  --json                                  the plan as JSON
  --csv                                   the run sheet as CSV (planned settings in real units)

${SECOND_ORDER_USAGE}`;

const OPTIONS = {
  factor: { type: 'string', multiple: true },
  fraction: { type: 'string' },
  generators: { type: 'string' },
  'center-runs': { type: 'string' },
  replicates: { type: 'string' },
  blocks: { type: 'string' },
  'block-words': { type: 'string' },
  foldover: { type: 'string' },
  'standard-order': { type: 'boolean' },
  seed: { type: 'string' },
  'sort-by': { type: 'string', multiple: true },
  'plackett-burman': { type: 'string' },
  effect: { type: 'string' },
  sigma: { type: 'string' },
  significance: { type: 'string' },
  power: { type: 'string' },
  terms: { type: 'string' },
  json: { type: 'boolean' },
  csv: { type: 'boolean' },
} as const;

/** Numeric options whose value may start with a minus sign (so "--sigma -1" reaches the check that refuses it). */
const SIGNED = new Set(['--effect', '--sigma', '--significance', '--power']);

/** What the power block needs from the command line. */
export interface PowerOptions {
  readonly effect: number;
  readonly sigma: number;
  readonly significance?: number;
  readonly power?: number;
  readonly terms?: string;
}

function numberOption(text: string | undefined, option: string): number | undefined {
  if (text === undefined) return undefined;
  const v = parseNumber(text);
  if (!Number.isFinite(v)) throw new InputError(`--${option} needs a number, got "${text}"`);
  return v;
}

/** Marks a bare --foldover (no factor after it) as the full mirror image. */
const FOLD_ALL = '\u0000all';

function wholeNumber(text: string | undefined, option: string): number | undefined {
  if (text === undefined) return undefined;
  if (!/^\s*\d+\s*$/.test(text)) throw new InputError(`--${option} needs a whole number, got "${text}"`);
  return Number(text);
}

/**
 * Reads one --factor: NAME [(UNIT)] = LOW : HIGH [: log]. Both levels numbers -> numeric,
 * otherwise categorical with two named levels. Checked as a new factor (checkNewFactor: no
 * comma, colon or equals sign in a name or level, the low below the high).
 * Example: parseFactorOption('Temperature (degC)=160:200') -> numeric, unit degC.
 */
export function parseFactorOption(text: string): FactorSpec {
  const spec = readFactorOption(text);
  try {
    checkNewFactor(spec);
  } catch (err) {
    throw err instanceof InputError ? new InputError(`--factor "${text}": ${err.message}`) : err;
  }
  return spec;
}

function readFactorOption(text: string): FactorSpec {
  const eq = text.indexOf('=');
  if (eq <= 0) throw new InputError(`--factor "${text}": expected NAME=LOW:HIGH, such as "Temperature (degC)=160:200" or "Powder=matte:gloss"`);
  if (text.indexOf('=', eq + 1) >= 0) {
    throw new InputError(`--factor "${text}": expected one "=" between the name and the levels (NAME=LOW:HIGH), got ${text.split('=').length - 1}; a name or level cannot contain "="`);
  }
  let name = text.slice(0, eq).trim();
  let unit: string | undefined;
  const m = /^(.*?)\s*\(([^()]*)\)$/.exec(name);
  if (m) {
    name = m[1].trim();
    unit = m[2].trim() || undefined;
  }
  if (name === '') throw new InputError(`--factor "${text}": the factor needs a name before "="`);
  const parts = text.slice(eq + 1).split(':').map((p) => p.trim());
  let log = false;
  if (parts.length === 3 && parts[2].toLowerCase() === 'log') {
    log = true;
    parts.pop();
  }
  if (parts.length !== 2) {
    throw new InputError(`--factor "${text}": expected two levels separated by ":", such as 160:200 or matte:gloss, got ${parts.length} part${parts.length === 1 ? '' : 's'}`);
  }
  const huge = parts.find(isNonFiniteNumberText);
  if (huge !== undefined) throw new InputError(`--factor "${text}": needs finite settings or two level names, got "${huge}"${whyNotANumber(huge)}`);
  const [lo, hi] = parts.map(parseNumber);
  if (Number.isFinite(lo) && Number.isFinite(hi)) {
    return { kind: 'numeric', name, low: lo, high: hi, ...(unit ? { unit } : {}), ...(log ? { scale: 'log' as const } : {}) };
  }
  if (log) throw new InputError(`--factor "${text}": a log scale needs numeric levels, got "${parts[0]}" and "${parts[1]}"`);
  if (unit) throw new InputError(`--factor "${text}": a unit needs numeric levels; "${parts[0]}" and "${parts[1]}" are names`);
  return { kind: 'categorical', name, levels: [parts[0], parts[1]] };
}

function splitList(text: string | undefined): string[] | undefined {
  if (text === undefined) return undefined;
  return text.split(',').map((s) => s.trim()).filter((s) => s !== '');
}

/**
 * Reads the command line into a design spec and output format. A bare --foldover means the
 * mirror image. Throws InputError for unknown options, positional words, no --factor, both
 * --json and --csv, --block-words without --blocks, --seed with --standard-order, or a count that
 * is not a whole number.
 * Example: parseDesignArgs(['--factor','A=1:2','--factor','B=1:2','--json']).format -> 'json'.
 */
export function parseDesignArgs(argv: string[]): { spec: DesignSpec; format: 'text' | 'json' | 'csv'; power: PowerOptions | null } {
  const args: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--foldover' && (i + 1 >= argv.length || argv[i + 1].startsWith('--'))) args.push(`--foldover=${FOLD_ALL}`);
    else if (SIGNED.has(a) && i + 1 < argv.length && /^-\d|^-\./.test(argv[i + 1])) args.push(`${a}=${argv[++i]}`);
    else args.push(a);
  }
  const { values, positionals } = parseCommandArgs(args, OPTIONS);
  if (positionals.length > 0) throw new InputError(`design takes options only, got "${positionals.join(' ')}"`);
  if (!values.factor || values.factor.length === 0) throw new InputError('design needs at least two --factor options, such as --factor "Temperature (degC)=160:200"; got none');
  if (values.json && values.csv) throw new InputError('Choose one output: --json or --csv, not both');
  if (values['block-words'] !== undefined && values.blocks === undefined) {
    throw new InputError('--block-words needs --blocks (2, 4 or 8) to say how many blocks');
  }
  if (values['standard-order'] && values.seed !== undefined) {
    throw new InputError(`--seed ${values.seed} only applies to a randomized order; drop --seed or --standard-order`);
  }
  const fold = values.foldover === undefined ? undefined : values.foldover === FOLD_ALL ? 'all' : values.foldover.trim();
  if (fold === '') throw new InputError('--foldover takes a factor name or letter, or nothing for the mirror image');
  const seed = values.seed === undefined ? undefined : wholeNumber(values.seed, 'seed');
  const pbText = values['plackett-burman'];
  const pb = pbText === undefined ? undefined : wholeNumber(pbText, 'plackett-burman');
  if (pbText !== undefined && ![12, 20, 24].includes(pb!)) throw new InputError(`--plackett-burman takes 12, 20 or 24 runs, got "${pbText}"`);
  const effect = numberOption(values.effect, 'effect');
  const sigma = numberOption(values.sigma, 'sigma');
  if ((effect === undefined) !== (sigma === undefined)) {
    throw new InputError(`The power of a plan needs both --effect (the effect that matters) and --sigma (the run-to-run noise); got only ${effect === undefined ? '--sigma' : '--effect'}`);
  }
  const powerOnly = (['significance', 'power', 'terms'] as const).filter((o) => values[o] !== undefined);
  if (effect === undefined && powerOnly.length > 0) {
    throw new InputError(`${powerOnly.map((o) => `--${o}`).join(', ')} ${powerOnly.length === 1 ? 'belongs' : 'belong'} to the power of the plan: give --effect and --sigma as well`);
  }
  if (effect !== undefined && values.csv) throw new InputError('--csv prints the run sheet only; for the power of the plan leave out --csv (text) or use --json');
  const power: PowerOptions | null =
    effect === undefined || sigma === undefined
      ? null
      : {
          effect,
          sigma,
          ...(values.significance !== undefined ? { significance: numberOption(values.significance, 'significance') } : {}),
          ...(values.power !== undefined ? { power: numberOption(values.power, 'power') } : {}),
          ...(values.terms !== undefined ? { terms: values.terms } : {}),
        };
  const spec: DesignSpec = {
    factors: values.factor.map(parseFactorOption),
    ...(values.fraction !== undefined ? { fraction: values.fraction } : {}),
    ...(values.generators !== undefined ? { generators: splitList(values.generators) } : {}),
    ...(values['center-runs'] !== undefined ? { centerRuns: wholeNumber(values['center-runs'], 'center-runs') } : {}),
    ...(values.replicates !== undefined ? { replicates: wholeNumber(values.replicates, 'replicates') } : {}),
    ...(values.blocks !== undefined ? { blocks: wholeNumber(values.blocks, 'blocks') } : {}),
    ...(values['block-words'] !== undefined ? { blockWords: splitList(values['block-words']) } : {}),
    ...(fold !== undefined ? { foldover: fold } : {}),
    randomize: !values['standard-order'],
    ...(seed !== undefined ? { seed } : {}),
    ...(values['sort-by'] ? { sortBy: values['sort-by'] } : {}),
    ...(pb !== undefined ? { plackettBurman: pb } : {}),
  };
  return { spec, format: values.json ? 'json' : values.csv ? 'csv' : 'text', power };
}

/**
 * The power of a built plan for the command line's power options: the model from --terms (read
 * over the plan's factors) or the default, then planPower. Throws InputError as planPower and
 * parseTerms do. Example: designPower(d, {effect: 2, sigma: 1.5}).residualDf -> 9 for a 2^4
 * with 4 center runs.
 */
export function designPower(d: Design, o: PowerOptions): PlanPower {
  return planPower(d, {
    effect: o.effect,
    sigma: o.sigma,
    ...(o.significance !== undefined ? { significance: o.significance } : {}),
    ...(o.power !== undefined ? { power: o.power } : {}),
    ...(o.terms !== undefined ? { terms: parseTerms(o.terms, d.factors) } : {}),
  });
}

/** The JSON power block: the issue's keys, then the standard error, the main effect and model it is for, and the words. */
export function powerJson(p: PlanPower, factors: readonly Factor[]): object {
  return {
    effect: p.effect,
    sigma: p.sigma,
    significance: p.significance,
    residualDf: p.residualDf,
    power: p.power,
    target: p.target,
    smallestEffect: p.smallestEffect,
    replicatesNeeded: p.replicatesNeeded,
    standardError: p.standardError,
    mainEffect: termName(p.mainEffect, factors),
    model: p.terms.map((t) => termLetters(t, factors)),
    summary: powerInWords(p),
  };
}

function aliasingJson(d: Design): object[] {
  if (!d.screening) return [];
  return plackettBurmanAliasing(d.screening.runs, d.factors.length).map((a) => ({
    effect: termLetters(a.effect, d.factors),
    interaction: termLetters(a.interaction, d.factors),
    correlation: a.correlation,
  }));
}

/**
 * The plan as the JSON object the command prints: factors (letter, name, kind, low, high, unit),
 * runs in run order with coded and real settings keyed by factor name, and the design's
 * generators, defining relation, resolution, word lengths, aliases, block words, seed, summary
 * and notes. Example: designJson(d).runs[0].run -> 1.
 */
export function designJson(d: Design): object {
  return {
    factors: d.factors.map((f) =>
      f.kind === 'numeric'
        ? { letter: f.letter, name: f.name, kind: f.kind, low: f.low, high: f.high, ...(f.unit ? { unit: f.unit } : {}), ...(f.scale === 'log' ? { scale: 'log' } : {}) }
        : { letter: f.letter, name: f.name, kind: f.kind, low: f.levels[0], high: f.levels[1] },
    ),
    runs: d.runs.map((r) => ({
      run: r.run,
      yates: r.standardOrder,
      replicate: r.replicate,
      block: r.block,
      kind: r.kind,
      coded: Object.fromEntries(d.factors.map((f, i) => [f.name, r.coded[i]])),
      real: Object.fromEntries(d.factors.map((f, i) => [f.name, plannedSetting(f, r.coded[i])])),
    })),
    generators: d.generators,
    definingRelation: d.definingRelation,
    resolution: d.resolution,
    wordLengths: d.wordLengths,
    aliases: d.aliases,
    blockWords: d.blockWords,
    seed: d.seed,
    summary: d.summary,
    notes: d.notes,
    ...(d.screening ? { screening: d.screening, partialAliasing: aliasingJson(d) } : {}),
  };
}

function table(header: string[], rows: string[][], rightAlign: boolean[]): string[] {
  const widths = header.map((h, j) => Math.max(h.length, ...rows.map((r) => r[j].length)));
  const line = (cells: string[]) =>
    '  ' + cells.map((c, j) => (rightAlign[j] ? c.padStart(widths[j]) : c.padEnd(widths[j]))).join('  ').trimEnd();
  return [line(header), ...rows.map(line)];
}

/** Factors beyond which the text counts a main effect's correlated interactions instead of naming them (one line on a screen). */
const NAMED_ALIASING_FACTORS = 8;

/** The partial-aliasing section of a Plackett-Burman plan's text: per main effect, its correlated interactions grouped by correlation. */
function partialAliasingText(d: Design): string[] {
  const k = d.factors.length;
  const all = plackettBurmanAliasing(d.screening!.runs, k);
  const out = ['Partial aliasing (correlation of each main effect with the two-factor interactions of other factors)'];
  if (all.length === 0) return [...out, '  none: with 2 factors there is no interaction of two other factors'];
  for (let i = 0; i < k; i++) {
    const mine = all.filter((a) => a.effect === 1 << i);
    const groups = new Map<number, PartialAlias[]>();
    for (const a of mine) if (a.correlation !== 0) groups.set(a.correlation, [...(groups.get(a.correlation) ?? []), a]);
    const clear = mine.length - [...groups.values()].reduce((n, g) => n + g.length, 0);
    const parts = [...groups.entries()]
      .sort((x, y) => y[0] - x[0])
      .map(([r, g]) => {
        const label = `${r > 0 ? '+' : ''}${correlationText(r)}`;
        return k <= NAMED_ALIASING_FACTORS ? `${label} with ${g.map((a) => termLetters(a.interaction, d.factors)).join(' ')}` : `${label} with ${g.length}`;
      });
    if (clear > 0) parts.push(`clear of ${clear}`);
    out.push(`  ${d.factors[i].letter}: ${parts.join('; ')}`);
  }
  return out;
}

/** A number for the power section: 3 significant digits, or "-" for null. */
function shown(x: number | null): string {
  return x === null ? '-' : String(Number(x.toPrecision(3)));
}

/**
 * The power section of the text report: the inputs, the residual degrees of freedom, the
 * standard error of an effect, the power, the smallest effect at the target, the replicates
 * needed, then the same in plain words.
 * Example: powerText(p, factors)[0] -> "Power (two-sided t test of one main effect; model A + B + ...)".
 */
export function powerText(p: PlanPower, factors: readonly Factor[]): string[] {
  const perCopy = p.runs / p.replicates;
  const rows: [string, string][] = [
    ['Effect to detect', shown(p.effect)],
    ['Noise (sigma)', shown(p.sigma)],
    ['Significance', shown(p.significance)],
    ['Residual df', String(p.residualDf)],
    ['Standard error', `${shown(p.standardError)} (of ${p.mainEffectsAlike ? 'each main effect' : `the ${termName(p.mainEffect, factors)} effect, the least precise main effect`})`],
    ['Power', p.power === null ? '- (no residual df: no t test possible)' : shown(p.power)],
    [`Smallest effect at power ${shown(p.target)}`, shown(p.smallestEffect)],
    ['Replicates needed', p.replicatesNeeded === null ? '- (not within the run limit)' : `${p.replicatesNeeded} (${p.replicatesNeeded * perCopy} runs)`],
  ];
  const w = Math.max(...rows.map(([a]) => a.length));
  return [
    `Power (two-sided t test of one main effect; model ${p.terms.map((t) => termLetters(t, factors)).join(' + ')})`,
    ...rows.map(([a, b]) => `  ${a.padEnd(w)}  ${b}`),
    `  ${powerInWords(p)}`,
  ];
}

/**
 * The plan in our plain-words text layout: a title, the summary, the factors, the design's
 * facts (generators, defining relation, resolution, word lengths, blocks, run order), the alias
 * chains, the runs with planned settings in real units, and the notes.
 * Example: designText(d).split('\n')[0] -> "Plan: 2^(7-3) fractional factorial, 16 runs".
 */
export function designText(d: Design): string {
  const k = d.factors.length;
  const p = d.generators.length;
  const folded = d.foldover !== null;
  const kind = d.screening
    ? `${d.screening.runs}-run Plackett-Burman screening design for ${k} factors`
    : p === 0
      ? `2^${k} full factorial`
      : `2^(${k}-${p}) fractional factorial${folded ? ' with its foldover' : ''}`;
  const out: string[] = [`Plan: ${kind}, ${d.runs.length} runs`, '', d.summary, '', 'Factors'];
  out.push(
    ...table(
      ['', 'Name', 'Low (-1)', 'High (+1)'],
      d.factors.map((f) => [
        f.letter,
        factorLabel(f) + (f.kind === 'numeric' && f.scale === 'log' ? ', log scale' : ''),
        String(f.kind === 'numeric' ? f.low : f.levels[0]),
        String(f.kind === 'numeric' ? f.high : f.levels[1]),
      ]),
      [false, false, false, false],
    ),
  );
  out.push('');
  const facts: [string, string][] = [];
  if (p > 0) {
    facts.push(['Generators', d.generators.map((g) => g.replace('=', ' = ')).join(', ')]);
    facts.push(['Defining relation', `I = ${d.definingRelation.join(' = ')}`]);
    facts.push(['Resolution', d.resolution === null ? 'none' : romanResolution(d.resolution)]);
    facts.push(['Word lengths', Object.entries(d.wordLengths).map(([len, n]) => `${n} of length ${len}`).join(', ')]);
  } else if (d.screening) {
    facts.push(['Defining relation', 'none (a Plackett-Burman design: main effects are partly aliased with two-factor interactions, below)']);
  } else {
    facts.push(['Defining relation', 'none (full factorial)']);
  }
  const blocks = new Set(d.runs.map((r) => r.block)).size;
  const letters = d.factors.map((f) => f.letter);
  const relation = definingWordsOf(d);
  const order = defaultAliasOrder(d.resolution, k);
  const blocked = d.blockWords.map((w) =>
    aliasChain(parseLetterWord(w, letters).mask, relation, order)
      .map((x) => formatWord(x.mask, letters))
      .join(' = '),
  );
  facts.push(['Blocks', blocks > 1 ? `${blocks}; confounded with blocks: ${blocked.join('; ')}` : 'none']);
  facts.push(['Run order', d.seed === null ? 'standard (Yates) order' : `randomized${blocks > 1 ? ' within blocks' : ''}, seed ${d.seed} (PCG32 and a Fisher-Yates shuffle)`]);
  const w = Math.max(...facts.map(([a]) => a.length));
  out.push(...facts.map(([a, b]) => `${a.padEnd(w)}  ${b}`));
  out.push('');
  if (d.screening) {
    out.push(...partialAliasingText(d));
  } else if (p === 0) {
    out.push('Alias chains: none, a full factorial estimates every effect on its own' + (d.blockWords.length ? ' (except those confounded with blocks)' : ''));
  } else {
    out.push(`Alias chains (effects of up to ${order} factors shown)`);
    out.push(...d.aliases.map((c) => `  ${c.join(' = ')}`));
  }
  out.push('');
  out.push('Runs');
  const header = ['Run', 'Std', 'Rep', 'Block', 'Kind', ...d.factors.map((f) => f.name)];
  const rows = d.runs.map((r) => [
    String(r.run),
    r.standardOrder === null ? '-' : String(r.standardOrder),
    String(r.replicate),
    String(r.block),
    RUN_KIND_NAMES[r.kind],
    ...d.factors.map((f, i) => String(plannedSetting(f, r.coded[i]))),
  ]);
  out.push(...table(header, rows, [true, true, true, true, false, ...d.factors.map((f) => f.kind === 'numeric')]));
  if (d.notes.length > 0) {
    out.push('', 'Notes');
    for (const n of d.notes) out.push(`  - ${n}`);
  }
  return out.join('\n');
}

export const design: Command = {
  summary: 'plan a two-level factorial or fractional factorial experiment',
  usage: USAGE,
  async run(argv: string[]): Promise<string> {
    if (isSecondOrderRequest(argv)) return runSecondOrderDesign(argv, { parseFactorOption, designJson });
    const { spec, format, power } = parseDesignArgs(argv);
    const d = buildDesign(spec);
    const p = power === null ? null : designPower(d, power);
    if (format === 'json') return JSON.stringify(p === null ? designJson(d) : { ...designJson(d), power: powerJson(p, d.factors) }, null, 2);
    if (format === 'csv') return runSheetCsv(d);
    return p === null ? designText(d) : `${designText(d)}\n\n${powerText(p, d.factors).join('\n')}`;
  },
};
