/**
 * Central composite designs (Box and Wilson 1951, Journal of the Royal Statistical Society B 13,
 * 1-45; Montgomery, Design and Analysis of Experiments, 8th ed., section 11.4.1) for 2 to 8
 * numeric factors: a two-level factorial part (a full factorial, or a catalog fraction of
 * resolution V or more, so that every two-factor interaction is clear of every other), 2k axial
 * runs at plus and minus alpha on each axis, and center runs. With two blocks the factorial part
 * and the axial part are separate blocks, each with its own center runs.
 */
import type { DesignNote } from './design-note.ts';
import { designNoteText } from '../text/design-text.ts';
import { InputError } from '../errors.ts';
import { defineFactors, type FactorSpec, type NumericFactor } from '../factor/factor.ts';
import { axialDistance, type AxialDistance } from './axial-distance.ts';
import { catalogFraction } from './catalog.ts';
import { definingRelation, resolution as resolutionOf, romanResolution } from './defining-relation.ts';
import { fractionFields } from './fraction-fields.ts';
import type { Design, DesignRun, RunKind } from './design.ts';
import { fractionalFactorial, parseFraction } from './fractional.ts';
import { generatorWord, parseGenerators, type Generator } from './generators.ts';
import { drawSeed, MAX_SEED } from './random.ts';
import { orderRuns } from './run-order.ts';
import { secondOrderProperties, type SecondOrderPlan } from './second-order-plan.ts';
import { lettersOf } from './word.ts';

export const MIN_CCD_FACTORS = 2;
export const MAX_CCD_FACTORS = 8;

/** Center runs when none are asked for: 5 unblocked, 3 in each block. Common practice (Montgomery 8th ed., section 11.4.1: three to five center runs, from memory). */
export const DEFAULT_CCD_CENTER_RUNS = { unblocked: 5, perBlock: 3 } as const;

export interface CentralCompositeSpec {
  readonly factors: readonly FactorSpec[];
  /** Fraction of the factorial part from the catalog ("1/2", ...); default: a full factorial up to 4 factors, else the smallest catalog fraction of resolution V or more. */
  readonly fraction?: string;
  /** Default 'rotatable'. */
  readonly axialDistance?: AxialDistance;
  /** 1 (default) or 2: the factorial block and the axial block. */
  readonly blocks?: number;
  /** Center runs: one number (all of them unblocked, or in each block), or [factorial block, axial block]. */
  readonly centerRuns?: number | readonly [number, number];
  /** false keeps standard order; default true. */
  readonly randomize?: boolean;
  readonly seed?: number;
}

function whole(v: number, what: string): number {
  if (!Number.isInteger(v) || v < 0) throw new InputError(`${what} must be a whole number, 0 or more, got ${v}`);
  return v;
}

/** The factorial part's generators: the fraction asked for, or the default of the spec comment. */
function factorialGenerators(k: number, fraction: string | undefined, factors: readonly NumericFactor[]): { generators: Generator[]; source: string | null } {
  if (fraction !== undefined) {
    const p = parseFraction(fraction);
    const entry = catalogFraction(k, p);
    return { generators: parseGenerators(entry.generators, factors), source: entry.source };
  }
  if (k <= 4) return { generators: [], source: null };
  for (let p = 3; p >= 1; p--) {
    if (k - p < 3) continue;
    try {
      const entry = catalogFraction(k, p);
      const gens = parseGenerators(entry.generators, factors);
      const r = resolutionOf(definingRelation(gens.map(generatorWord)));
      if (r !== null && r >= 5) return { generators: gens, source: entry.source };
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
    }
  }
  return { generators: [], source: null };
}

/**
 * Builds a central composite design and its properties (see the file comment and
 * second-order-plan.ts). Run kinds are 'factorial', 'axial' and 'center'; axial and center runs
 * have no standard-order index. Cost O(N p^2) for the properties.
 * Throws InputError for fewer than 2 or more than 8 factors, a categorical factor, a fraction
 * of resolution below V, blocks other than 1 or 2, two center-run counts without two blocks,
 * 'orthogonal' without two blocks, a bad seed or a seed with standard order.
 * Example: centralComposite({ factors: two numeric factors, centerRuns: 5 }) -> 13 runs,
 * alpha 1.4142, rotatable (Montgomery 8th ed., Example 11.2's design).
 */
export function centralComposite(spec: CentralCompositeSpec): SecondOrderPlan {
  const factors = defineFactors(spec.factors);
  const k = factors.length;
  if (k < MIN_CCD_FACTORS || k > MAX_CCD_FACTORS) throw new InputError(`A central composite design takes ${MIN_CCD_FACTORS} to ${MAX_CCD_FACTORS} factors, got ${k}`);
  const cats = factors.filter((f) => f.kind !== 'numeric');
  if (cats.length > 0) {
    throw new InputError(`A central composite design needs numeric factors (axial runs go between and beyond the levels); ${cats.map((f) => f.name).join(', ')} ${cats.length === 1 ? 'is' : 'are'} categorical`);
  }
  const numeric = factors as NumericFactor[];
  const blocks = spec.blocks ?? 1;
  if (blocks !== 1 && blocks !== 2) throw new InputError(`A central composite design has 1 block or 2 (the factorial block and the axial block), got ${blocks}`);
  let nc0: number;
  let ns0: number;
  if (Array.isArray(spec.centerRuns)) {
    if (blocks !== 2) throw new InputError('Two center-run counts (factorial block, axial block) need 2 blocks');
    const pair = spec.centerRuns as readonly number[];
    if (pair.length !== 2) throw new InputError(`Center runs for two blocks come as two counts (factorial block, axial block), got ${pair.length}`);
    nc0 = whole(pair[0], 'Center runs in the factorial block');
    ns0 = whole(pair[1], 'Center runs in the axial block');
  } else if (blocks === 2) {
    nc0 = ns0 = whole((spec.centerRuns as number | undefined) ?? DEFAULT_CCD_CENTER_RUNS.perBlock, 'Center runs per block');
  } else {
    nc0 = whole((spec.centerRuns as number | undefined) ?? DEFAULT_CCD_CENTER_RUNS.unblocked, 'Center runs');
    ns0 = 0;
  }
  const randomize = spec.randomize ?? true;
  if (!randomize && spec.seed !== undefined) throw new InputError(`A seed only applies to a randomized run order; got seed ${spec.seed} with standard order`);
  if (spec.seed !== undefined && (!Number.isSafeInteger(spec.seed) || spec.seed < 0)) throw new InputError(`A seed must be a whole number from 0 to ${MAX_SEED}, got ${spec.seed}`);

  const { generators, source } = factorialGenerators(k, spec.fraction, numeric);
  const relation = definingRelation(generators.map(generatorWord));
  const res = resolutionOf(relation);
  const letters = lettersOf(factors);
  if (res !== null && res < 5) {
    throw new InputError(
      `A central composite design needs a factorial part of resolution V or more, so that two-factor interactions are clear of each other; the ${spec.fraction} fraction of ${k} factors is resolution ${romanResolution(res)}`,
    );
  }
  const cube = fractionalFactorial(k, generators);
  const F = cube.length;
  const ns = 2 * k;
  const alpha = axialDistance(spec.axialDistance ?? 'rotatable', k, F, blocks === 2 ? { nc: F, nc0, ns, ns0 } : undefined);

  type Draft = { standardOrder: number | null; block: number; kind: RunKind; coded: readonly number[] };
  const axialBlock = blocks === 2 ? 2 : 1;
  const drafts: Draft[] = cube.map((p) => ({ standardOrder: p.standardOrder, block: 1, kind: 'factorial', coded: p.coded }));
  for (let i = 0; i < nc0; i++) drafts.push({ standardOrder: null, block: 1, kind: 'center', coded: new Array<number>(k).fill(0) });
  for (let i = 0; i < k; i++) {
    for (const sgn of [-1, 1]) drafts.push({ standardOrder: null, block: axialBlock, kind: 'axial', coded: Array.from({ length: k }, (_, j) => (j === i ? sgn * alpha : 0)) });
  }
  for (let i = 0; i < ns0; i++) drafts.push({ standardOrder: null, block: 2, kind: 'center', coded: new Array<number>(k).fill(0) });
  const seed = randomize ? spec.seed ?? drawSeed() : null;
  const runs: DesignRun[] = orderRuns(drafts, { seed }).map((d, i) => ({ run: i + 1, standardOrder: d.standardOrder, replicate: 1, block: d.block, originBlock: d.block, kind: d.kind, coded: [...d.coded] }));

  const properties = secondOrderProperties('central composite', factors, runs, alpha);
  const alphaText = `${Number(alpha.toPrecision(4))}${spec.axialDistance === undefined || spec.axialDistance === 'rotatable' ? ' (rotatable)' : spec.axialDistance === 'face' ? ' (face-centred)' : spec.axialDistance === 'orthogonal' ? ' (orthogonal blocks)' : ''}`;
  const centers = blocks === 2 ? `${nc0} + ${ns0} center` : `${nc0} center`;
  const part = generators.length === 0 ? `2^${k} full factorial` : `2^(${k}-${generators.length}) fraction of resolution ${romanResolution(res!)}`;
  const summary =
    `${runs.length} runs (${F} factorial + ${ns} axial + ${centers}), a central composite design: a ${part}, axial distance ${alphaText}` +
    `${blocks === 2 ? ', in 2 blocks (factorial, axial)' : ''}; it estimates the full second-order model` +
    `${properties.rotatable ? ' and is rotatable' : ''}${properties.blocksOrthogonal === true ? '; its blocks are orthogonal to the model' : properties.blocksOrthogonal === false ? '; its blocks are not orthogonal to the model' : ''}. ` +
    (seed === null ? 'Standard order kept.' : `Run order randomized${blocks === 2 ? ' within blocks' : ''} (seed ${seed}).`);
  const noteFacts: DesignNote[] = [];
  if (source) noteFacts.push({ kind: 'factorial-part-source', source });
  noteFacts.push(...properties.warningFacts);
  if (properties.warningFacts.length > 0) noteFacts.push({ kind: 'standing-caution' });
  if (seed !== null && spec.seed === undefined) noteFacts.push({ kind: 'seed-drawn', seed });
  const notes = noteFacts.map(designNoteText);
  const design: Design = {
    factors,
    runs,
    ...fractionFields(generators, relation, letters),
    aliases: [],
    blockWords: [],
    seed,
    summary,
    notes,
    noteFacts,
    foldover: null,
  };
  return { design, properties };
}
