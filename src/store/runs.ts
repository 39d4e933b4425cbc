/**
 * Logged runs and their history. A run's record id and the id of the revision its form will
 * save are fixed when the form opens, so a double tap or a retry saves once. Every change (an
 * edit, an exclusion, a restore) appends a revision; nothing is overwritten. A save that finds
 * the run changed since its form opened (another tab, another window) still keeps both
 * revisions and says so. Every open form has its own id and its own draft; a save drops the
 * run's drafts that hold what was saved (another tab's other typing stays). Each write is one transaction across all the tables it touches, and
 * resolves only once the transaction is on disk.
 */
import { InputError } from '../core/errors.ts';
import { blankForm, formFromValues, parseRunForm, type RunForm } from '../core/study/run-form.ts';
import {
  checkRunValues,
  compareRevisions,
  currentRun,
  plannedRunOf,
  type LoggedRun,
  type RunRevision,
  type RunValues,
  type StudyRecord,
} from '../core/study/study.ts';
import { divergedRuns, type DivergedRun } from '../core/study/diverged-runs.ts';
import { canonicalJson } from '../core/records/canonical-json.ts';
import { sha256, utf8Encode } from '../core/records/sha256.ts';
import { planOf } from './added-blocks.ts';
import { appendRevisions } from './append-revisions.ts';
import type { Draft } from './db.ts';
import { guarded } from './errors.ts';
import { newId, uuidFromBytes } from './ids.ts';
import { askPersistenceOnce } from './status.ts';
import type { Store } from './store.ts';

/** What a run's form works on: fixed ids, the revisions it starts from, and what to show. */
export interface RunFormState {
  /** The open form's own id: its draft's key (a tab keeps it for the session, so a reload finds its draft). */
  readonly formId: string;
  readonly study: StudyRecord;
  readonly runId: string;
  readonly plannedRun: number;
  readonly revisionId: string;
  readonly parents: readonly string[];
  readonly form: RunForm;
  /** The current saved state, or null for a new run. */
  readonly current: LoggedRun | null;
  /** True when the form comes back from a draft (typing not yet saved). */
  readonly fromDraft: boolean;
  /** Drafts of this run kept by other forms (other tabs, or tabs since closed), oldest change first. */
  readonly otherDrafts: readonly Draft[];
}

export interface SaveInput {
  readonly runId: string;
  readonly revisionId: string;
  readonly studyId: string;
  readonly plannedRun: number;
  /** The revisions current when the form opened (empty for a new run). */
  readonly parents: readonly string[];
  readonly values: RunValues;
}

export interface SaveResult {
  readonly run: LoggedRun;
  readonly revision: RunRevision;
  /** True when this revision was already saved (a second tap or a retry): nothing new was written. */
  readonly duplicate: boolean;
  /** When the run changed after the form opened: the revision that was current at saving, kept
   * in the history beside this one. Null otherwise. */
  readonly changedSince: string | null;
}

/** The study with its added blocks' runs (inside a transaction over studies and blocks). */
function studyIn(store: Store, studyId: string): Promise<StudyRecord> {
  // A Dexie promise chain, for the reason given at planOf.
  return store.db.studies.get(studyId).then((study) => {
    if (!study) throw new InputError(`There is no study with id "${studyId}" on this device`);
    return planOf(store, study);
  });
}

/**
 * Opens the form for a planned run: this form's own draft when it kept one, else the logged run
 * of the planned run, else a new run under the record id of a waiting draft of another form
 * (so two tabs never start two records of one planned run), else a new run. Other forms'
 * drafts are listed, never taken over. Deciding this in one place means reopening a form never
 * starts a second record beside a draft.
 */
export async function openPlannedRun(store: Store, studyId: string, plannedRun: number, formId: string = newId()): Promise<RunFormState> {
  const [own, runs, waiting] = await guarded(() =>
    Promise.all([
      store.db.formDrafts.get(formId),
      store.db.runs.where('studyId').equals(studyId).toArray(),
      store.db.formDrafts.where('studyId').equals(studyId).toArray(),
    ]),
  );
  if (own && own.studyId === studyId && own.plannedRun === plannedRun) return openRun(store, own.runId, formId);
  const logged = runs.find((r) => r.plannedRun === plannedRun);
  if (logged) return openRun(store, logged.id, formId);
  const draft = waiting.filter((d) => d.plannedRun === plannedRun).sort((a, b) => (a.updatedAt < b.updatedAt ? -1 : 1))[0];
  return draft ? openRun(store, draft.runId, formId) : openNewRun(store, studyId, plannedRun, formId);
}

/** Opens the form of a new logged run of a planned run, with a fresh record id (see openPlannedRun). */
export async function openNewRun(store: Store, studyId: string, plannedRun: number, formId: string = newId()): Promise<RunFormState> {
  const study = await guarded(() => studyIn(store, studyId));
  if (!plannedRunOf(study, plannedRun)) throw new InputError(`Run ${plannedRun} is not in the plan of "${study.title}"`);
  return { formId, study, runId: newId(), plannedRun, revisionId: newId(), parents: [], form: blankForm(study, plannedRun), current: null, fromDraft: false, otherDrafts: [] };
}

const byChange = (a: Draft, b: Draft) => (a.updatedAt < b.updatedAt ? -1 : 1);

/**
 * Opens the form of a logged run (a new or saved one) for one form: from that form's own draft
 * when it kept one, else from the run's current state (a blank form for a run only other forms
 * have typed in). Other forms' drafts of the run come in otherDrafts, for the person to pick.
 */
export async function openRun(store: Store, runId: string, formId: string = newId()): Promise<RunFormState> {
  return guarded(() =>
    store.db.transaction('r', [store.db.runs, store.db.formDrafts, store.db.studies, store.db.blocks], async () => {
      const [current, drafts] = await Promise.all([store.db.runs.get(runId), store.db.formDrafts.where('runId').equals(runId).toArray()]);
      const own = drafts.find((d) => d.formId === formId);
      const otherDrafts = drafts.filter((d) => d.formId !== formId).sort(byChange);
      const studyId = own?.studyId ?? current?.studyId ?? otherDrafts[0]?.studyId;
      if (!studyId) throw new InputError(`There is no logged run with id "${runId}" on this device`);
      const study = await studyIn(store, studyId);
      if (own) {
        return { formId, study, runId, plannedRun: own.plannedRun, revisionId: own.revisionId, parents: own.parents, form: own.form, current: current ?? null, fromDraft: true, otherDrafts };
      }
      if (!current) {
        const plannedRun = otherDrafts[0].plannedRun;
        return { formId, study, runId, plannedRun, revisionId: newId(), parents: [], form: blankForm(study, plannedRun), current: null, fromDraft: false, otherDrafts };
      }
      return { formId, study, runId, plannedRun: current.plannedRun, revisionId: newId(), parents: current.heads, form: formFromValues(current), current, fromDraft: false, otherDrafts };
    }),
  );
}

/**
 * Takes another form's draft into this form: its typing and the revisions it started from, under
 * this form's own id and a fresh revision id. The other draft stays as it was (its tab may still
 * be open); it goes when a save stores exactly its typing, or when the person throws it away.
 */
export function takeOtherDraft(state: RunFormState, otherFormId: string): RunFormState {
  const picked = state.otherDrafts.find((d) => d.formId === otherFormId);
  if (!picked) throw new InputError('That typing is no longer waiting: it was saved or thrown away in its own tab. Reopen the run to see what is waiting now.');
  return {
    ...state,
    runId: picked.runId,
    plannedRun: picked.plannedRun,
    revisionId: newId(),
    parents: picked.parents,
    form: picked.form,
    fromDraft: true,
    otherDrafts: state.otherDrafts.filter((d) => d.formId !== otherFormId),
  };
}

const sameSet = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((x) => b.includes(x));

const valuesKey = (v: RunValues) =>
  canonicalJson({ actual: v.actual, readings: v.readings, loggedAt: v.loggedAt, operator: v.operator, notes: v.notes, excluded: v.excluded, reason: v.reason });

/** True when a form's typing reads as exactly these values (a blank time takes the saved one: the form fills it at saving). */
function sameTyping(study: StudyRecord, form: RunForm, values: RunValues): boolean {
  try {
    const typed = form.loggedAt.trim() === '' ? { ...form, loggedAt: values.loggedAt ?? '' } : form;
    return valuesKey(checkRunValues(study, parseRunForm(study, typed))) === valuesKey(values);
  } catch {
    return false; // typing that does not read as values is not what was saved: the draft stays
  }
}

/**
 * The id a save takes when its form's revision id was already saved with other values (two
 * tabs that reopened one draft share its revision id): derived from that id and the values, so
 * a retry of the same save finds it and writes nothing new.
 */
function derivedRevisionId(revisionId: string, values: RunValues): string {
  return uuidFromBytes(sha256(utf8Encode(`${revisionId}\n${valuesKey(values)}`)));
}

/** Deletes, inside the caller's transaction, every draft of a run whose typing reads as exactly these values. */
async function dropSavedDrafts(store: Store, study: StudyRecord, runId: string, values: RunValues): Promise<void> {
  const drafts = await store.db.formDrafts.where('runId').equals(runId).toArray();
  const saved = drafts.filter((d) => sameTyping(study, d.form, values)).map((d) => d.formId);
  if (saved.length > 0) await store.db.formDrafts.bulkDelete(saved);
}

/** Appends a revision inside the caller's transaction; returns what saveRun returns. */
async function appendRevision(store: Store, input: SaveInput, restoredFrom: string | null): Promise<SaveResult> {
  const { db } = store;
  const study = await studyIn(store, input.studyId);
  if (!plannedRunOf(study, input.plannedRun)) throw new InputError(`Run ${input.plannedRun} is not in the plan of "${study.title}"`);
  const values = checkRunValues(study, input.values);
  let revisionId = input.revisionId;
  for (;;) {
    const existing = await db.revisions.get(revisionId);
    if (!existing) break;
    if (existing.runId !== input.runId) throw new InputError(`Revision id ${revisionId} is already used by another run`);
    if (valuesKey(existing) === valuesKey(values)) {
      // A second tap or a retry: nothing new. Drafts of the run whose typing is exactly what is
      // saved go (else a form would reopen from one again and again); other typing stays.
      await dropSavedDrafts(store, study, input.runId, values);
      const run = await db.runs.get(input.runId);
      return { run: run!, revision: existing, duplicate: true, changedSince: null };
    }
    // The same form id saved with other values (another tab on the same draft): this save is
    // another edit, kept beside that one.
    revisionId = derivedRevisionId(revisionId, values);
  }
  const history = await db.revisions.where('runId').equals(input.runId).toArray();
  if (history.length > 0 && (history[0].studyId !== input.studyId || history[0].plannedRun !== input.plannedRun)) {
    throw new InputError(`Logged run ${input.runId} belongs to run ${history[0].plannedRun}; it cannot be saved as run ${input.plannedRun}`);
  }
  const ids = new Set(history.map((r) => r.id));
  const unknown = input.parents.find((p) => !ids.has(p));
  if (unknown) throw new InputError(`The form started from revision ${unknown}, which this run does not have`);
  const before = history.length > 0 ? currentRun(history) : null;
  const changedSince = before && !sameSet(before.heads, input.parents) ? before.revisionId : null;
  const rev = history.reduce((m, r) => Math.max(m, r.rev), 0) + 1;
  // The one write path: the record checks, this device, the store's clock, the run's new state.
  const appended = await appendRevisions(store, {
    made: [{ id: revisionId, runId: input.runId, studyId: input.studyId, plannedRun: input.plannedRun, rev, parents: [...input.parents], restoredFrom, ...values }],
  });
  const revision = appended.revisions[0];
  const run = appended.runs[0];
  // The run's drafts go only when they hold what was just saved: a draft of other typing
  // (another tab's form on this run) stays, so no typing is lost.
  await dropSavedDrafts(store, study, input.runId, values);
  return { run, revision, duplicate: false, changedSince };
}

async function writeRevision(store: Store, input: SaveInput, restoredFrom: string | null = null): Promise<SaveResult> {
  const { db } = store;
  const result = await guarded(() =>
    db.transaction('rw', [db.studies, db.revisions, db.runs, db.formDrafts, db.blocks], () => appendRevision(store, input, restoredFrom)),
  );
  if (!result.duplicate) void askPersistenceOnce(store);
  return result;
}

/** Saves a run's values as a new revision (and drops its draft when the draft holds these values); resolves once on disk. */
export async function saveRun(store: Store, input: SaveInput): Promise<SaveResult> {
  return writeRevision(store, input);
}

/** The current state of one logged run; throws when there is none. */
export async function getRun(store: Store, runId: string): Promise<LoggedRun> {
  const run = await guarded(() => store.db.runs.get(runId));
  if (!run) throw new InputError(`There is no logged run with id "${runId}" on this device`);
  return run;
}

/** The current state of every logged run of a study, by planned run. */
export async function listRuns(store: Store, studyId: string): Promise<LoggedRun[]> {
  const runs = await guarded(() => store.db.runs.where('studyId').equals(studyId).toArray());
  return runs.sort((a, b) => a.plannedRun - b.plannedRun || (a.id < b.id ? -1 : 1));
}

/** The logged runs of a study with two or more current revisions (edits that diverged), each with those revisions. */
export async function listDivergedRuns(store: Store, studyId: string, runs?: readonly LoggedRun[]): Promise<DivergedRun[]> {
  const all = runs ?? (await listRuns(store, studyId));
  const split = all.filter((r) => r.heads.length > 1);
  if (split.length === 0) return [];
  const heads = await guarded(() => store.db.revisions.bulkGet(split.flatMap((r) => [...r.heads])));
  const byId = new Map(heads.filter((r): r is RunRevision => r !== undefined).map((r) => [r.id, r]));
  return divergedRuns(split, (id) => byId.get(id));
}

/** Every revision of a logged run, oldest first (the last one is current). */
export async function runHistory(store: Store, runId: string): Promise<RunRevision[]> {
  const revs = await guarded(() => store.db.revisions.where('runId').equals(runId).toArray());
  return revs.sort(compareRevisions);
}

async function changeCurrent(store: Store, runId: string, change: (run: LoggedRun) => RunValues, revisionId: string, restoredFrom: string | null = null): Promise<SaveResult> {
  const run = await getRun(store, runId);
  return writeRevision(store, { runId, revisionId, studyId: run.studyId, plannedRun: run.plannedRun, parents: run.heads, values: change(run) }, restoredFrom);
}

/** Excludes a run from the analysis, with a reason, as a new revision. */
export async function excludeRun(store: Store, runId: string, reason: string, revisionId: string = newId()): Promise<SaveResult> {
  if (reason.trim() === '') throw new InputError('Excluding a run needs a reason, got none');
  return changeCurrent(store, runId, (r) => ({ ...r, excluded: true, reason }), revisionId);
}

/** Takes an excluded run back into the analysis, as a new revision. */
export async function readmitRun(store: Store, runId: string, revisionId: string = newId()): Promise<SaveResult> {
  return changeCurrent(store, runId, (r) => ({ ...r, excluded: false, reason: '' }), revisionId);
}

/** Brings back the values of an earlier revision as a new revision (the history keeps all). */
export async function restoreRevision(store: Store, runId: string, fromRevisionId: string, revisionId: string = newId()): Promise<SaveResult> {
  const old = await guarded(() => store.db.revisions.get(fromRevisionId));
  if (!old || old.runId !== runId) throw new InputError(`Run ${runId} has no revision ${fromRevisionId}`);
  const { actual, readings, loggedAt, operator, notes, excluded, reason } = old;
  return changeCurrent(store, runId, () => ({ actual, readings, loggedAt, operator, notes, excluded, reason }), revisionId, fromRevisionId);
}
