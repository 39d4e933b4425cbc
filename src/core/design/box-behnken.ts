/**
 * Box-Behnken designs for 3 to 7 numeric factors (Box and Behnken 1960, "Some new three level
 * designs for the study of quantitative variables", Technometrics 2, 455-475): each row of the
 * published table names a few factors that run through a 2^2 or 2^3 factorial at -1 and +1 while
 * the others stay at 0; with center runs added every factor takes only the three levels -1, 0
 * and +1, and no run sits on a corner of the cube, for machines whose corners are unsafe or
 * impossible. Rows: for 3, 4 and 5 factors every pair of factors (12, 24 and 40 runs); for 6 and
 * 7 factors the table's incomplete blocks of three factors (48 and 56 runs).
 */
import type { DesignNote } from './design-note.ts';
import { designNoteText } from '../text/design-text.ts';
import { InputError } from '../errors.ts';
import { defineFactors, type FactorSpec } from '../factor/factor.ts';
import type { Design, DesignRun, RunKind } from './design.ts';
import { fullFactorial } from './full-factorial.ts';
import { drawSeed, MAX_SEED } from './random.ts';
import { orderRuns } from './run-order.ts';
import { secondOrderProperties, type SecondOrderPlan } from './second-order-plan.ts';

/**
 * The factors (0-based) of each row of the published table. 3-5 factors: every pair; 6 factors:
 * six blocks of three, each factor in three of them and every pair at least once; 7 factors: the
 * seven blocks of three of a balanced incomplete block design (every pair exactly once). Box and
 * Behnken (1960), Technometrics 2, 455-475, their table of designs (from memory; the tests check
 * the run counts and the balance the table is built on).
 */
export const BOX_BEHNKEN_ROWS: Readonly<Record<number, readonly (readonly number[])[]>> = {
  3: [[0, 1], [0, 2], [1, 2]],
  4: [[0, 1], [2, 3], [0, 3], [1, 2], [0, 2], [1, 3]],
  5: [[0, 1], [2, 3], [1, 4], [0, 2], [3, 4], [1, 2], [0, 3], [2, 4], [0, 4], [1, 3]],
  6: [[0, 1, 3], [1, 2, 4], [2, 3, 5], [0, 3, 4], [1, 4, 5], [0, 2, 5]],
  7: [[3, 4, 5], [0, 5, 6], [1, 4, 6], [0, 1, 3], [2, 3, 6], [0, 2, 4], [1, 2, 5]],
};

/** Center runs when none are asked for: 3 for 3 and 4 factors, 6 for 5 to 7 (Box and Behnken 1960, their table, from memory). */
export const DEFAULT_BOX_BEHNKEN_CENTER_RUNS: Readonly<Record<number, number>> = { 3: 3, 4: 3, 5: 6, 6: 6, 7: 6 };

export interface BoxBehnkenSpec {
  readonly factors: readonly FactorSpec[];
  readonly centerRuns?: number;
  readonly randomize?: boolean;
  readonly seed?: number;
}

/**
 * Builds a Box-Behnken design and its properties (see the file comment and second-order-plan.ts).
 * Runs of the table have kind 'factorial' (their two or three factors at -1 and +1) and a
 * standard-order index in table order; center runs have none. Cost O(N p^2) for the properties.
 * Throws InputError for fewer than 3 or more than 7 factors, a categorical factor, a center-run
 * count that is not a whole number, a bad seed or a seed with standard order.
 * Example: boxBehnken({ factors: three numeric factors, centerRuns: 3 }) -> 15 runs.
 */
export function boxBehnken(spec: BoxBehnkenSpec): SecondOrderPlan {
  const factors = defineFactors(spec.factors);
  const k = factors.length;
  const rows = BOX_BEHNKEN_ROWS[k];
  if (!rows) throw new InputError(`A Box-Behnken design takes 3 to 7 factors, got ${k}`);
  const cats = factors.filter((f) => f.kind !== 'numeric');
  if (cats.length > 0) throw new InputError(`A Box-Behnken design needs numeric factors (three levels each); ${cats.map((f) => f.name).join(', ')} ${cats.length === 1 ? 'is' : 'are'} categorical`);
  const centers = spec.centerRuns ?? DEFAULT_BOX_BEHNKEN_CENTER_RUNS[k];
  if (!Number.isInteger(centers) || centers < 0) throw new InputError(`Center runs must be a whole number, 0 or more, got ${centers}`);
  const randomize = spec.randomize ?? true;
  if (!randomize && spec.seed !== undefined) throw new InputError(`A seed only applies to a randomized run order; got seed ${spec.seed} with standard order`);
  if (spec.seed !== undefined && (!Number.isSafeInteger(spec.seed) || spec.seed < 0)) throw new InputError(`A seed must be a whole number from 0 to ${MAX_SEED}, got ${spec.seed}`);

  type Draft = { standardOrder: number | null; block: number; kind: RunKind; coded: readonly number[] };
  const drafts: Draft[] = [];
  for (const row of rows) {
    for (const signs of fullFactorial(row.length)) {
      const coded = new Array<number>(k).fill(0);
      row.forEach((f, j) => (coded[f] = signs[j]));
      drafts.push({ standardOrder: drafts.length + 1, block: 1, kind: 'factorial', coded });
    }
  }
  const tableRuns = drafts.length;
  for (let i = 0; i < centers; i++) drafts.push({ standardOrder: null, block: 1, kind: 'center', coded: new Array<number>(k).fill(0) });
  const seed = randomize ? spec.seed ?? drawSeed() : null;
  const runs: DesignRun[] = orderRuns(drafts, { seed }).map((d, i) => ({ run: i + 1, standardOrder: d.standardOrder, replicate: 1, block: 1, originBlock: 1, kind: d.kind, coded: [...d.coded] }));
  const properties = secondOrderProperties('Box-Behnken', factors, runs, null);
  const summary =
    `${runs.length} runs (${tableRuns} + ${centers} center), a Box-Behnken design: every factor at three levels (low, center, high) and no run on a corner of the cube; ` +
    `it ${properties.fullQuadratic ? 'estimates' : 'cannot estimate'} the full second-order model${properties.rotatable ? ' and is rotatable' : ''}. ` +
    (seed === null ? 'Standard order kept.' : `Run order randomized (seed ${seed}).`);
  const noteFacts: DesignNote[] = [{ kind: 'box-behnken-table' }];
  if (seed !== null && spec.seed === undefined) noteFacts.push({ kind: 'seed-drawn', seed });
  const notes = noteFacts.map(designNoteText);
  const design: Design = { factors, runs, generators: [], definingRelation: [], resolution: null, wordLengths: {}, aliases: [], blockWords: [], seed, summary, notes, noteFacts, foldover: null };
  return { design, properties };
}
