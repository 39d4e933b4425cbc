/**
 * The second-order part of `design`: `--central-composite` and `--box-behnken`, kept in their
 * own file so that design.ts only hands over to it. Text, JSON (--json) or the CSV run sheet.
 */
import { boxBehnken } from '../../core/design/box-behnken.ts';
import { centralComposite, type CentralCompositeSpec } from '../../core/design/central-composite.ts';
import { parseAxialDistance } from '../../core/design/axial-distance.ts';
import { plannedSetting } from '../../core/design/planned-settings.ts';
import type { SecondOrderPlan } from '../../core/design/second-order-plan.ts';
import { InputError } from '../../core/errors.ts';
import { runSheetCsv } from '../../io/csv/run-sheet.ts';
import { parseCommandArgs } from '../args.ts';
import { num, table } from '../report/numbers.ts';
import type { Design } from '../../core/design/design.ts';
import type { FactorSpec } from '../../core/factor/factor.ts';

/** What this file takes from design.ts, handed in by it (so the two files do not import each other). */
export interface DesignHelpers {
  readonly parseFactorOption: (text: string) => FactorSpec;
  readonly designJson: (d: Design) => object;
}

export const SECOND_ORDER_USAGE = `Second-order designs (numeric factors only):
  --central-composite                     factorial part (full, or --fraction of resolution V or more),
                                          2k axial runs and center runs; 2 to 8 factors
  --axial-distance face|rotatable|orthogonal|NUMBER
                                          axial distance in coded units (default rotatable);
                                          orthogonal needs --blocks 2
  --blocks 2                              the factorial block and the axial block
  --center-runs N | N1,N2                 N in each block, or N1 (factorial block) and N2 (axial block)
  --box-behnken                           Box-Behnken design for 3 to 7 factors, every factor at
                                          low, center and high, no run on a corner of the cube`;

const OPTIONS = {
  factor: { type: 'string', multiple: true },
  'central-composite': { type: 'boolean' },
  'box-behnken': { type: 'boolean' },
  'axial-distance': { type: 'string' },
  fraction: { type: 'string' },
  'center-runs': { type: 'string' },
  blocks: { type: 'string' },
  'standard-order': { type: 'boolean' },
  seed: { type: 'string' },
  json: { type: 'boolean' },
  csv: { type: 'boolean' },
} as const;

/** True when the design arguments ask for a second-order design. */
export function isSecondOrderRequest(argv: readonly string[]): boolean {
  return argv.includes('--central-composite') || argv.includes('--box-behnken');
}

function whole(text: string, option: string): number {
  if (!/^\s*\d+\s*$/.test(text)) throw new InputError(`--${option} needs a whole number, got "${text}"`);
  return Number(text);
}

/**
 * Reads the second-order design options into a plan. Throws InputError for both design kinds,
 * options that do not apply (Box-Behnken with an axial distance, blocks or a fraction), two
 * center-run counts without --blocks 2, --seed with --standard-order, --json with --csv, and
 * whatever the core refuses. Example: secondOrderPlan(['--box-behnken', ...three factors], helpers).
 */
export function secondOrderPlan(argv: string[], helpers: DesignHelpers): { plan: SecondOrderPlan; format: 'text' | 'json' | 'csv' } {
  const { values, positionals } = parseCommandArgs(argv, OPTIONS);
  if (positionals.length > 0) throw new InputError(`design takes options only, got "${positionals.join(' ')}"`);
  if (values['central-composite'] && values['box-behnken']) throw new InputError('Choose one design: --central-composite or --box-behnken, not both');
  if (!values.factor || values.factor.length === 0) throw new InputError('design needs --factor options, such as --factor "Temperature (degC)=160:200"; got none');
  if (values.json && values.csv) throw new InputError('Choose one output: --json or --csv, not both');
  if (values['standard-order'] && values.seed !== undefined) throw new InputError(`--seed ${values.seed} only applies to a randomized order; drop --seed or --standard-order`);
  const factors = values.factor.map(helpers.parseFactorOption);
  const seed = values.seed === undefined ? undefined : whole(values.seed, 'seed');
  const order = { randomize: !values['standard-order'], ...(seed !== undefined ? { seed } : {}) };
  const format = values.json ? 'json' : values.csv ? 'csv' : 'text';
  if (values['box-behnken']) {
    for (const o of ['axial-distance', 'blocks', 'fraction'] as const) {
      if (values[o] !== undefined) throw new InputError(`--${o} does not apply to a Box-Behnken design`);
    }
    const c = values['center-runs'];
    return { plan: boxBehnken({ factors, ...(c !== undefined ? { centerRuns: whole(c, 'center-runs') } : {}), ...order }), format };
  }
  const blocks = values.blocks === undefined ? 1 : whole(values.blocks, 'blocks');
  let centerRuns: CentralCompositeSpec['centerRuns'];
  const c = values['center-runs'];
  if (c !== undefined) {
    const parts = c.split(',');
    if (parts.length === 2) {
      if (blocks !== 2) throw new InputError(`--center-runs ${c} gives two counts (factorial block, axial block) and needs --blocks 2`);
      centerRuns = [whole(parts[0], 'center-runs'), whole(parts[1], 'center-runs')];
    } else if (parts.length === 1) centerRuns = whole(parts[0], 'center-runs');
    else throw new InputError(`--center-runs takes N or N1,N2, got "${c}"`);
  }
  const spec: CentralCompositeSpec = {
    factors,
    blocks,
    ...(values.fraction !== undefined ? { fraction: values.fraction } : {}),
    ...(values['axial-distance'] !== undefined ? { axialDistance: parseAxialDistance(values['axial-distance']) } : {}),
    ...(centerRuns !== undefined ? { centerRuns } : {}),
    ...order,
  };
  return { plan: centralComposite(spec), format };
}

/** The plan's properties as JSON: what a person compares before committing. */
export function secondOrderPropertiesJson(plan: SecondOrderPlan): object {
  const p = plan.properties;
  return {
    kind: p.kind,
    runs: p.runs,
    alpha: p.alpha,
    rotatable: p.rotatable,
    blocks: p.blocks,
    blocksOrthogonal: p.blocksOrthogonal,
    fullQuadratic: p.fullQuadratic,
    spv: p.spv,
    axialSettings: p.axialSettings,
    warnings: p.warnings,
    caution: p.caution,
  };
}

/**
 * The plan in plain words: title, summary, factors with their settings at each level used, the
 * comparison figures, the runs in real units, the warnings with the caution, and the notes.
 */
export function secondOrderText(plan: SecondOrderPlan): string {
  const { design: d, properties: p } = plan;
  const out: string[] = [`Plan: ${p.kind} design, ${d.runs.length} runs`, '', d.summary, ''];
  out.push('Figures to compare designs');
  const facts: [string, string][] = [
    ['Runs', String(p.runs)],
    ['Axial distance', p.alpha === null ? '- (no axial runs)' : `${num(p.alpha)} (coded)`],
    ['Rotatable', p.rotatable ? 'yes' : 'no'],
    ['Blocks', p.blocks === 1 ? '1' : `${p.blocks}, ${p.blocksOrthogonal ? 'orthogonal' : 'not orthogonal'} to the second-order model`],
    ['Full second-order model', p.fullQuadratic ? 'estimable' : 'not estimable'],
    ['Scaled prediction variance', p.spv ? `${num(p.spv.center)} at the center; ${num(p.spv.axis)} at distance 1 on an axis, ${num(p.spv.diagonal)} on the diagonal` : '-'],
  ];
  const w = Math.max(...facts.map(([a]) => a.length));
  out.push(...facts.map(([a, b]) => `  ${a.padEnd(w)}  ${b}`), '');
  if (p.axialSettings.length > 0) {
    out.push('Axial settings (real units)');
    out.push(table(['Factor', 'at -alpha', 'at +alpha', 'outside the factorial range'], p.axialSettings.map((s) => [s.name + (s.unit ? ` (${s.unit})` : ''), num(s.low, 6), num(s.high, 6), s.outside ? 'yes' : 'no'])).replace(/^/gm, '  '));
    out.push('');
  }
  out.push('Runs');
  out.push(
    table(
      ['Run', 'Block', 'Kind', ...d.factors.map((f) => f.name)],
      d.runs.map((r) => [String(r.run), String(r.block), r.kind, ...d.factors.map((f, i) => { const v = plannedSetting(f, r.coded[i]); return typeof v === 'number' ? num(v, 6) : v; })]),
    ).replace(/^/gm, '  '),
  );
  if (p.warnings.length > 0) {
    out.push('', 'Warning');
    for (const x of p.warnings) out.push(`  - ${x}`);
    out.push('', 'Caution');
    for (const x of p.caution) out.push(`  - ${x}`);
  }
  const notes = d.notes.filter((n) => !p.warnings.includes(n) && !p.caution.includes(n));
  if (notes.length > 0) {
    out.push('', 'Notes');
    for (const n of notes) out.push(`  - ${n}`);
  }
  return out.join('\n');
}

/** Runs the second-order design request: text, JSON (the plan as design --json prints it, plus secondOrder) or the CSV run sheet. */
export function runSecondOrderDesign(argv: string[], helpers: DesignHelpers): string {
  const { plan, format } = secondOrderPlan(argv, helpers);
  if (format === 'json') return JSON.stringify({ ...helpers.designJson(plan.design), secondOrder: secondOrderPropertiesJson(plan) }, null, 2);
  if (format === 'csv') return runSheetCsv(plan.design);
  return secondOrderText(plan);
}
