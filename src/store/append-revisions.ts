/**
 * The one write path of the records: every writer (saving a run, excluding, restoring, importing
 * a backup or a CSV, creating a study, adding planned runs) hands its new studies and revisions to appendRevisions,
 * which applies the record checks of src/core/records to each, adds them, and brings the current
 * state of every logged run it touches up to date, all in one transaction (the caller's, when it
 * has one over these tables). Revisions made on this device now are stamped with this device and
 * the store's clock (store.now), never the wall clock of a screen; revisions from a file keep
 * what they were written with, since a revision never changes. Nothing is ever overwritten:
 * adding a study or revision whose id is already stored fails, and the transaction with it.
 */
import { checkAddedBlock } from '../core/records/check-added-block.ts';
import { checkHistories, checkUniqueIds } from '../core/records/check-histories.ts';
import { checkRevision } from '../core/records/check-revision.ts';
import { checkStudy } from '../core/records/check-study.ts';
import { MAX_SAVED_REV } from '../core/records/field-checks.ts';
import { withAddedBlocks, type AddedBlock } from '../core/study/added-block.ts';
import { currentRun, type LoggedRun, type RunRevision, type StudyRecord } from '../core/study/study.ts';
import type { Store } from './store.ts';

/** A revision made on this device now: the device and the time of saving are added by appendRevisions. */
export type MadeRevision = Omit<RunRevision, 'device' | 'savedAt'>;

export interface NewRecords {
  /** New studies (a study is written once, with its plan). */
  readonly studies?: readonly StudyRecord[];
  /** Planned runs added to studies (each block written once, never changed). */
  readonly blocks?: readonly AddedBlock[];
  /** Revisions made on this device now. */
  readonly made?: readonly MadeRevision[];
  /** Revisions read from a file, written as they are. */
  readonly imported?: readonly RunRevision[];
  /** How a message names a made revision that fails its checks (default "Run <planned run>"). */
  readonly pathOf?: (index: number, revision: MadeRevision) => string;
}

export interface Appended {
  /** The studies as checked and stored. */
  readonly studies: readonly StudyRecord[];
  /** The added blocks as checked and stored. */
  readonly blocks: readonly AddedBlock[];
  /** The revisions as checked and stored: made ones first, in the order given, then imported ones. */
  readonly revisions: readonly RunRevision[];
  /** The new current state of every logged run the revisions touch, in the order first touched. */
  readonly runs: readonly LoggedRun[];
}

/**
 * A checked record as a file would hold it (members left undefined dropped), so every stored
 * record can be exported and read back. Taken after the checks, never before: JSON would turn a
 * NaN into null, which the checks would then take for "nothing" instead of refusing it.
 */
const plain = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

/** Checks and appends new studies, added blocks and revisions, and updates the touched runs, in one transaction. Throws InputError (nothing written) at the first record that fails its checks. */
export async function appendRevisions(store: Store, records: NewRecords): Promise<Appended> {
  const { db } = store;
  return db.transaction('rw', [db.studies, db.revisions, db.runs, db.blocks], async () => {
    const savedAt = store.now().toISOString();
    const studies = (records.studies ?? []).map((s, i) => plain(checkStudy(s, records.studies!.length === 1 ? 'study' : `studies[${i}]`)));
    checkUniqueIds(studies, 'studies', 'study');
    const own = new Map(studies.map((s) => [s.id, s]));
    const made = (records.made ?? []).map((r) => ({ ...r, device: store.device, savedAt }));
    const imported = records.imported ?? [];
    const newBlocks = records.blocks ?? [];
    const wanted = [...new Set([...made, ...imported, ...newBlocks].map((r) => r.studyId))].filter((id) => !own.has(id));
    if (wanted.length > 0) for (const s of await db.studies.bulkGet(wanted)) if (s) own.set(s.id, s);
    const blocks = newBlocks.map((b, i) => plain(checkAddedBlock(b, newBlocks.length === 1 ? 'block' : `blocks[${i}]`, own)));
    checkUniqueIds(blocks, 'blocks', 'block');
    // Revisions are checked against each study's whole plan: its own runs and every added block's,
    // stored or new; a run number planned twice (blocks added on two devices) aborts the write.
    const ids = [...own.keys()];
    const stored = ids.length > 0 ? await db.blocks.where('studyId').anyOf(ids).toArray() : [];
    const known = new Map([...own].map(([id, s]) => [id, withAddedBlocks(s, [...stored, ...blocks])]));
    const revisions = [
      // Saves here may take counters past what a file may bring, so a run is never stuck.
      ...made.map((r, i) => plain(checkRevision(r, records.pathOf ? records.pathOf(i, r) : `Run ${r.plannedRun}`, known, MAX_SAVED_REV))),
      ...imported.map((r, i) => plain(checkRevision(r, `revisions[${i}]`, known))),
    ];
    const runIds = [...new Set(revisions.map((r) => r.runId))];
    const history = runIds.length > 0 ? await db.revisions.where('runId').anyOf(runIds).toArray() : [];
    // The stored history and the new revisions together must still be whole histories.
    checkHistories([...history, ...revisions], 'revisions');
    const byRun = new Map<string, RunRevision[]>();
    for (const r of [...history, ...revisions]) {
      const list = byRun.get(r.runId);
      if (list) list.push(r);
      else byRun.set(r.runId, [r]);
    }
    const runs = runIds.map((id) => currentRun(byRun.get(id)!));
    // No catching inside the transaction: any failure aborts all of it.
    if (studies.length > 0) await db.studies.bulkAdd(studies);
    if (blocks.length > 0) await db.blocks.bulkAdd(blocks);
    if (revisions.length > 0) await db.revisions.bulkAdd(revisions);
    if (runs.length > 0) await db.runs.bulkPut(runs);
    return { studies, blocks, revisions, runs };
  });
}
