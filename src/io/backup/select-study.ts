/**
 * Picking one study out of a backup by id or by name, and the data of one of its responses for
 * the analysis (what the command line's analyze and csv commands read from a backup).
 */
import { divergedRuns, type DivergedRun } from '../../core/study/diverged-runs.ts';
import { divergedNote } from '../../core/text/diverged-text.ts';
import { InputError } from '../../core/errors.ts';
import type { ResponseData } from '../../core/study/response-data.ts';
import { responseDataFromRuns } from '../../core/study/run-data.ts';
import { currentRun, type LoggedRun, type RunRevision, type StudyRecord } from '../../core/study/study.ts';
import { readBackupSync, type Backup } from './backup.ts';

/**
 * The study whose id is `ref`, else whose title is `ref` (case and surrounding spaces ignored).
 * Throws InputError when none matches (listing the studies) or when a title matches several
 * (listing their ids, so the person can give one).
 */
export function selectStudy(backup: Pick<Backup, 'payload'>, ref: string): StudyRecord {
  const studies = backup.payload.studies;
  const byId = studies.find((s) => s.id === ref.trim());
  if (byId) return byId;
  const key = ref.trim().toLowerCase();
  const named = studies.filter((s) => s.title.trim().toLowerCase() === key);
  if (named.length === 1) return named[0];
  if (named.length > 1) {
    throw new InputError(`The name "${ref}" matches ${named.length} studies; give one of their ids instead: ${named.map((s) => `${s.id} (made ${s.createdAt})`).join(', ')}`);
  }
  const list = studies.map((s) => `"${s.title}" (${s.id})`).join(', ');
  throw new InputError(`The backup has no study with the id or name "${ref}"; it holds ${studies.length === 0 ? 'no studies' : list}`);
}

/** The current state of every logged run of a study in a backup, by planned run. */
export function studyRuns(backup: Pick<Backup, 'payload'>, studyId: string): LoggedRun[] {
  const byRun = new Map<string, RunRevision[]>();
  for (const r of backup.payload.revisions) if (r.studyId === studyId) byRun.set(r.runId, [...(byRun.get(r.runId) ?? []), r]);
  return [...byRun.values()].map(currentRun).sort((a, b) => a.plannedRun - b.plannedRun || (a.id < b.id ? -1 : 1));
}

/**
 * The analysis data of one response of one study in a backup file: the study chosen by id or
 * name (an ambiguous name is refused listing the ids), the current state of each logged run,
 * coded ACTUAL settings, excluded runs and runs without a value skipped and counted in the notes,
 * several readings of one run averaged. Reads and checks the whole file first (readBackupSync).
 * Example: backupResponseData(text, 'Invented demo: coating line trial', 'Gloss').y -> [..].
 */
export function backupResponseData(backupText: string, studyRef: string, responseName: string): ResponseData {
  const backup = readBackupSync(backupText);
  const study = selectStudy(backup, studyRef);
  const runs = studyRuns(backup, study.id);
  const data = responseDataFromRuns(study, runs, responseName);
  // Runs edited in two places are named with both values (the current one is still the one used).
  const split = backupDivergedRuns(backup, runs);
  return split.length === 0 ? data : { ...data, notes: [...data.notes, ...split.map((d) => divergedNote(study, d))] };
}

/** The runs among `runs` (of a backup) with two or more current revisions, each with those revisions. */
export function backupDivergedRuns(backup: Pick<Backup, 'payload'>, runs: readonly LoggedRun[]): DivergedRun[] {
  if (runs.every((r) => r.heads.length < 2)) return [];
  const byId = new Map(backup.payload.revisions.map((r) => [r.id, r]));
  return divergedRuns(runs, (id) => byId.get(id));
}
