/**
 * A foldover planned as an added block of a study already made: the runs of its fraction with
 * every sign switched (the mirror image) or with one factor's signs switched, and what the
 * combined runs separate, worked out before anything is written.
 * The defining relation the plan has now is read from its runs, not assumed: a word of the
 * study's own relation is still in it when its column is constant over every factorial run of
 * the plan (added blocks included), so a study folded once already is folded again correctly.
 * The words that flip are confounded with the new block, which is why the folded runs are a block
 * of their own (Box, Hunter and Hunter, Statistics for Experimenters, 2nd ed., section 6.8;
 * Montgomery, Design and Analysis of Experiments, 8th ed., section 8.6).
 */
import { InputError } from '../errors.ts';
import { designAliasChains, definingWordsOf, defaultAliasOrder } from '../design/alias-structure.ts';
import { blockConfounded } from '../design/blocking.ts';
import { resolution as resolutionOf } from '../design/defining-relation.ts';
import type { DesignNote, SummaryInput } from '../design/design-note.ts';
import { foldPoints, separatedPairs, type Foldover } from '../design/foldover.ts';
import { drawSeed, MAX_SEED } from '../design/random.ts';
import { orderRuns } from '../design/run-order.ts';
import { formatWord, lettersOf, parseLetterWord, type Word } from '../design/word.ts';
import { termFactors } from '../model/term.ts';
import type { RunToAdd } from './added-block.ts';
import type { StudyPlan } from './study.ts';

export interface FoldoverBlockPlan {
  readonly fold: Foldover;
  /** The folded runs (kind factorial, standard-order index after the first fraction's), in run order. */
  readonly runs: readonly RunToAdd[];
  /** The seed of the folded runs' order, recorded in the block's note. */
  readonly seed: number;
  /** The defining relation before and after, in letters ("ABCD", "-ACE"). */
  readonly relationBefore: readonly string[];
  readonly relationAfter: readonly string[];
  readonly resolutionBefore: number | null;
  /** Null when the combined runs are a full factorial. */
  readonly resolutionAfter: number | null;
  /** The combined runs' alias chains of main effects and two-factor interactions, in letters. */
  readonly aliasesAfter: readonly (readonly string[])[];
  /** The foldover's facts, written into a sentence by core/text/design-text.ts. */
  readonly note: Extract<DesignNote, { kind: 'foldover' }>;
  /** The combined plan's facts, written into its summary by core/text/design-text.ts. */
  readonly summary: SummaryInput;
}

/** The product of a word's columns at a coded point (the word's sign there). */
function columnAt(mask: number, coded: readonly number[]): number {
  let p = 1;
  for (const i of termFactors(mask)) p *= coded[i];
  return p;
}

/**
 * The words of the study's defining relation that still hold on every factorial run of the plan
 * (see the file comment). Cost O(words x runs x k).
 * Example: a 2^(4-1) with I = ABCD and no foldover -> [ABCD]; after its mirror image -> [ABCD]
 * (even length, unchanged); after folding on D -> [].
 */
export function relationOfRuns(plan: StudyPlan): Word[] {
  const factorial = plan.design.runs.filter((r) => r.kind === 'factorial');
  return definingWordsOf({ factors: plan.factors, definingRelation: plan.design.definingRelation }).filter((w) =>
    factorial.every((r) => columnAt(w.mask, r.coded) === w.sign),
  );
}

/**
 * Plans a foldover block for a study (its plan with the blocks added so far): the distinct
 * factorial points of the plan, folded (foldPoints), in an order shuffled by the seed; with the
 * relation, resolution and alias chains of all the factorial runs together and the pairs of main
 * effects and two-factor interactions it separates. Cost O(N k) plus the alias chains.
 * Throws InputError, saying what to do instead, for: a screening design with no defining
 * relation; a plan with no factorial runs; a full factorial (nothing aliased); a fold that
 * switches no defining word (the mirror image of a fraction whose words all have even length,
 * or a factor in no word); a bad seed.
 * Example: a 2^(3-1) with I = ABC, folded 'all' -> 4 runs at the switched signs, relation after
 * [], resolution after null (a full 2^3), separating A from BC, B from AC and C from AB.
 */
export function planFoldoverBlock(plan: StudyPlan, fold: Foldover, seed?: number): FoldoverBlockPlan {
  const { factors, design, title } = plan;
  const k = factors.length;
  const letters = lettersOf(factors);
  if (fold !== 'all' && (!Number.isInteger(fold) || fold < 0 || fold >= k)) throw new InputError(`Choose the mirror image or one of the ${k} factors to fold on`);
  if (design.screening) throw new InputError(`"${title}" is a screening design with no defining relation: a foldover here is not built in. Plan a new study of the factors that mattered instead.`);
  const factorial = design.runs.filter((r) => r.kind === 'factorial');
  if (factorial.length === 0) throw new InputError(`"${title}" has no factorial runs to fold over`);
  const before = relationOfRuns(plan);
  if (before.length === 0) {
    throw new InputError(`"${title}" already separates every effect (its factorial runs form a full factorial): a foldover would only repeat runs. Add replicates or center runs instead if you need more runs.`);
  }
  const flips = (w: Word) => (fold === 'all' ? termFactors(w.mask).length % 2 === 1 : ((w.mask >> fold) & 1) === 1);
  const kept = before.filter((w) => !flips(w));
  const dropped = before.filter(flips);
  if (dropped.length === 0) {
    throw new InputError(
      fold === 'all'
        ? `Every word of the defining relation of "${title}" has an even number of letters, so the mirror image would repeat the same runs. Fold on one factor instead.`
        : `No word of the defining relation of "${title}" contains ${letters[fold]} (${factors[fold].name}), so switching its signs would repeat the same runs. Fold on a factor that appears in a word: ${[...new Set(before.flatMap((w) => termFactors(w.mask)))].map((i) => letters[i]).join(', ')}.`,
    );
  }
  if (seed !== undefined && (!Number.isSafeInteger(seed) || seed < 0 || seed > MAX_SEED)) throw new InputError(`A seed must be a whole number from 0 to ${MAX_SEED}, got ${seed}`);

  // The distinct factorial points, in standard order (a replicated plan is folded once).
  const seen = new Set<string>();
  const points = [...factorial]
    .sort((a, b) => (a.standardOrder ?? Infinity) - (b.standardOrder ?? Infinity) || a.run - b.run)
    .filter((r) => {
      const key = r.coded.join(',');
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    })
    .map((r, i) => ({ standardOrder: i + 1, coded: r.coded }));
  const n = points.length;
  const drawn = seed ?? drawSeed();
  const folded = orderRuns(foldPoints(points, fold).map((p) => ({ ...p, block: 0 })), { seed: drawn });
  const runs: RunToAdd[] = folded.map((p) => ({ kind: 'factorial', standardOrder: p.standardOrder, coded: p.coded }));

  const resAfter = resolutionOf(kept);
  const chains = designAliasChains(kept, k, defaultAliasOrder(resAfter, k));
  const oldBlockWords = design.blockWords.map((w) => parseLetterWord(w, letters).mask);
  // The old block words are already closed under products; repeats and I drop out.
  const blockWords = [...new Set(blockConfounded([...oldBlockWords, dropped[0].mask], kept))].filter((w) => w !== 0);
  const blocks = new Set(design.runs.map((r) => r.block)).size + 1;
  const centers = design.runs.filter((r) => r.kind === 'center').length;
  return {
    fold,
    runs,
    seed: drawn,
    relationBefore: before.map((w) => formatWord(w, letters)),
    relationAfter: kept.map((w) => formatWord(w, letters)),
    resolutionBefore: resolutionOf(before),
    resolutionAfter: resAfter,
    aliasesAfter: chains.map((c) => c.map((w) => formatWord(w, letters))),
    note: {
      kind: 'foldover',
      fold: fold === 'all' ? 'all' : { letter: letters[fold], name: factors[fold].name },
      from: n + 1,
      to: 2 * n,
      severalBlocks: false,
      separated: separatedPairs(before, kept, k).map(([u, v]) => [formatWord(u, letters), formatWord(v, letters)] as const),
      droppedWord: formatWord(dropped[0], letters),
    },
    summary: {
      letters,
      totalRuns: design.runs.length + runs.length,
      factorialRuns: factorial.length + runs.length,
      centerRuns: centers,
      replicates: 1,
      blocks,
      resolution: resAfter,
      chains,
      blockWords,
      seed: drawn,
      folded: true,
    },
  };
}
