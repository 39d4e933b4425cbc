/**
 * Drafts: whatever a person has typed in a run's form and not saved, kept on every change so it
 * comes back after a reload, a crash or an update. Each open form keeps its own draft (by its
 * form id), so two or three tabs on one run never write over each other's typing. Saving a run
 * drops, in the same transaction, every draft of that run that holds exactly what was saved, so
 * a draft is never both saved and waiting; a draft of other typing stays.
 */
import type { RunForm } from '../core/study/run-form.ts';
import type { Draft } from './db.ts';
import { guarded } from './errors.ts';
import type { Store } from './store.ts';

/** Which form a draft belongs to: the ids its form fixed when it opened (a run form's state has them all). */
export type DraftOwner = Pick<Draft, 'formId' | 'runId' | 'studyId' | 'plannedRun' | 'revisionId' | 'parents'>;

/** Keeps the typing of a run's form as its draft (called on every change). */
export async function saveDraft(store: Store, state: DraftOwner, form: RunForm): Promise<Draft> {
  const draft: Draft = {
    formId: state.formId,
    runId: state.runId,
    studyId: state.studyId,
    plannedRun: state.plannedRun,
    revisionId: state.revisionId,
    parents: [...state.parents],
    form: structuredCloneForm(form),
    updatedAt: store.now().toISOString(),
  };
  const write = guarded(() => store.db.transaction('rw', store.db.formDrafts, () => store.db.formDrafts.put(draft)));
  store.pending.add(write);
  try {
    await write;
  } finally {
    store.pending.delete(write);
  }
  return draft;
}

function structuredCloneForm(form: RunForm): RunForm {
  return {
    actual: [...form.actual],
    readings: [...form.readings],
    loggedAt: form.loggedAt,
    operator: form.operator,
    notes: form.notes,
    excluded: form.excluded,
    reason: form.reason,
  };
}

/** The draft of one open form (by its form id), or null. */
export async function getDraft(store: Store, formId: string): Promise<Draft | null> {
  return (await guarded(() => store.db.formDrafts.get(formId))) ?? null;
}

/** Every draft of one logged run (one per form that holds typing for it), oldest change first. */
export async function listRunDrafts(store: Store, runId: string): Promise<Draft[]> {
  const all = await guarded(() => store.db.formDrafts.where('runId').equals(runId).toArray());
  return all.sort((a, b) => (a.updatedAt < b.updatedAt ? -1 : 1));
}

/** All drafts of a study (forms typed in and not saved), oldest change first. */
export async function listDrafts(store: Store, studyId: string): Promise<Draft[]> {
  const all = await guarded(() => store.db.formDrafts.where('studyId').equals(studyId).toArray());
  return all.sort((a, b) => (a.updatedAt < b.updatedAt ? -1 : 1));
}

/** Throws away one form's draft (the person chose to discard that typing); other forms' drafts stay. */
export async function discardDraft(store: Store, formId: string): Promise<void> {
  await guarded(() => store.db.transaction('rw', store.db.formDrafts, () => store.db.formDrafts.delete(formId)));
}
