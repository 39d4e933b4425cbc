/**
 * Foldover: a second fraction with signs switched, run after (or with) the first to break
 * aliases. The full mirror image switches every sign: words of odd length change sign, so in the
 * combined design they drop out of the defining relation and main effects are freed of
 * two-factor interactions. Switching one factor's signs drops every word containing that factor,
 * freeing that factor's main effect and its two-factor interactions (Box, Hunter and Hunter,
 * 2nd ed., section 6.8; Montgomery, Design and Analysis of Experiments, 8th ed., section 8.6).
 * The words that drop out are confounded with the difference between the two halves, so the
 * halves are treated as blocks.
 */
import { InputError } from '../errors.ts';
import { termOrder } from '../model/term.ts';
import type { FactorialPoint } from './fractional.ts';
import type { Word } from './word.ts';

/** 'all': every sign switched (the mirror image); a number: only that factor's signs. */
export type Foldover = 'all' | number;

function flips(fold: Foldover, mask: number): boolean {
  return fold === 'all' ? termOrder(mask) % 2 === 1 : ((mask >> fold) & 1) === 1;
}

function checkFold(fold: Foldover, k: number): void {
  if (fold !== 'all' && (!Number.isInteger(fold) || fold < 0 || fold >= k)) {
    throw new InputError(`A foldover switches every factor or one factor of the ${k}, got factor ${String(fold)}`);
  }
}

/**
 * The folded points: each point with the chosen signs switched, numbered after the originals
 * (standard-order index N + i). Throws InputError for an unknown factor or no points.
 * Example: foldPoints([{standardOrder:1, coded:[-1,-1,1]}], 'all') -> [{standardOrder:2, coded:[1,1,-1]}].
 */
export function foldPoints(points: readonly FactorialPoint[], fold: Foldover): FactorialPoint[] {
  if (points.length === 0) throw new InputError('A foldover needs the runs of a first fraction, got none');
  const k = points[0].coded.length;
  checkFold(fold, k);
  const n = points.length;
  return points.map((p) => ({
    standardOrder: n + p.standardOrder,
    coded: p.coded.map((x, i) => (fold === 'all' || i === fold ? -x : x)),
  }));
}

/**
 * Splits a defining relation by a foldover: `kept` words keep their sign in the folded half and
 * form the combined design's defining relation; `dropped` words change sign and are confounded
 * with the halves. Throws InputError for an unknown factor, and for a full factorial (nothing to
 * break).
 * Example: 2^(3-1) with I = ABC folded 'all' -> kept [], dropped [ABC].
 */
export function foldRelation(relation: readonly Word[], fold: Foldover, k: number): { kept: Word[]; dropped: Word[] } {
  checkFold(fold, k);
  if (relation.length === 0) throw new InputError('A full factorial has no aliases to break; a foldover applies to a fraction');
  const kept = relation.filter((w) => !flips(fold, w.mask));
  const dropped = relation.filter((w) => flips(fold, w.mask));
  if (dropped.length === 0) {
    throw new InputError(
      fold === 'all'
        ? 'Every defining word has even length, so the mirror image repeats the same fraction; fold on one factor instead'
        : `No defining word contains factor ${fold + 1}, so switching its signs repeats the same fraction`,
    );
  }
  return { kept, dropped };
}

/**
 * Pairs of low-order effects (main effects and two-factor interactions) that were aliased in the
 * first fraction and are separated in the combined design: u and v are aliased when u*v is a
 * defining word. Pairs come as [shorter, longer], in model order. Cost: (k + k(k-1)/2)^2 / 2 look-ups.
 * Throws InputError for fewer than 1 factor.
 * Example: 2^(3-1) with I = ABC folded 'all' -> [[A,BC], [B,AC], [C,AB]].
 */
export function separatedPairs(before: readonly Word[], after: readonly Word[], k: number): [number, number][] {
  if (!Number.isInteger(k) || k < 1) throw new InputError(`Separated pairs need 1 or more factors, got ${k}`);
  const b = new Set(before.map((w) => w.mask));
  const a = new Set(after.map((w) => w.mask));
  const low: number[] = [];
  for (let i = 0; i < k; i++) low.push(1 << i);
  for (let i = 0; i < k; i++) for (let j = i + 1; j < k; j++) low.push((1 << i) | (1 << j));
  const out: [number, number][] = [];
  for (let x = 0; x < low.length; x++) {
    for (let y = x + 1; y < low.length; y++) {
      const w = low[x] ^ low[y];
      if (b.has(w) && !a.has(w)) out.push([low[x], low[y]]);
    }
  }
  return out;
}
