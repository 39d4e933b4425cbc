/**
 * Files in and out of the store: the JSON backup (one study or all, history included), and the
 * import of a backup or of a CSV of runs made elsewhere. Every import is checked in full first
 * and written in one transaction: with any error nothing changes. Importing a backup is a merge
 * by id, so the same file twice changes nothing and two phones' files merge into their union.
 */
import { InputError } from '../core/errors.ts';
import type { AddedBlock } from '../core/study/added-block.ts';
import type { RunRevision, StudyRecord } from '../core/study/study.ts';
import { readBackup, writeBackup, type Backup, type BackupPayload } from '../io/backup/backup.ts';
import { planMerge, type MergeConflict, type SetAside } from '../io/backup/merge.ts';
import type { Digest } from '../io/digest.ts';
import type { CsvRunsImport } from '../io/csv/runs-import.ts';
import { studyCsv, type StudyCsvOptions } from '../io/csv/study-csv.ts';
import { planOf } from './added-blocks.ts';
import { appendRevisions, type MadeRevision } from './append-revisions.ts';
import { guarded } from './errors.ts';
import { newId } from './ids.ts';
import { keepSetAside } from './set-aside.ts';
import { markExported } from './status.ts';
import { newStudyRecord } from './studies.ts';
import type { Store } from './store.ts';

/** A payload carries `blocks` only when there are some, so a file without added runs reads as before. */
function withBlocks(p: BackupPayload, blocks: readonly AddedBlock[]): BackupPayload {
  return blocks.length > 0 ? { ...p, blocks } : p;
}

/** Everything the store holds of these studies (all when none are named). */
export async function payloadOf(store: Store, studyIds?: readonly string[]): Promise<BackupPayload> {
  const { db } = store;
  return guarded(() =>
    db.transaction('r', [db.studies, db.revisions, db.blocks], async () => {
      if (!studyIds) return withBlocks({ studies: await db.studies.toArray(), revisions: await db.revisions.toArray() }, await db.blocks.toArray());
      const studies = (await db.studies.bulkGet([...studyIds])).map((s, i) => {
        if (!s) throw new InputError(`There is no study with id "${studyIds[i]}" on this device`);
        return s;
      });
      const revisions = await db.revisions.where('studyId').anyOf([...studyIds]).toArray();
      return withBlocks({ studies, revisions }, await db.blocks.where('studyId').anyOf([...studyIds]).toArray());
    }),
  );
}

/**
 * The backup file text of these studies (all when none are named), noting the export. When the
 * note cannot be written (storage full: the very moment an export is most needed) the file is
 * still returned; the backup reminder then simply stays due.
 */
export async function exportBackup(store: Store, studyIds?: readonly string[], digest?: Digest): Promise<string> {
  const at = store.now().toISOString();
  const payload = await payloadOf(store, studyIds);
  const text = await writeBackup(payload, { device: store.device, exportedAt: at, scope: studyIds ? 'study' : 'all' }, digest);
  await markExported(store, payload.studies.map((s) => s.id), at).catch(() => undefined);
  return text;
}

export interface ImportReport {
  readonly studiesAdded: number;
  /** Blocks of planned runs added to studies (path, foldover, confirmation) that were not here. */
  readonly blocksAdded: number;
  readonly revisionsAdded: number;
  /** Logged runs that were not on this device before. */
  readonly runsAdded: number;
  readonly studiesUnchanged: number;
  readonly revisionsUnchanged: number;
  /** Runs whose edits on two devices (or tabs) diverged: both revisions are kept, the later
   * by the revision order is current, and the person may restore the other. */
  readonly conflicts: readonly MergeConflict[];
  /** Records of the file that clash with this device's (same id, other content), with the field
   * that differs, and the records that depend on them: not merged, kept apart (listSetAside). */
  readonly setAside: readonly SetAside[];
  /** How many of those were not already kept from an earlier import. */
  readonly setAsideNew: number;
  /** One line for the screen or the command line. */
  readonly summary: string;
}

/** The diverged runs named for the person: run number and study title, and whether one device made both edits. */
interface ConflictNames {
  readonly titleOf: (studyId: string) => string;
  readonly oneDevice: (c: MergeConflict) => boolean;
}

function summarize(r: Omit<ImportReport, 'summary'>, names?: ConflictNames): string {
  const n = r.setAside.length;
  const clashes = r.setAside.filter((s) => s.field !== null);
  const named = clashes
    .slice(0, 3)
    .map((s) => `${s.kind === 'study' ? `study ${s.id}` : `revision ${s.id} of run ${s.plannedRun}`} (${s.field === '' ? 'the whole record' : s.field} differs)`)
    .join(', ');
  const aside =
    n === 0
      ? ''
      : ` ${n} ${n === 1 ? 'record' : 'records'} of the file ${n === 1 ? 'was' : 'were'} set aside, not merged: ${clashes.length} ${clashes.length === 1 ? 'has' : 'have'} the id of a record on this device with other content (${named}${clashes.length > 3 ? ', ...' : ''})${n > clashes.length ? ` and ${n - clashes.length} depend on ${clashes.length === 1 ? 'it' : 'them'}` : ''}. Both records are kept; nothing on this device was changed by them.`;
  if (r.studiesAdded + r.revisionsAdded === 0) return (n === 0 ? 'Nothing new: everything in the file was already here.' : 'Nothing new was merged.') + aside;
  const parts = [`${r.studiesAdded} new ${r.studiesAdded === 1 ? 'study' : 'studies'}`, `${r.runsAdded} new logged ${r.runsAdded === 1 ? 'run' : 'runs'}`, `${r.revisionsAdded} new ${r.revisionsAdded === 1 ? 'revision' : 'revisions'}`];
  const c = r.conflicts.length;
  if (c === 0) return `Imported ${parts.join(', ')}.` + aside;
  const where = names && r.conflicts.every(names.oneDevice) ? 'in two places on one device' : 'on two devices';
  const which = names ? `: ${r.conflicts.map((x) => `run ${x.plannedRun} of "${names.titleOf(x.studyId)}"`).join(', ')}` : '';
  return (
    `Imported ${parts.join(', ')}. ${c} ${c === 1 ? 'run was' : 'runs were'} changed ${where}; both revisions are kept in ${c === 1 ? 'its' : 'their'} history${which}. ` +
    `${c === 1 ? 'It is' : 'They are'} marked on the run sheet and the run's form, where one revision can be kept.` +
    aside
  );
}

/**
 * Merges a checked backup into the store in one transaction. Records that clash with stored ones
 * are set aside (kept in their own table, reported), and the rest is merged.
 */
export async function mergeBackup(store: Store, backup: Pick<Backup, 'payload'> & Partial<Pick<Backup, 'device'>>): Promise<ImportReport> {
  const { db } = store;
  const incoming = backup.payload;
  return guarded(() =>
    db.transaction('rw', [db.studies, db.revisions, db.runs, db.setAside, db.blocks], async () => {
      const studyIds = incoming.studies.map((s) => s.id);
      const revIds = incoming.revisions.map((r) => r.id);
      const blockIds = (incoming.blocks ?? []).map((b) => b.id);
      const [haveStudies, haveRevs, haveBlocks] = await Promise.all([db.studies.bulkGet(studyIds), db.revisions.bulkGet(revIds), db.blocks.bulkGet(blockIds)]);
      const runIds = [...new Set(incoming.revisions.map((r) => r.runId))];
      const history = await db.revisions.where('runId').anyOf(runIds).toArray();
      const byRun = new Map<string, RunRevision[]>();
      for (const r of history) {
        const list = byRun.get(r.runId);
        if (list) list.push(r);
        else byRun.set(r.runId, [r]);
      }
      const plan = planMerge(
        {
          studies: new Map(haveStudies.filter((s): s is StudyRecord => !!s).map((s) => [s.id, s])),
          revisions: new Map(haveRevs.filter((r): r is RunRevision => !!r).map((r) => [r.id, r])),
          blocks: new Map(haveBlocks.filter((b): b is AddedBlock => !!b).map((b) => [b.id, b])),
          historyOf: (id) => byRun.get(id) ?? [],
        },
        incoming,
      );
      // The one write path (its record checks, in this transaction); any failure aborts all of it.
      await appendRevisions(store, { studies: plan.newStudies, blocks: plan.newBlocks, imported: plan.newRevisions });
      const setAsideNew = await keepSetAside(store, plan.setAside, backup.device ?? null);
      const runsAdded = plan.runs.filter((r) => !byRun.has(r.id)).length;
      const report = {
        studiesAdded: plan.newStudies.length,
        blocksAdded: plan.newBlocks.length,
        revisionsAdded: plan.newRevisions.length,
        runsAdded,
        studiesUnchanged: plan.unchangedStudies,
        revisionsUnchanged: plan.unchangedRevisions,
        conflicts: plan.conflicts,
        setAside: plan.setAside,
        setAsideNew,
      };
      const titles = new Map([...haveStudies.filter((x): x is StudyRecord => !!x), ...plan.newStudies].map((x) => [x.id, x.title]));
      const deviceOf = new Map([...history, ...plan.newRevisions].map((x) => [x.id, x.device]));
      const names: ConflictNames = {
        titleOf: (id) => titles.get(id) ?? id,
        oneDevice: (c) => new Set(c.revisionIds.map((id) => deviceOf.get(id))).size === 1,
      };
      return { ...report, summary: summarize(report, names) };
    }),
  );
}

/** Reads a backup file (every check first) and merges it into the store; nothing changes on any error. */
export async function importBackup(store: Store, text: string, digest?: Digest): Promise<ImportReport> {
  const backup = await readBackup(text, digest);
  return mergeBackup(store, backup);
}

/** Makes a new study from a mapped CSV of runs made elsewhere, with one logged run per row, in one transaction. */
export async function importRunsCsv(store: Store, mapped: CsvRunsImport): Promise<{ study: StudyRecord; runs: number }> {
  const study = newStudyRecord(store, mapped.plan);
  const made: MadeRevision[] = mapped.runs.map((r) => ({
    id: newId(),
    runId: newId(),
    studyId: study.id,
    plannedRun: r.plannedRun,
    rev: 1,
    parents: [],
    restoredFrom: null,
    ...r.values,
  }));
  // The one write path: the record checks, this device, the store's clock, in one transaction.
  const { revisions } = await guarded(() => appendRevisions(store, { studies: [study], made, pathOf: (i) => `runs[${i}]` }));
  return { study, runs: revisions.length };
}

/** The CSV export of a study's records (the same text the command line's csv command writes). */
export async function exportStudyCsv(store: Store, studyId: string, options: StudyCsvOptions = {}): Promise<string> {
  const [study, runs] = await studyAndRuns(store, studyId);
  return studyCsv(study, runs, options);
}

/** A study with its added blocks and its logged runs, read in one transaction; throws InputError for a missing study. */
export async function studyAndRuns(store: Store, studyId: string) {
  const { db } = store;
  const [study, runs] = await guarded(() =>
    db.transaction('r', [db.studies, db.runs, db.blocks], async () => {
      const s = await db.studies.get(studyId);
      return Promise.all([s ? planOf(store, s) : undefined, db.runs.where('studyId').equals(studyId).toArray()]);
    }),
  );
  if (!study) throw new InputError(`There is no study with id "${studyId}" on this device`);
  return [study, runs] as const;
}
