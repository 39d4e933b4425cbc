/**
 * Merging a backup into what a device holds, as pure functions the store runs inside one
 * transaction. A merge is a union by id: studies, added blocks and revisions never change once written, so an
 * id present on both sides should carry the same content. When it does not (the file was altered,
 * or two devices made different records under one id), the file's record is set aside, with the
 * field that differs, together with every record of the file that depends on it (the revisions
 * of a set-aside study; the revisions built on a set-aside revision), and the rest of the file is
 * merged: the device's record stays as it is, the file's is kept apart, nothing is lost, and a
 * later import from the same source is not blocked by it. The current state of each logged run is
 * then decided again from all its revisions (see compareRevisions), so merging twice equals
 * merging once, and A then B equals B then A.
 */
import { InputError } from '../../core/errors.ts';
import type { AddedBlock } from '../../core/study/added-block.ts';
import { currentRun, type LoggedRun, type RunRevision, type StudyRecord } from '../../core/study/study.ts';
import { canonicalJson } from '../../core/records/canonical-json.ts';
import { firstDifference } from '../../core/records/first-difference.ts';
import type { SetAsideFacts } from '../../core/text/set-aside-text.ts';
import type { BackupPayload } from './backup.ts';

/** Runs whose edits diverged: more than one revision that nobody has built on. */
export interface MergeConflict {
  readonly studyId: string;
  readonly runId: string;
  readonly plannedRun: number;
  /** The diverging revisions, in revision order; the last one is current. */
  readonly revisionIds: readonly string[];
}

/** A record of the file that was not merged, kept apart with the reason (the facts the screens word, and the record; the store adds the device). */
export interface SetAside extends Omit<SetAsideFacts, 'fromDevice'> {
  /** The file's record, as it came. */
  readonly record: StudyRecord | RunRevision;
}

export interface MergePlan {
  readonly newStudies: readonly StudyRecord[];
  /** Blocks of planned runs added to studies, not yet here (see core/study/added-block.ts). */
  readonly newBlocks: readonly AddedBlock[];
  readonly newRevisions: readonly RunRevision[];
  /** New current state of every logged run the import touches. */
  readonly runs: readonly LoggedRun[];
  readonly unchangedStudies: number;
  readonly unchangedRevisions: number;
  /** Runs that now have diverging edits and did not before. */
  readonly conflicts: readonly MergeConflict[];
  /** Records of the file that clash with the device's and were not merged (kept apart). */
  readonly setAside: readonly SetAside[];
}

/** What the store holds that a merge needs to see. */
export interface MergeBase {
  readonly studies: ReadonlyMap<string, StudyRecord>;
  readonly revisions: ReadonlyMap<string, RunRevision>;
  /** The added blocks the file names that are already here, by id. */
  readonly blocks: ReadonlyMap<string, AddedBlock>;
  /** All revisions of each logged run the file touches, by run id. */
  readonly historyOf: (runId: string) => readonly RunRevision[];
}

const fieldName = (path: string) => (path === '' ? 'the whole record' : path);

/**
 * Plans the merge of a checked payload into the base. Cost: linear in the file's records and the
 * touched runs' histories (maps by id and by run), plus sorting the file's revisions by counter.
 * Throws nothing for a clash: clashing records and their dependants come back in `setAside`.
 * Example: a file whose revision r1 has readings [[99]] where the device's r1 has [[70]] gives
 * setAside [{ kind: 'revision', id: 'r1', field: 'readings[0][0]', ... }] and merges the rest.
 */
export function planMerge(base: MergeBase, incoming: BackupPayload): MergePlan {
  const newStudies: StudyRecord[] = [];
  const setAside: SetAside[] = [];
  const asideStudies = new Map<string, StudyRecord>();
  let unchangedStudies = 0;
  for (const s of incoming.studies) {
    const have = base.studies.get(s.id);
    if (!have) newStudies.push(s);
    else if (canonicalJson(have) === canonicalJson(s)) unchangedStudies++;
    else {
      const field = firstDifference(have, s) ?? '';
      asideStudies.set(s.id, s);
      setAside.push({
        kind: 'study',
        id: s.id,
        studyId: s.id,
        plannedRun: null,
        field,
        reason: `Study "${s.title}" (id ${s.id}) in the file differs from the study with the same id on this device ("${have.title}") in ${fieldName(field)}; a study's plan never changes, so one of them was altered. The device's study is kept as it was, the file's is set aside.`,
        record: s,
      });
    }
  }
  const newBlocks: AddedBlock[] = [];
  for (const b of incoming.blocks ?? []) {
    const have = base.blocks.get(b.id);
    if (!have) newBlocks.push(b);
    else if (canonicalJson(have) !== canonicalJson(b)) {
      throw new InputError(`The block of planned runs ${b.id} (${b.purpose}) in the file differs from the block with the same id on this device; a block never changes once added, so the file was altered. Nothing was imported.`);
    }
  }
  // Revisions by counter, so a parent (always a smaller counter) is decided before its children.
  const ordered = [...incoming.revisions].sort((a, b) => a.rev - b.rev);
  const asideRevisions = new Set<string>();
  const newRevisions: RunRevision[] = [];
  let unchangedRevisions = 0;
  const addedByRun = new Map<string, RunRevision[]>();
  const asideRuns = new Set<string>();
  for (const r of ordered) {
    const have = base.revisions.get(r.id);
    const aside = (field: string | null, reason: string) => {
      asideRevisions.add(r.id);
      setAside.push({ kind: 'revision', id: r.id, studyId: r.studyId, plannedRun: r.plannedRun, field, reason, record: r });
    };
    const study = asideStudies.get(r.studyId);
    const builtOn = [...r.parents, ...(r.restoredFrom ? [r.restoredFrom] : [])].find((p) => asideRevisions.has(p));
    if (have && canonicalJson(have) === canonicalJson(r)) unchangedRevisions++;
    else if (have) {
      const field = firstDifference(have, r) ?? '';
      aside(field, `Revision ${r.id} of run ${r.plannedRun} in the file differs from the revision with the same id on this device in ${fieldName(field)}; a revision never changes, so one of them was altered. The device's revision is kept as it was, the file's is set aside.`);
    } else if (study) aside(null, `Revision ${r.id} of run ${r.plannedRun} belongs to study "${study.title}" (id ${study.id}), which was set aside.`);
    else if (builtOn) aside(null, `Revision ${r.id} of run ${r.plannedRun} builds on revision ${builtOn}, which was set aside.`);
    else {
      newRevisions.push(r);
      const list = addedByRun.get(r.runId);
      if (list) list.push(r);
      else addedByRun.set(r.runId, [r]);
    }
  }
  const runs: LoggedRun[] = [];
  const conflicts: MergeConflict[] = [];
  for (const runId of [...addedByRun.keys()].sort()) {
    const before = base.historyOf(runId);
    const added = addedByRun.get(runId)!;
    if (before.length > 0 && (before[0].studyId !== added[0].studyId || before[0].plannedRun !== added[0].plannedRun)) {
      // One logged run id for two planned runs: the file's revisions of it are kept apart.
      asideRuns.add(runId);
      for (const r of added) {
        setAside.push({
          kind: 'revision',
          id: r.id,
          studyId: r.studyId,
          plannedRun: r.plannedRun,
          field: 'runId',
          reason: `Logged run ${runId} is run ${before[0].plannedRun} of study ${before[0].studyId} on this device but run ${r.plannedRun} of study ${r.studyId} in the file; the file's revision ${r.id} of it is set aside.`,
          record: r,
        });
      }
      continue;
    }
    const after = currentRun([...before, ...added]);
    runs.push(after);
    const hadConflict = before.length > 0 && currentRun(before).heads.length > 1;
    if (after.heads.length > 1 && !hadConflict) {
      conflicts.push({ studyId: after.studyId, runId, plannedRun: after.plannedRun, revisionIds: after.heads });
    }
  }
  // Revisions set aside with their run are not new, nor are revisions built on them (a child
  // of a set-aside run's revision is of the same run, so it is in that run's list already).
  const kept = asideRuns.size === 0 ? newRevisions : newRevisions.filter((r) => !asideRuns.has(r.runId));
  return { newStudies, newBlocks, newRevisions: kept, runs, unchangedStudies, unchangedRevisions, conflicts, setAside };
}
