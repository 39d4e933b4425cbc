/**
 * Planned runs added to a study after its plan was made: runs along a path of steepest ascent,
 * a foldover of a fraction, confirmation runs at a chosen setting, the axial block of a central
 * composite design. The study's own plan never
 * changes; each addition is a record of its own (an added block), written once and never
 * changed, that carries its planned runs in a new block. The plan a screen or an analysis reads
 * is the study's runs followed by every added block's runs (withAddedBlocks).
 *
 * Run numbers continue the plan: an added block's runs take the numbers after the highest one
 * the device knows, and its block the number after the highest block. Logged runs name their
 * planned run by that number, so two blocks of one study may never share a run number; two
 * devices that each added a block to the same plan offline would make such a pair, and the
 * merge refuses it with a message naming both blocks (nothing is written, nothing is lost: each
 * device keeps what it has). Source: common practice for append-only records.
 */
import { InputError } from '../errors.ts';
import type { DesignRun, RunKind } from '../design/design.ts';
import type { StudyRecord } from './study.ts';

/**
 * Why the runs were added: they follow the path, they fold the fraction over, they confirm a
 * setting, or they are the axial block (axial runs and their center runs) that augments a
 * two-level study into a central composite design.
 */
export const ADDED_BLOCK_PURPOSES = ['path', 'foldover', 'confirmation', 'axial'] as const;
export type AddedBlockPurpose = (typeof ADDED_BLOCK_PURPOSES)[number];

export interface AddedBlock {
  /** Random id of the addition. */
  readonly id: string;
  readonly studyId: string;
  /** Device that made it. */
  readonly device: string;
  /** Wall-clock time it was made, ISO 8601; shown only, never used to order anything. */
  readonly createdAt: string;
  readonly purpose: AddedBlockPurpose;
  /** What the block is for, in words (the path's base and step, the setting confirmed, what the foldover separates). */
  readonly note: string;
  /** The planned runs, numbered after the plan's runs, all in one new block (block = originBlock). */
  readonly runs: readonly DesignRun[];
}

/** One planned run to add: its kind and coded settings (one per factor, declared order). */
export interface RunToAdd {
  readonly kind: RunKind;
  readonly coded: readonly number[];
  /** Standard-order index, for foldover runs; null otherwise. */
  readonly standardOrder?: number | null;
}

function sortedByRun(runs: readonly DesignRun[]): DesignRun[] {
  return [...runs].sort((a, b) => a.run - b.run);
}

/**
 * The study's plan with its added blocks' runs after its own, in run-number order. Blocks of
 * another study are ignored. Cost O(n log n) in the planned runs.
 * Throws InputError when a run number appears twice (two blocks added from the same plan on two
 * devices), naming both blocks.
 * Example: a 16-run study with a block of 4 path runs -> 20 planned runs, runs 17 to 20 in block 2.
 */
export function withAddedBlocks(study: StudyRecord, blocks: readonly AddedBlock[]): StudyRecord {
  const own = blocks.filter((b) => b.studyId === study.id);
  if (own.length === 0) return study;
  const owner = new Map<number, string>(study.design.runs.map((r) => [r.run, 'the study\'s plan']));
  for (const b of [...own].sort((x, y) => (x.id < y.id ? -1 : x.id > y.id ? 1 : 0))) {
    for (const r of b.runs) {
      const first = owner.get(r.run);
      if (first !== undefined) {
        throw new InputError(
          `Run ${r.run} of "${study.title}" is planned twice: in ${first} and in the ${b.purpose} block ${b.id} (made ${b.createdAt}). Two devices added runs to the same plan before seeing each other's; keep logging on one of them, and move the other's new runs over by hand.`,
        );
      }
      owner.set(r.run, `the ${b.purpose} block ${b.id} (made ${b.createdAt})`);
    }
  }
  return { ...study, design: { ...study.design, runs: sortedByRun([...study.design.runs, ...own.flatMap((b) => b.runs)]) } };
}

/**
 * The planned runs of a new block for a plan (the study with its blocks so far): numbered after
 * its highest run, all in the block after its highest block, replicate 1, in the order given.
 * Cost O(n + added). Throws InputError when nothing is to be added or a run has the wrong number
 * of coded settings or a setting that is not a finite number.
 * Example: for a 16-run plan in one block, addedRuns(plan, [{ kind: 'path', coded: [1.5, 0.8] }])
 * -> [{ run: 17, block: 2, originBlock: 2, replicate: 1, standardOrder: null, kind: 'path', coded: [1.5, 0.8] }].
 */
export function addedRuns(plan: StudyRecord, runs: readonly RunToAdd[]): DesignRun[] {
  if (runs.length === 0) throw new InputError('Adding runs needs at least one run, got none');
  const k = plan.factors.length;
  let lastRun = 0;
  let lastBlock = 0;
  for (const r of plan.design.runs) {
    if (r.run > lastRun) lastRun = r.run;
    if (r.block > lastBlock) lastBlock = r.block;
    if (r.originBlock > lastBlock) lastBlock = r.originBlock;
  }
  const block = lastBlock + 1;
  return runs.map((r, i) => {
    if (r.coded.length !== k) throw new InputError(`Added run ${i + 1} needs one coded setting per factor (${k}), got ${r.coded.length}`);
    r.coded.forEach((c, j) => {
      if (!Number.isFinite(c)) throw new InputError(`Added run ${i + 1}: the setting of ${plan.factors[j].name} needs a finite number, got ${c}`);
    });
    return { run: lastRun + 1 + i, standardOrder: r.standardOrder ?? null, replicate: 1, block, originBlock: block, kind: r.kind, coded: [...r.coded] };
  });
}
