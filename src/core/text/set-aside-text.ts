/**
 * The sentences of the set-aside screen and of the count line that leads to it: what a record
 * set aside by an import is (a study's plan or a run's revision), which study and run it
 * belongs to, why it was set aside (the merge's own reason), when and from which device.
 * Example: setAsideWhat({ kind: 'revision', plannedRun: 3, ... }, 'Cure trial') ->
 * 'A revision of run 3 of "Cure trial"'.
 */
import type { PathValue } from '../records/value-at-path.ts';
import { shortNumber } from './number-text.ts';

/** What the sentences need of one set-aside record (the store's row has these fields and more). */
export interface SetAsideFacts {
  readonly kind: 'study' | 'revision';
  /** The record's id. */
  readonly id: string;
  readonly studyId: string;
  /** The planned run of a revision; null for a study. */
  readonly plannedRun: number | null;
  /** The first field that differs from the device's record with the same id ('' for the whole
   * record); null for a record set aside because it depends on another one. */
  readonly field: string | null;
  /** Why, in a sentence. */
  readonly reason: string;
  /** The device that wrote the file, when known. */
  readonly fromDevice: string | null;
}

/** The heading of one record: what it is and where it belongs; the study by its title when this device holds it. */
export function setAsideWhat(s: SetAsideFacts, studyTitle: string | null): string {
  const study = studyTitle === null ? `a study that is not on this device (id ${s.studyId})` : `"${studyTitle}"`;
  if (s.kind === 'study') return studyTitle === null ? `The plan of a study (id ${s.studyId})` : `Another copy of the plan of ${study}`;
  return `A revision of run ${s.plannedRun ?? '?'} of ${study}`;
}

/** Why, in one short line before the merge's full reason: a clash on a field, or a record that depends on one. */
export function setAsideWhy(s: Pick<SetAsideFacts, 'field'>): string {
  if (s.field === null) return 'It depends on another record that was set aside.';
  return `It has the id of a record on this device but other content (${s.field === '' ? 'the whole record' : s.field} differs).`;
}

/** Where the file came from, when it says. */
export function setAsideFrom(s: Pick<SetAsideFacts, 'fromDevice'>): string {
  return s.fromDevice === null ? 'The file did not say which device wrote it.' : `Written by device ${s.fromDevice}.`;
}

/** The count line on the export screen; empty for none. */
export function setAsideCountLine(n: number): string {
  if (!Number.isSafeInteger(n) || n <= 0) return '';
  return `${n} ${n === 1 ? 'record' : 'records'} from imported files ${n === 1 ? 'was' : 'were'} set aside, not merged. ${n === 1 ? 'It is' : 'They are'} kept on this device.`;
}

/** The screen's opening paragraph. */
export const SET_ASIDE_INTRO =
  "These records came in imported files but clash with records on this device (the same id, other content), or depend on such a record. The device's records were kept as they were; these are used in no study or analysis. Save them to a file for whoever manages the records.";

/** When nothing is set aside. */
export const SET_ASIDE_NONE = 'No records are set aside on this device: every imported record was merged or was already here.';

/** The question before one record is removed, and what it means. */
export function setAsideConfirm(s: SetAsideFacts, studyTitle: string | null, savedToFile: boolean): string {
  const first = `Remove this set-aside record (${setAsideWhat(s, studyTitle)}) from this device for good?`;
  const saved = savedToFile
    ? 'It is in the file you saved on this screen.'
    : 'It has not been saved to a file on this screen: save the records first if you may need it.';
  return `${first} ${saved} The device's own records are not changed either way.`;
}

/** What became of the file of set-aside records. */
export function setAsideSaved(outcome: 'shared' | 'cancelled' | 'downloaded', name: string, n: number): string {
  if (outcome === 'cancelled') return 'Sharing was cancelled; nothing was sent and every record stays here.';
  const what = `${n} set-aside ${n === 1 ? 'record' : 'records'}`;
  return outcome === 'shared' ? `${name} (${what}) was handed to the share sheet. The records also stay here.` : `${name} (${what}) is downloading. The records also stay here.`;
}

/** After a removal. */
export function setAsideRemoved(what: string): string {
  return `${what} was removed from the set-aside records. The device's own records were not changed.`;
}

/** One side's value for the values line: numbers short, text quoted, lists and records as JSON cut to 60 characters. */
function valueText(v: PathValue): string {
  if (!v.found) return 'nothing';
  if (typeof v.value === 'number') return shortNumber(v.value);
  if (typeof v.value === 'string') return JSON.stringify(v.value);
  const json = JSON.stringify(v.value);
  return json.length > 60 ? `${json.slice(0, 59)}…` : json;
}

/** Both sides where the records differ: "In the file: 75.4; on this device: 70.4." */
export function setAsideValues(inFile: PathValue, onDevice: PathValue): string {
  return `In the file: ${valueText(inFile)}; on this device: ${valueText(onDevice)}.`;
}
