/**
 * The record checks of an added block (planned runs added to a study later; see
 * core/study/added-block.ts), applied by the store on every write and by the backup reader.
 */
import { InputError } from '../errors.ts';
import { ADDED_BLOCK_PURPOSES, type AddedBlock } from '../study/added-block.ts';
import type { StudyRecord } from '../study/study.ts';
import { checkPlannedRun } from './check-study.ts';
import { fail, id, list, obj, oneOf, only, text, time } from './field-checks.ts';

/** Most runs one added block may hold (a path of many steps, a foldover of a large fraction). */
export const MAX_ADDED_RUNS = 10_000;

/**
 * Checks an added block against its study: ids and time; purpose one of ADDED_BLOCK_PURPOSES;
 * a note as text; at least one planned run, each checked as a plan's run is (checkPlannedRun),
 * numbered above every run of the study's own plan, run numbers unique in the block, and all
 * in one block (block = originBlock, the same for every run) above the study's own blocks.
 * Whether two blocks share a run number is checked where the blocks meet (withAddedBlocks).
 * Method: common practice for append-only records. Cost O(runs x factors).
 * Returns the block rebuilt from the checked fields. Throws InputError naming the path.
 * Example: a block whose first run is numbered 3 in a 16-run study throws
 * 'block.runs[0].run: needs a number after the study's own runs (above 16), got 3'.
 */
export function checkAddedBlock(v: unknown, path: string, studies: ReadonlyMap<string, StudyRecord>): AddedBlock {
  const o = obj(v, path);
  only(o, path, ['id', 'studyId', 'device', 'createdAt', 'purpose', 'note', 'runs']);
  const studyId = id(o.studyId, `${path}.studyId`);
  const study = studies.get(studyId);
  if (!study) throw new InputError(`${path}.studyId: needs a study in this file, got "${studyId}", which it does not hold`);
  const k = study.factors.length;
  const runs = list(o.runs, `${path}.runs`, MAX_ADDED_RUNS).map((r, i) => checkPlannedRun(r, `${path}.runs[${i}]`, k));
  if (runs.length === 0) fail(`${path}.runs`, 'at least one planned run', runs);
  let ownLast = 0;
  let ownBlock = 0;
  for (const r of study.design.runs) {
    ownLast = Math.max(ownLast, r.run);
    ownBlock = Math.max(ownBlock, r.block, r.originBlock);
  }
  const seen = new Set<number>();
  runs.forEach((r, i) => {
    const p = `${path}.runs[${i}]`;
    if (r.run <= ownLast) throw new InputError(`${p}.run: needs a number after the study's own runs (above ${ownLast}), got ${r.run}`);
    if (seen.has(r.run)) throw new InputError(`${p}.run: run numbers must differ, got ${r.run} twice`);
    seen.add(r.run);
    if (r.originBlock !== r.block) throw new InputError(`${p}.originBlock: an added run's block of origin is its block (${r.block}), got ${r.originBlock}`);
    if (r.block !== runs[0].block) throw new InputError(`${p}.block: an added block's runs share one block (${runs[0].block}), got ${r.block}`);
    if (r.block <= ownBlock) throw new InputError(`${p}.block: needs a block after the study's own blocks (above ${ownBlock}), got ${r.block}`);
  });
  return {
    id: id(o.id, `${path}.id`),
    studyId,
    device: id(o.device, `${path}.device`),
    createdAt: time(o.createdAt, `${path}.createdAt`),
    purpose: oneOf(o.purpose, `${path}.purpose`, ADDED_BLOCK_PURPOSES),
    note: text(o.note, `${path}.note`),
    runs,
  };
}
