/**
 * The one entry point from what a person asks for to a Design: a full factorial, a catalogue
 * fraction or a fraction from typed generators; optionally folded over, blocked, with center runs
 * and replicates; in randomised or standard order; with its defining relation, resolution,
 * word-length pattern, alias chains, block words, a plain-words summary and notes. Nothing is
 * built unless the whole request is valid.
 */
import { InputError } from '../errors.ts';
import { defineFactors, findFactor, type Factor, type FactorSpec } from '../factor/factor.ts';
import { termOrder } from '../model/term.ts';
import { defaultAliasOrder, designAliasChains } from './alias-structure.ts';
import { blockConfounded, blockOf, defaultBlocking, parseBlockWords } from './blocking.ts';
import { catalogueFraction } from './catalogue.ts';
import { centerSet, spreadOverBlocks } from './center-runs.ts';
import { definingRelation, resolution as resolutionOf, wordLengthPattern } from './defining-relation.ts';
import type { Design, DesignRun } from './design.ts';
import { foldPoints, foldRelation, separatedPairs, type Foldover } from './foldover.ts';
import { basicFactors, fractionalFactorial, parseFraction, type FactorialPoint } from './fractional.ts';
import { MAX_FULL_FACTORIAL_FACTORS } from './full-factorial.ts';
import { generatorWord, parseGenerators, type Generator } from './generators.ts';
import { drawSeed, MAX_SEED } from './random.ts';
import { plackettBurmanAliasing, plackettBurmanPoints, PLACKETT_BURMAN_SOURCE } from './plackett-burman.ts';
import { PARTIAL_ALIASING_NOTE, plackettBurmanSummary } from './plackett-burman-summary.ts';
import { orderRuns } from './run-order.ts';
import { checkRunLimit } from './run-limit.ts';
import { designSummary } from './summary.ts';
import { formatWord, lettersOf, type Word } from './word.ts';

export interface DesignSpec {
  readonly factors: readonly FactorSpec[];
  /** A fraction from the built-in catalogue: "1/2", "1/4", ... (not with `generators`). */
  readonly fraction?: string;
  /** Typed generators, e.g. ["E=ABCD", "F=-ABC"] (not with `fraction`). */
  readonly generators?: readonly string[];
  /** Center runs per replicate (each repeated at every combination of categorical levels). */
  readonly centerRuns?: number;
  /** Replicates of the whole design, 1 or more. */
  readonly replicates?: number;
  /** Blocks per replicate: 1, 2, 4 or 8. */
  readonly blocks?: number;
  /** Block words, one per doubling of blocks; the default comes from a table or a search. */
  readonly blockWords?: readonly string[];
  /** 'all' for the mirror image, or a factor (name or letter) whose signs are switched. */
  readonly foldover?: string;
  /** false keeps standard order; default true. */
  readonly randomise?: boolean;
  /** Seed of the randomised order; drawn and recorded when absent. */
  readonly seed?: number;
  /** Hard-to-change factors (names or letters) kept sorted within blocks. */
  readonly sortBy?: readonly string[];
  /** Longest effect listed in alias chains; default the larger of 3 and resolution - 1. */
  readonly aliasOrder?: number;
  /** A Plackett-Burman screening design of 12, 20 or 24 runs (not with a fraction, generators, blocks or a foldover). */
  readonly plackettBurman?: number;
}

function wholeAtLeast(v: number | undefined, min: number, what: string, dflt: number): number {
  if (v === undefined) return dflt;
  if (!Number.isInteger(v) || v < min) throw new InputError(`${what} must be a whole number, ${min} or more, got ${v}`);
  return v;
}

function factorIndex(factors: readonly Factor[], nameOrLetter: string, what: string): number {
  const f = findFactor(factors, nameOrLetter);
  if (!f) throw new InputError(`${what}: unknown factor "${nameOrLetter}" (factors: ${factors.map((x) => `${x.letter}=${x.name}`).join(', ')})`);
  return factors.indexOf(f);
}

/** Most factors of a fraction: the catalogue's range (up to 15 factors), kept for typed generators too. */
export const MAX_FRACTION_FACTORS = 15;

interface Point extends FactorialPoint {
  readonly half: number;
}

/**
 * Builds the Design for a spec. Cost: dominated by the runs (at most 1024) and, for blocked
 * fractions, a search over block words (under a second).
 * Throws InputError, with what was needed and what came, for: bad factors (see defineFactors);
 * one factor; both a fraction and generators; a full factorial of more than 10 factors or any
 * plan over 1024 runs; a fraction outside the catalogue; bad generators (see parseGenerators);
 * bad block counts or words (see parseBlockWords); center runs with only categorical factors; a
 * foldover of a full factorial; a seed with standard order; an unknown factor to sort by.
 * Example: buildDesign({factors: four numeric factors, fraction: '1/2', seed: 7}) -> 8 runs,
 * generators ["D=ABC"], definingRelation ["ABCD"], resolution 4.
 */
export function buildDesign(spec: DesignSpec): Design {
  const factors = defineFactors(spec.factors);
  const k = factors.length;
  const letters = lettersOf(factors);
  if (k < 2) throw new InputError(`A factorial design needs at least 2 factors, got ${k}`);
  if (spec.fraction !== undefined && spec.generators !== undefined) {
    throw new InputError('Give either a fraction (from the catalogue) or generators, not both');
  }
  const replicates = wholeAtLeast(spec.replicates, 1, 'Replicates', 1);
  const centerRuns = wholeAtLeast(spec.centerRuns, 0, 'Center runs', 0);
  const blocks = spec.blocks ?? (spec.blockWords && spec.blockWords.length > 0 ? 2 ** spec.blockWords.length : 1);
  if (![1, 2, 4, 8].includes(blocks)) throw new InputError(`Blocks come in 1, 2, 4 or 8, got ${blocks}`);
  if (spec.blockWords && spec.blockWords.length > 0 && blocks === 1) throw new InputError('Block words need 2, 4 or 8 blocks; got 1 block');
  const randomise = spec.randomise ?? true;
  if (!randomise && spec.seed !== undefined) throw new InputError(`A seed only applies to a randomised run order; got seed ${spec.seed} with standard order`);
  if (spec.seed !== undefined && (!Number.isSafeInteger(spec.seed) || spec.seed < 0)) {
    throw new InputError(`A seed must be a whole number from 0 to ${MAX_SEED}, got ${spec.seed}`);
  }
  const sortBy = (spec.sortBy ?? []).map((s) => factorIndex(factors, s, 'Keep sorted'));
  if (new Set(sortBy).size !== sortBy.length) throw new InputError('Keep sorted: a factor is named twice');
  let fold: Foldover | null = null;
  if (spec.foldover !== undefined) fold = spec.foldover === 'all' ? 'all' : factorIndex(factors, spec.foldover, 'Foldover');
  const pb = spec.plackettBurman;
  if (pb !== undefined) {
    const other = [spec.fraction !== undefined && 'a fraction', spec.generators !== undefined && 'generators', blocks > 1 && 'blocks', fold !== null && 'a foldover'].filter(Boolean);
    if (other.length > 0) throw new InputError(`A Plackett-Burman design is a plan of its own; it does not take ${other.join(', ')}`);
  }
  const pbPoints = pb === undefined ? null : plackettBurmanPoints(pb, k);

  // Generators: typed, from the catalogue, or none (full factorial).
  const notes: string[] = [];
  let generators: Generator[] = [];
  if (spec.generators !== undefined) {
    generators = parseGenerators(spec.generators, factors);
  } else if (spec.fraction !== undefined) {
    const p = parseFraction(spec.fraction);
    const entry = catalogueFraction(k, p);
    generators = parseGenerators(entry.generators, factors);
    notes.push(`Generators from the minimum aberration catalogue (${entry.source}).`);
  } else if (pbPoints === null && k > MAX_FULL_FACTORIAL_FACTORS) {
    checkRunLimit(2 ** k, `A full factorial of ${k} factors: 2^${k} factorial runs`);
  }
  if (generators.length > 0 && k > MAX_FRACTION_FACTORS) {
    throw new InputError(`A fraction takes up to ${MAX_FRACTION_FACTORS} factors, got ${k}`);
  }
  const basic = basicFactors(k, generators);
  const perHalf = 2 ** basic.length;
  const factorialRuns = pbPoints ? pbPoints.length : perHalf * (fold === null ? 1 : 2);
  const centerSetSize = centerRuns > 0 ? centerSet(factors).length : 0;
  const centerPerReplicate = centerRuns * centerSetSize;
  checkRunLimit(
    (factorialRuns + centerPerReplicate) * replicates,
    `${factorialRuns} factorial${centerPerReplicate ? ` + ${centerPerReplicate} center` : ''} runs${replicates > 1 ? ` x ${replicates} replicates` : ''}`,
  );

  // Defining relation, foldover and blocks.
  const firstRelation: Word[] = definingRelation(generators.map(generatorWord));
  let relation = firstRelation;
  let foldWord: number | null = null;
  if (fold !== null) {
    const split = foldRelation(firstRelation, fold, k);
    relation = split.kept;
    foldWord = split.dropped[0].mask;
  }
  const blocking =
    spec.blockWords && spec.blockWords.length > 0
      ? { generators: parseBlockWords(spec.blockWords, blocks, factors, firstRelation, perHalf), source: 'the block words given' }
      : defaultBlocking(k, firstRelation, basic, blocks);
  const blockGenerators = [...blocking.generators, ...(foldWord === null ? [] : [foldWord])];
  const blocksPerReplicate = 2 ** blockGenerators.length;
  const blockWords = blockConfounded(blockGenerators, relation);

  // Factorial points of one replicate, then center runs spread over its blocks.
  const first = (pbPoints ?? fractionalFactorial(k, generators)).map((p) => ({ ...p, half: 0 }));
  const points: Point[] = fold === null ? first : [...first, ...foldPoints(first, fold).map((p) => ({ ...p, half: 1 }))];
  type Draft = { yates: number | null; replicate: number; block: number; kind: 'factorial' | 'center'; coded: readonly number[] };
  const perReplicate: Omit<Draft, 'replicate'>[] = points.map((p) => ({
    yates: p.yates,
    block: blocking.generators.length > 0 || foldWord !== null ? blockOf(p.coded, blocking.generators) + p.half * 2 ** blocking.generators.length : 0,
    kind: 'factorial',
    coded: p.coded,
  }));
  if (centerRuns > 0) {
    const set = centerSet(factors);
    spreadOverBlocks(centerRuns, blocksPerReplicate).forEach((n, b) => {
      for (let i = 0; i < n; i++) for (const row of set) perReplicate.push({ yates: null, block: b, kind: 'center', coded: row });
    });
  }
  const drafts: Draft[] = [];
  for (let r = 1; r <= replicates; r++) {
    for (const d of perReplicate) {
      drafts.push({ ...d, replicate: r, block: blocksPerReplicate > 1 ? (r - 1) * blocksPerReplicate + d.block + 1 : 1 });
    }
  }
  const seed = randomise ? spec.seed ?? drawSeed() : null;
  const ordered = orderRuns(drafts, { seed, sortBy });
  const runs: DesignRun[] = ordered.map((d, i) => ({ run: i + 1, yates: d.yates, replicate: d.replicate, block: d.block, originBlock: d.block, kind: d.kind, coded: [...d.coded] }));

  // What the design can and cannot separate.
  const res = resolutionOf(relation);
  const aliasOrder = spec.aliasOrder ?? defaultAliasOrder(res, k);
  if (!Number.isInteger(aliasOrder) || aliasOrder < 1) throw new InputError(`The longest effect in alias chains must be a whole number, 1 or more, got ${aliasOrder}`);
  const chains = pbPoints ? [] : designAliasChains(relation, k, aliasOrder);

  // Notes.
  if (blocking.generators.length > 0) notes.push(`Block words: ${blocking.generators.map((w) => formatWord(w, letters)).join(', ')}, from ${blocking.source}.`);
  if (fold !== null) {
    const pairs = separatedPairs(firstRelation, relation, k);
    const what = fold === 'all' ? 'the mirror image of the first fraction (every sign switched)' : `the first fraction with the signs of ${letters[fold]} (${factors[fold].name}) switched`;
    const shown = pairs.slice(0, 12).map(([u, v]) => `${formatWord(u, letters)} from ${formatWord(v, letters)}`);
    notes.push(
      `Foldover: runs ${perHalf + 1} to ${2 * perHalf} in standard order are ${what}, run as ${blocksPerReplicate > 2 ? 'separate blocks' : 'a separate block'}. ` +
        (pairs.length === 0
          ? 'It separates no pair of main effects and two-factor interactions'
          : `The combined design separates ${shown.join(', ')}${pairs.length > 12 ? ` and ${pairs.length - 12} more pairs` : ''}`) +
        `; the dropped defining words (${formatWord(foldWord!, letters)} and its aliases) are confounded with the halves.`,
    );
  }
  if (centerRuns > 0) {
    const cats = factors.filter((f) => f.kind === 'categorical');
    if (cats.length > 0) {
      notes.push(
        `Center runs: numeric factors at the middle of their ranges; ${cats.map((f) => f.name).join(', ')} ${cats.length === 1 ? 'has' : 'have'} no middle, so each center run is repeated at every combination of ${cats.length === 1 ? 'its levels' : 'their levels'} (${centerRuns} center run${centerRuns === 1 ? '' : 's'} become${centerRuns === 1 ? 's' : ''} ${centerRuns * centerSetSize} per replicate).`,
      );
    }
    if (blocksPerReplicate > 1 && centerRuns % blocksPerReplicate !== 0) {
      notes.push(`Center runs: ${centerRuns} do not divide evenly over ${blocksPerReplicate} blocks; the first blocks get one more.`);
    }
  }
  const blocked2fi = blockWords.filter((w) => termOrder(w) <= 2);
  if (blocked2fi.length > 0) {
    notes.push(`Warning: the two-factor interaction${blocked2fi.length === 1 ? '' : 's'} ${blocked2fi.map((w) => formatWord(w, letters)).join(', ')} ${blocked2fi.length === 1 ? 'is' : 'are'} confounded with blocks.`);
  }
  if (seed === null) {
    notes.push(
      'Standard order kept. Randomising the run order protects the effects from drifts during the experiment (tool wear, room temperature, a new batch of material): in standard order a drift is mistaken for the effect of the factors that change least often.',
    );
  } else if (spec.seed === undefined) {
    notes.push(`Seed ${seed} was drawn for this plan and is recorded with it: the same seed gives the same run order on any device.`);
  }
  if (sortBy.length > 0) {
    const names = sortBy.map((i) => factors[i].name);
    notes.push(
      `Warning: ${names.join(', ')} ${names.length === 1 ? 'is' : 'are'} kept sorted (hard to change), so the runs are not fully randomised and the design has become a split-plot. ` +
        `An analysis that treats it as completely randomised understates the error for ${names.join(', ')} (and ${names.length === 1 ? 'its' : 'their'} interactions), so ${names.length === 1 ? 'its effect looks' : 'their effects look'} more certain than ${names.length === 1 ? 'it is' : 'they are'}.`,
    );
  }

  if (pb !== undefined) {
    notes.push(`Generating row from ${PLACKETT_BURMAN_SOURCE}; the factors take the first ${k} of its ${pb - 1} columns.`);
    if (k >= 3) notes.push(PARTIAL_ALIASING_NOTE);
  }
  const summary =
    pb !== undefined
      ? plackettBurmanSummary({
          factorialRuns,
          factors: k,
          totalRuns: runs.length,
          centerRuns: centerPerReplicate,
          replicates,
          seed,
          largestCorrelation: k < 3 ? null : Math.max(...plackettBurmanAliasing(pb, k).map((a) => Math.abs(a.correlation))),
        })
      : designSummary({
    letters,
    totalRuns: runs.length,
    factorialRuns,
    centerRuns: centerPerReplicate,
    replicates,
    blocks: blocksPerReplicate,
    resolution: res,
    chains,
    blockWords,
    seed,
    folded: fold !== null,
  });

  return {
    factors,
    runs,
    generators: generators.map((g) => g.text),
    definingRelation: relation.map((w) => formatWord(w, letters)),
    resolution: res,
    wordLengths: wordLengthPattern(relation),
    aliases: chains.map((c) => c.map((w) => formatWord(w, letters))),
    blockWords: blockWords.map((w) => formatWord(w, letters)),
    seed,
    summary,
    notes,
    ...(pb !== undefined ? { screening: { kind: 'plackett-burman' as const, runs: pb, source: PLACKETT_BURMAN_SOURCE } } : {}),
  };
}
