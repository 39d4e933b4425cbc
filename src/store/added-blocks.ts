/**
 * Planned runs added to a study after its plan was made (path runs, a foldover block,
 * confirmation runs): each addition is a block record of its own, written once through
 * appendRevisions and never changed; the study's own plan stays as it was made. Readers get the
 * plan with every block's runs (planOf), so the run sheet, the run form and the analysis see
 * the added runs like any other.
 */
import { InputError } from '../core/errors.ts';
import { addedRuns, withAddedBlocks, type AddedBlock, type AddedBlockPurpose, type RunToAdd } from '../core/study/added-block.ts';
import type { StudyRecord } from '../core/study/study.ts';
import { appendRevisions } from './append-revisions.ts';
import { guarded } from './errors.ts';
import { newId } from './ids.ts';
import type { Store } from './store.ts';

/**
 * The study's plan with its added blocks (inside a transaction over studies and blocks, or
 * alone). Written as a Dexie promise chain, not an async function: inside a caller's
 * transaction a native async layer more can lose the transaction (Dexie's PrematureCommitError,
 * https://dexie.org/docs/DexieErrors/Dexie.PrematureCommitError).
 */
export function planOf(store: Store, study: StudyRecord): Promise<StudyRecord> {
  return store.db.blocks
    .where('studyId')
    .equals(study.id)
    .toArray()
    .then((blocks) => withAddedBlocks(study, blocks));
}

/** The blocks added to a study, in run order. */
export async function listBlocks(store: Store, studyId: string): Promise<AddedBlock[]> {
  const blocks = await guarded(() => store.db.blocks.where('studyId').equals(studyId).toArray());
  return blocks.sort((a, b) => a.runs[0].run - b.runs[0].run);
}

/**
 * Adds planned runs to a study as a new block, numbered after every run the device knows of it,
 * in one transaction; resolves with the block once it is on disk. Throws InputError (nothing
 * written) when the study is not here, nothing is to be added, or a run does not fit the plan.
 */
export async function addPlannedRuns(store: Store, studyId: string, purpose: AddedBlockPurpose, runs: readonly RunToAdd[], note: string): Promise<AddedBlock> {
  const { db } = store;
  return guarded(() =>
    db.transaction('rw', [db.studies, db.revisions, db.runs, db.blocks], async () => {
      const study = await db.studies.get(studyId);
      if (!study) throw new InputError(`There is no study with id "${studyId}" on this device`);
      const plan = await planOf(store, study);
      const block: AddedBlock = { id: newId(), studyId, device: store.device, createdAt: store.now().toISOString(), purpose, note, runs: addedRuns(plan, runs) };
      const { blocks } = await appendRevisions(store, { blocks: [block] });
      return blocks[0];
    }),
  );
}
