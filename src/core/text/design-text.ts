/**
 * Every sentence the design builder writes about a plan, in one place: the plain-words summary
 * a person reads before committing to it, each typed note (core/design/design-note.ts) and
 * where the block words came from. The command line, the planning screen and the stored plan
 * take their words from here.
 * Summary: how many runs, what kind of design, what its resolution means for the effects people
 * care about (main effects and two-factor interactions), what is confounded with blocks, and how
 * the runs are ordered. Resolution phrases follow the usual reading of resolution III, IV and V
 * (Box and Hunter 1961, Technometrics 3, 311-351; Montgomery, Design and Analysis of
 * Experiments, 8th ed., section 8.2).
 */
import { InputError } from '../errors.ts';
import { termOrder } from '../model/term.ts';
import { MONTGOMERY_TABLE_SOURCE } from '../design/blocking.ts';
import { romanResolution } from '../design/defining-relation.ts';
import type { BlockOrigin, DesignNote, SummaryInput } from '../design/design-note.ts';
import { formatWord, type Word } from '../design/word.ts';
import { PARTIAL_ALIASING_NOTE } from './screening-text.ts';
import { CAUTION } from '../predict/caution.ts';
import { formatSetting } from '../predict/parse-settings.ts';

function list(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** How many alias chains the summary names before it says how many more there are (a design choice: one line on a phone). */
const SHOWN = 3;

function aliasExamples(chains: readonly (readonly Word[])[], order: number, letters: readonly string[]): string {
  const relevant = chains.filter((c) => termOrder(c[0].mask) === order && c.slice(1).some((w) => termOrder(w.mask) <= 2));
  const parts = relevant.slice(0, SHOWN).map((c, i) => {
    const others = c.slice(1).filter((w) => termOrder(w.mask) <= 2).map((w) => formatWord(w, letters));
    return `${formatWord(c[0], letters)}${i === 0 ? ' is aliased' : ''} with ${list(others)}`;
  });
  const more = relevant.length - SHOWN;
  return parts.join('; ') + (more > 0 ? `; and ${more} more such chain${more === 1 ? '' : 's'}` : '');
}

/**
 * The summary text. Throws InputError for a run count below 1.
 * Example: a 2^(4-1) with I = ABCD, 8 runs, seed 7 ->
 * "8 runs, resolution IV: main effects are clear of two-factor interactions; AB is aliased with
 * CD; AC with BD; AD with BC. Run order randomized (seed 7)."
 */
export function designSummary(s: SummaryInput): string {
  if (!(s.totalRuns >= 1)) throw new InputError(`A plan needs at least one run, got ${s.totalRuns}`);
  const head: string[] = [`${s.totalRuns} runs`];
  const detail: string[] = [];
  if (s.centerRuns > 0 || s.replicates > 1) {
    detail.push(`${s.factorialRuns} factorial${s.centerRuns > 0 ? ` + ${s.centerRuns} center` : ''}${s.replicates > 1 ? ` per replicate, ${s.replicates} replicates` : ''}`);
  }
  if (s.blocks > 1) detail.push(`${s.blocks * s.replicates} blocks`);
  let text = head[0] + (detail.length ? ` (${detail.join(', ')})` : '');
  if (s.resolution === null) {
    const blocked = s.blockWords.map((w) => formatWord(w, s.letters));
    text += `, a full factorial: every main effect and interaction is estimated on its own${blocked.length ? ` except ${list(blocked)}, confounded with blocks` : ''}`;
  } else {
    const r = s.resolution;
    text += `, resolution ${romanResolution(r)}${s.folded ? ' (with its foldover)' : ''}: `;
    if (r <= 2) text += 'some main effects are aliased with each other';
    else if (r === 3) text += `main effects are aliased with two-factor interactions: ${aliasExamples(s.chains, 1, s.letters) || 'see the chains'}`;
    else if (r === 4) {
      const ex = aliasExamples(s.chains, 2, s.letters);
      text += `main effects are clear of two-factor interactions${ex ? `; ${ex}` : ''}`;
    } else if (r === 5) text += 'main effects and two-factor interactions are clear of each other; two-factor interactions are aliased with three-factor interactions';
    else text += `main effects and two-factor interactions are clear of each other and of three-factor interactions (the shortest word has ${r} letters)`;
  }
  text += '.';
  if (s.blockWords.length > 0) {
    const words = s.blockWords.map((w) => formatWord(w, s.letters));
    if (s.resolution !== null) text += ` Confounded with blocks: ${list(words)} (with ${words.length === 1 ? 'its' : 'their'} aliases).`;
    const lowOrder = s.blockWords.filter((w) => termOrder(w) <= 2);
    if (lowOrder.length > 0) text += ` The two-factor interaction${lowOrder.length === 1 ? '' : 's'} ${list(lowOrder.map((w) => formatWord(w, s.letters)))} cannot be told from the block differences.`;
  }
  text += s.seed === null ? ' Standard order kept.' : ` Run order randomized${s.blocks > 1 ? ' within blocks' : ''} (seed ${s.seed}).`;
  return text;
}

/** The order in which the block-word search ranks candidates, in words. */
const SEARCH_CRITERION = 'fewest main effects (none), then fewest two-factor interactions, then fewest higher-order effects confounded with blocks';

/**
 * Where a plan's block words came from, in words. Cost O(1).
 * Example: blockOriginText({ kind: 'table' }) -> "Montgomery, Design and Analysis of Experiments, 8th ed., Table 7.8".
 */
export function blockOriginText(o: BlockOrigin): string {
  switch (o.kind) {
    case 'unblocked':
      return 'unblocked';
    case 'given':
      return 'the block words given';
    case 'table':
      return MONTGOMERY_TABLE_SOURCE;
    case 'highest-order':
      return `the ${o.k}-factor interaction, the highest-order effect (Montgomery, 8th ed., section 7.4)`;
    case 'minimum-aberration':
      return `the defining words of the minimum aberration 2^(${o.k}-${o.q}) fraction, found by exhaustive search`;
    case 'search':
      return o.stopped
        ? `a search for the block words with the ${SEARCH_CRITERION}, stopped after ${o.budget} candidates (the best found, not proven best)`
        : `exhaustive search: ${SEARCH_CRITERION}`;
  }
}

/** How many separated pairs a foldover note names before it says how many more (a design choice: a readable line). */
const PAIRS_SHOWN = 12;

const plural = (n: number, one: string, many: string) => (n === 1 ? one : many);

/**
 * One note about a plan as a sentence. Cost O(length of the note's lists).
 * Example: designNoteText({ kind: 'seed-drawn', seed: 7 }) ->
 * "Seed 7 was drawn for this plan and is recorded with it: the same seed gives the same run order on any device."
 */
export function designNoteText(n: DesignNote): string {
  switch (n.kind) {
    case 'catalog-generators':
      return `Generators from the minimum aberration catalog (${n.source}).`;
    case 'block-words':
      return `Block words: ${n.words.join(', ')}, from ${blockOriginText(n.origin)}.`;
    case 'foldover': {
      const what = n.fold === 'all' ? 'the mirror image of the first fraction (every sign switched)' : `the first fraction with the signs of ${n.fold.letter} (${n.fold.name}) switched`;
      const shown = n.separated.slice(0, PAIRS_SHOWN).map(([u, v]) => `${u} from ${v}`);
      return (
        `Foldover: runs ${n.from} to ${n.to} in standard order are ${what}, run as ${n.severalBlocks ? 'separate blocks' : 'a separate block'}. ` +
        (n.separated.length === 0
          ? 'It separates no pair of main effects and two-factor interactions'
          : `The combined design separates ${shown.join(', ')}${n.separated.length > PAIRS_SHOWN ? ` and ${n.separated.length - PAIRS_SHOWN} more pairs` : ''}`) +
        `; the dropped defining words (${n.droppedWord} and its aliases) are confounded with the halves.`
      );
    }
    case 'center-categorical': {
      const one = n.factors.length === 1;
      return `Center runs: numeric factors at the middle of their ranges; ${n.factors.join(', ')} ${one ? 'has' : 'have'} no middle, so each center run is repeated at every combination of ${one ? 'its levels' : 'their levels'} (${n.centerRuns} center run${plural(n.centerRuns, '', 's')} become${plural(n.centerRuns, 's', '')} ${n.perReplicate} per replicate).`;
    }
    case 'center-uneven':
      return `Center runs: ${n.centerRuns} do not divide evenly over ${n.blocks} blocks; the first blocks get one more.`;
    case 'blocked-two-factor':
      return `Warning: the two-factor interaction${plural(n.words.length, '', 's')} ${n.words.join(', ')} ${plural(n.words.length, 'is', 'are')} confounded with blocks.`;
    case 'standard-order':
      return 'Standard order kept. Randomizing the run order protects the effects from drifts during the experiment (tool wear, room temperature, a new batch of material): in standard order a drift is mistaken for the effect of the factors that change least often.';
    case 'seed-drawn':
      return `Seed ${n.seed} was drawn for this plan and is recorded with it: the same seed gives the same run order on any device.`;
    case 'screening-generator':
      return `Generating row from ${n.source}; the factors take the first ${n.factors} of its ${n.columns} columns.`;
    case 'partial-aliasing':
      return PARTIAL_ALIASING_NOTE;
    case 'factorial-part-source':
      return `Factorial part from the minimum aberration catalog (${n.source}).`;
    case 'box-behnken-table':
      return 'Rows from the table of Box and Behnken (1960), Technometrics 2, 455-475.';
    case 'axial-outside':
      return `Axial runs set ${n.name} to ${formatSetting(n.low, n.unit)} and ${formatSetting(n.high, n.unit)}, outside the factorial range ${formatSetting(n.factorialLow)} to ${formatSetting(n.factorialHigh, n.unit)}: check both are within the machine's rated limits before the runs are made.`;
    case 'standing-caution':
      return CAUTION.join(' ');
    case 'split-plot': {
      const names = n.factors.join(', ');
      const one = n.factors.length === 1;
      return (
        `Warning: ${names} ${one ? 'is' : 'are'} kept sorted (hard to change), so the runs are not fully randomized and the design has become a split-plot. ` +
        `An analysis that treats it as completely randomized understates the error for ${names} (and ${one ? 'its' : 'their'} interactions), so ${one ? 'its effect looks' : 'their effects look'} more certain than ${one ? 'it is' : 'they are'}.`
      );
    }
  }
}
