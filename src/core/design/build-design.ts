/**
 * The one entry point from what a person asks for to a Design: a full factorial, a catalog
 * fraction or a fraction from typed generators; optionally folded over, blocked, with center runs
 * and replicates; in randomized or standard order; with its defining relation, resolution,
 * word-length pattern, alias chains, block words, a plain-words summary and notes. Nothing is
 * built unless the whole request is valid.
 */
import { InputError } from '../errors.ts';
import { defineFactors, findFactor, type Factor, type FactorSpec } from '../factor/factor.ts';
import { termOrder } from '../model/term.ts';
import { defaultAliasOrder, designAliasChains } from './alias-structure.ts';
import { blockConfounded, blockOf, defaultBlocking, parseBlockWords } from './blocking.ts';
import { catalogFraction } from './catalog.ts';
import { centerSet, spreadOverBlocks } from './center-runs.ts';
import { definingRelation, resolution as resolutionOf } from './defining-relation.ts';
import { fractionFields } from './fraction-fields.ts';
import type { Design, DesignRun } from './design.ts';
import { foldPoints, foldRelation, separatedPairs, type Foldover } from './foldover.ts';
import { basicFactors, fractionalFactorial, parseFraction, type FactorialPoint } from './fractional.ts';
import { MAX_FULL_FACTORIAL_FACTORS } from './full-factorial.ts';
import { MAX_DESIGN_FACTORS } from './max-design-factors.ts';
import { generatorWord, parseGenerators, type Generator } from './generators.ts';
import { drawSeed, MAX_SEED } from './random.ts';
import { plackettBurmanAliasing, plackettBurmanPoints, PLACKETT_BURMAN_SOURCE } from './plackett-burman.ts';
import { plackettBurmanSummary } from '../text/screening-text.ts';
import { orderRuns } from './run-order.ts';
import { checkRunLimit } from './run-limit.ts';
import { formatWord, lettersOf, type Word } from './word.ts';
import type { DesignNote } from './design-note.ts';
import { designNoteText, designSummary } from '../text/design-text.ts';

export interface DesignSpec {
  readonly factors: readonly FactorSpec[];
  /** A fraction from the built-in catalog: "1/2", "1/4", ... (not with `generators`). */
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
  readonly randomize?: boolean;
  /** Seed of the randomized order; drawn and recorded when absent. */
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

interface Point extends FactorialPoint {
  readonly half: number;
}

/**
 * Builds the Design for a spec. Cost: dominated by the runs (at most 1024) and, for blocked
 * fractions, a search over block words (under a second).
 * Throws InputError, with what was needed and what came, for: bad factors (see defineFactors);
 * one factor; both a fraction and generators; a full factorial of more than 10 factors or any
 * plan over 1024 runs; a fraction outside the catalog; bad generators (see parseGenerators);
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
    throw new InputError('Give either a fraction (from the catalog) or generators, not both');
  }
  const replicates = wholeAtLeast(spec.replicates, 1, 'Replicates', 1);
  const centerRuns = wholeAtLeast(spec.centerRuns, 0, 'Center runs', 0);
  const blocks = spec.blocks ?? (spec.blockWords && spec.blockWords.length > 0 ? 2 ** spec.blockWords.length : 1);
  if (![1, 2, 4, 8].includes(blocks)) throw new InputError(`Blocks come in 1, 2, 4 or 8, got ${blocks}`);
  if (spec.blockWords && spec.blockWords.length > 0 && blocks === 1) throw new InputError('Block words need 2, 4 or 8 blocks; got 1 block');
  const randomize = spec.randomize ?? true;
  if (!randomize && spec.seed !== undefined) throw new InputError(`A seed only applies to a randomized run order; got seed ${spec.seed} with standard order`);
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

  // Generators: typed, from the catalog, or none (full factorial).
  const notes: DesignNote[] = [];
  let generators: Generator[] = [];
  if (spec.generators !== undefined) {
    generators = parseGenerators(spec.generators, factors);
  } else if (spec.fraction !== undefined) {
    const p = parseFraction(spec.fraction);
    const entry = catalogFraction(k, p);
    generators = parseGenerators(entry.generators, factors);
    notes.push({ kind: 'catalog-generators', source: entry.source });
  } else if (pbPoints === null && k > MAX_FULL_FACTORIAL_FACTORS) {
    checkRunLimit(2 ** k, `A full factorial of ${k} factors: 2^${k} factorial runs`);
  }
  if (generators.length > 0 && k > MAX_DESIGN_FACTORS) {
    throw new InputError(`A fraction takes up to ${MAX_DESIGN_FACTORS} factors, got ${k}`);
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
      ? { generators: parseBlockWords(spec.blockWords, blocks, factors, firstRelation, perHalf), origin: { kind: 'given' } as const }
      : defaultBlocking(k, firstRelation, basic, blocks);
  const blockGenerators = [...blocking.generators, ...(foldWord === null ? [] : [foldWord])];
  const blocksPerReplicate = 2 ** blockGenerators.length;
  const blockWords = blockConfounded(blockGenerators, relation);

  // Factorial points of one replicate, then center runs spread over its blocks.
  const first = (pbPoints ?? fractionalFactorial(k, generators)).map((p) => ({ ...p, half: 0 }));
  const points: Point[] = fold === null ? first : [...first, ...foldPoints(first, fold).map((p) => ({ ...p, half: 1 }))];
  type UnorderedRun = { standardOrder: number | null; replicate: number; block: number; kind: 'factorial' | 'center'; coded: readonly number[] };
  const perReplicate: Omit<UnorderedRun, 'replicate'>[] = points.map((p) => ({
    standardOrder: p.standardOrder,
    block: blocking.generators.length > 0 || foldWord !== null ? blockOf(p.coded, blocking.generators) + p.half * 2 ** blocking.generators.length : 0,
    kind: 'factorial',
    coded: p.coded,
  }));
  if (centerRuns > 0) {
    const set = centerSet(factors);
    spreadOverBlocks(centerRuns, blocksPerReplicate).forEach((n, b) => {
      for (let i = 0; i < n; i++) for (const row of set) perReplicate.push({ standardOrder: null, block: b, kind: 'center', coded: row });
    });
  }
  const unordered: UnorderedRun[] = [];
  for (let r = 1; r <= replicates; r++) {
    for (const d of perReplicate) {
      unordered.push({ ...d, replicate: r, block: blocksPerReplicate > 1 ? (r - 1) * blocksPerReplicate + d.block + 1 : 1 });
    }
  }
  const seed = randomize ? spec.seed ?? drawSeed() : null;
  const ordered = orderRuns(unordered, { seed, sortBy });
  const runs: DesignRun[] = ordered.map((d, i) => ({ run: i + 1, standardOrder: d.standardOrder, replicate: d.replicate, block: d.block, originBlock: d.block, kind: d.kind, coded: [...d.coded] }));

  // What the design can and cannot separate.
  const res = resolutionOf(relation);
  const aliasOrder = spec.aliasOrder ?? defaultAliasOrder(res, k);
  if (!Number.isInteger(aliasOrder) || aliasOrder < 1) throw new InputError(`The longest effect in alias chains must be a whole number, 1 or more, got ${aliasOrder}`);
  const chains = pbPoints ? [] : designAliasChains(relation, k, aliasOrder);

  // Notes.
  if (blocking.generators.length > 0) notes.push({ kind: 'block-words', words: blocking.generators.map((w) => formatWord(w, letters)), origin: blocking.origin });
  if (fold !== null) {
    notes.push({
      kind: 'foldover',
      fold: fold === 'all' ? 'all' : { letter: letters[fold], name: factors[fold].name },
      from: perHalf + 1,
      to: 2 * perHalf,
      severalBlocks: blocksPerReplicate > 2,
      separated: separatedPairs(firstRelation, relation, k).map(([u, v]) => [formatWord(u, letters), formatWord(v, letters)] as const),
      droppedWord: formatWord(foldWord!, letters),
    });
  }
  if (centerRuns > 0) {
    const cats = factors.filter((f) => f.kind === 'categorical');
    if (cats.length > 0) notes.push({ kind: 'center-categorical', factors: cats.map((f) => f.name), centerRuns, perReplicate: centerRuns * centerSetSize });
    if (blocksPerReplicate > 1 && centerRuns % blocksPerReplicate !== 0) notes.push({ kind: 'center-uneven', centerRuns, blocks: blocksPerReplicate });
  }
  const blocked2fi = blockWords.filter((w) => termOrder(w) <= 2);
  if (blocked2fi.length > 0) notes.push({ kind: 'blocked-two-factor', words: blocked2fi.map((w) => formatWord(w, letters)) });
  if (seed === null) notes.push({ kind: 'standard-order' });
  else if (spec.seed === undefined) notes.push({ kind: 'seed-drawn', seed });
  if (sortBy.length > 0) notes.push({ kind: 'split-plot', factors: sortBy.map((i) => factors[i].name) });

  if (pb !== undefined) {
    notes.push({ kind: 'screening-generator', source: PLACKETT_BURMAN_SOURCE, factors: k, columns: pb - 1 });
    if (k >= 3) notes.push({ kind: 'partial-aliasing' });
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
    ...fractionFields(generators, relation, letters),
    aliases: chains.map((c) => c.map((w) => formatWord(w, letters))),
    blockWords: blockWords.map((w) => formatWord(w, letters)),
    seed,
    summary,
    notes: notes.map(designNoteText),
    noteFacts: notes,
    foldover: fold === null ? null : fold === 'all' ? 'all' : letters[fold],
    ...(pb !== undefined ? { screening: { kind: 'plackett-burman' as const, runs: pb, source: PLACKETT_BURMAN_SOURCE } } : {}),
  };
}
