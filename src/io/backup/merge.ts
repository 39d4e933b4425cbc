/**
 * Merging a backup into what a device holds, as pure functions the store runs inside one
 * transaction. A merge is a union by id: studies, added blocks and revisions never change once written, so an
 * id present on both sides must carry the same content (otherwise the file was altered, and the
 * whole import is refused). The current state of each logged run is then decided again from all
 * its revisions (see compareRevisions), so merging twice equals merging once, and A then B
 * equals B then A.
 */
import { InputError } from '../../core/errors.ts';
import type { AddedBlock } from '../../core/study/added-block.ts';
import { currentRun, type LoggedRun, type RunRevision, type StudyRecord } from '../../core/study/study.ts';
import { canonicalJson } from '../../core/records/canonical-json.ts';
import type { BackupPayload } from './backup.ts';

/** Runs whose edits diverged: more than one revision that nobody has built on. */
export interface MergeConflict {
  readonly studyId: string;
  readonly runId: string;
  readonly plannedRun: number;
  /** The diverging revisions, in revision order; the last one is current. */
  readonly revisionIds: readonly string[];
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

/** Plans the merge of a checked payload into the base; throws InputError when an id clashes. */
export function planMerge(base: MergeBase, incoming: BackupPayload): MergePlan {
  const newStudies: StudyRecord[] = [];
  let unchangedStudies = 0;
  for (const s of incoming.studies) {
    const have = base.studies.get(s.id);
    if (!have) newStudies.push(s);
    else if (canonicalJson(have) === canonicalJson(s)) unchangedStudies++;
    else {
      throw new InputError(`Study "${s.title}" (id ${s.id}) in the file differs from the study with the same id on this device ("${have.title}"); a study's plan never changes, so the file was altered. Nothing was imported.`);
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
  const newRevisions: RunRevision[] = [];
  let unchangedRevisions = 0;
  const touched = new Set<string>();
  for (const r of incoming.revisions) {
    const have = base.revisions.get(r.id);
    if (!have) {
      newRevisions.push(r);
      touched.add(r.runId);
    } else if (canonicalJson(have) === canonicalJson(r)) unchangedRevisions++;
    else {
      throw new InputError(`Revision ${r.id} of run ${r.plannedRun} in the file differs from the revision with the same id on this device; a revision never changes, so the file was altered. Nothing was imported.`);
    }
  }
  const runs: LoggedRun[] = [];
  const conflicts: MergeConflict[] = [];
  for (const runId of [...touched].sort()) {
    const before = base.historyOf(runId);
    const added = newRevisions.filter((r) => r.runId === runId);
    if (before.length > 0 && (before[0].studyId !== added[0].studyId || before[0].plannedRun !== added[0].plannedRun)) {
      throw new InputError(`Logged run ${runId} belongs to run ${before[0].plannedRun} of one study on this device and to run ${added[0].plannedRun} of another in the file. Nothing was imported.`);
    }
    const after = currentRun([...before, ...added]);
    runs.push(after);
    const hadConflict = before.length > 0 && currentRun(before).heads.length > 1;
    if (after.heads.length > 1 && !hadConflict) {
      conflicts.push({ studyId: after.studyId, runId, plannedRun: after.plannedRun, revisionIds: after.heads });
    }
  }
  return { newStudies, newBlocks, newRevisions, runs, unchangedStudies, unchangedRevisions, conflicts };
}
