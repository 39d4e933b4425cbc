/**
 * The plain-words summary a person reads before committing to a plan: how many runs, what kind
 * of design, what its resolution means for the effects they care about (main effects and
 * two-factor interactions), what is confounded with blocks, and how the runs are ordered.
 * Resolution phrases follow the usual reading of resolution III, IV and V (Box and Hunter 1961,
 * Technometrics 3, 311-351; Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2).
 */
import { InputError } from '../errors.ts';
import { termOrder } from '../model/term.ts';
import { romanResolution } from './defining-relation.ts';
import { formatWord, type Word } from './word.ts';

export interface SummaryInput {
  readonly letters: readonly string[];
  readonly totalRuns: number;
  readonly factorialRuns: number;
  readonly centerRuns: number;
  readonly replicates: number;
  /** Blocks per replicate (1 when unblocked). */
  readonly blocks: number;
  readonly resolution: number | null;
  /** Alias chains of the main effects and two-factor interactions, shortest word first. */
  readonly chains: readonly (readonly Word[])[];
  /** One word per alias set confounded with blocks. */
  readonly blockWords: readonly number[];
  readonly seed: number | null;
  readonly folded: boolean;
}

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
 * CD; AC with BD; AD with BC. Run order randomised (seed 7)."
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
  text += s.seed === null ? ' Standard order kept.' : ` Run order randomised${s.blocks > 1 ? ' within blocks' : ''} (seed ${s.seed}).`;
  return text;
}
