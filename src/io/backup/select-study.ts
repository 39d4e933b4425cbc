/**
 * Picking one study out of a backup by id or by name, and the data of one of its responses for
 * the analysis (what the command line's analyze and csv commands read from a backup).
 */
import { divergedRuns, type DivergedRun } from '../../core/study/diverged-runs.ts';
import { divergedNote } from '../../core/text/diverged-text.ts';
import { InputError } from '../../core/errors.ts';
import { withAddedBlocks } from '../../core/study/added-block.ts';
import type { ResponseData } from '../../core/study/response-data.ts';
import { responseDataFromRuns } from '../../core/study/run-data.ts';
import { currentRun, type LoggedRun, type RunRevision, type StudyRecord } from '../../core/study/study.ts';
import { readBackupSync, type Backup } from './backup.ts';

/** Text compared as a person means it: Unicode form C (a composed and a decomposed "é" agree), surrounding spaces ignored. */
function nfc(t: string): string {
  return t.normalize('NFC').trim();
}

function refuseSeveral(ref: string, found: readonly StudyRecord[], how: string): never {
  throw new InputError(`The name "${ref}" matches ${found.length} studies; give one of their ids instead: ${found.map((s) => `${s.id} ("${s.title}", made ${s.createdAt})`).join(', ')} (the name ${how} each)`);
}

/**
 * The study `ref` names, as its plan is read: its own runs followed by the runs of every block
 * added to it (path, foldover, confirmation, axial; withAddedBlocks), in this order: the study whose id is `ref`; else whose title is exactly
 * `ref`; else whose title is `ref` ignoring case; else the one study whose title contains `ref`
 * ignoring case. Text is compared in Unicode form C with surrounding spaces ignored.
 * Throws InputError when none matches (listing the studies) or when two or more match at the
 * first step that finds any (listing them with their ids, so the person can give one).
 * Example: with studies "Oven trial May" and "Oven trial June", "june" picks the second and
 * "oven" is refused, naming both. The study comes with its added blocks' runs in its plan
 * (withAddedBlocks), so path and confirmation runs are known for what they are.
 */
export function selectStudy(backup: Pick<Backup, 'payload'>, ref: string): StudyRecord {
  const studies = backup.payload.studies;
  const key = nfc(ref);
  // The plan as the app reads it: the study's runs with the runs of its added blocks (path, foldover, confirmation).
  const whole = (s: StudyRecord) => withAddedBlocks(s, backup.payload.blocks ?? []);
  const byId = studies.find((s) => s.id === key);
  if (byId) return whole(byId);
  const lower = key.toLowerCase();
  const steps: [string, (title: string) => boolean][] = [
    ['is the title of', (t) => t === key],
    ['is the title, ignoring case, of', (t) => t.toLowerCase() === lower],
    ['is part of the title of', (t) => key !== '' && t.toLowerCase().includes(lower)],
  ];
  for (const [how, match] of steps) {
    const found = studies.filter((s) => match(nfc(s.title)));
    if (found.length === 1) return whole(found[0]);
    if (found.length > 1) refuseSeveral(ref, found, how);
  }
  const list = studies.map((s) => `"${s.title}" (${s.id})`).join(', ');
  throw new InputError(`The backup has no study with the id or name "${ref}", or with a title that contains it; it holds ${studies.length === 0 ? 'no studies' : list}`);
}

/** The current state of every logged run of a study in a backup, by planned run. Cost: linear in
 * the revisions (a map by run), plus sorting each run's history. */
export function studyRuns(backup: Pick<Backup, 'payload'>, studyId: string): LoggedRun[] {
  const byRun = new Map<string, RunRevision[]>();
  for (const r of backup.payload.revisions) {
    if (r.studyId !== studyId) continue;
    const list = byRun.get(r.runId);
    if (list) list.push(r);
    else byRun.set(r.runId, [r]);
  }
  return [...byRun.values()].map(currentRun).sort((a, b) => a.plannedRun - b.plannedRun || (a.id < b.id ? -1 : 1));
}

/**
 * The analysis data of one response of one study in a backup file: the study chosen by id or
 * name (an ambiguous name is refused listing the ids), the current state of each logged run,
 * coded ACTUAL settings, excluded runs and runs without a value skipped and counted in the messages,
 * several readings of one run averaged. Reads and checks the whole file first (readBackupSync).
 * Example: backupResponseData(text, 'Invented demo: coating line trial', 'Gloss').y -> [..].
 */
export function backupResponseData(backupText: string, studyRef: string, responseName: string): ResponseData {
  return backupResponseDataOf(readBackupSync(backupText), studyRef, responseName);
}

/** The same, from a backup already read and checked (the command line reads a file once). */
export function backupResponseDataOf(backup: Pick<Backup, 'payload'>, studyRef: string, responseName: string): ResponseData {
  const study = selectStudy(backup, studyRef);
  const runs = studyRuns(backup, study.id);
  const data = responseDataFromRuns(study, runs, responseName);
  // Runs edited in two places are named with both values (the current one is still the one used).
  const split = backupDivergedRuns(backup, runs);
  return split.length === 0 ? data : { ...data, messages: [...data.messages, ...split.map((d) => divergedNote(study, d))] };
}

/** The runs among `runs` (of a backup) with two or more current revisions, each with those revisions. */
export function backupDivergedRuns(backup: Pick<Backup, 'payload'>, runs: readonly LoggedRun[]): DivergedRun[] {
  if (runs.every((r) => r.heads.length < 2)) return [];
  const byId = new Map(backup.payload.revisions.map((r) => [r.id, r]));
  return divergedRuns(runs, (id) => byId.get(id));
}
