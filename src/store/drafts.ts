/**
 * Drafts: whatever a person has typed in a run's form and not saved, kept on every change so it
 * comes back after a reload, a crash or an update. Saving the run drops its draft in the same
 * transaction, so a draft is never both saved and waiting.
 */
import type { RunForm } from '../core/study/run-form.ts';
import type { Draft } from './db.ts';
import { guarded } from './errors.ts';
import type { Store } from './store.ts';

/** Which form a draft belongs to: the ids its form fixed when it opened (a run form's state has them all). */
export type DraftOwner = Pick<Draft, 'runId' | 'studyId' | 'plannedRun' | 'revisionId' | 'parents'>;

/** Keeps the typing of a run's form as its draft (called on every change). */
export async function saveDraft(store: Store, state: DraftOwner, form: RunForm): Promise<Draft> {
  const draft: Draft = {
    runId: state.runId,
    studyId: state.studyId,
    plannedRun: state.plannedRun,
    revisionId: state.revisionId,
    parents: [...state.parents],
    form: structuredCloneForm(form),
    updatedAt: store.now().toISOString(),
  };
  const write = guarded(() => store.db.transaction('rw', store.db.drafts, () => store.db.drafts.put(draft)));
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

/** The draft of a run's form, or null. */
export async function getDraft(store: Store, runId: string): Promise<Draft | null> {
  return (await guarded(() => store.db.drafts.get(runId))) ?? null;
}

/** All drafts of a study (forms typed in and not saved), oldest change first. */
export async function listDrafts(store: Store, studyId: string): Promise<Draft[]> {
  const all = await guarded(() => store.db.drafts.where('studyId').equals(studyId).toArray());
  return all.sort((a, b) => (a.updatedAt < b.updatedAt ? -1 : 1));
}

/** Throws away a run form's draft (the person chose to discard the typing). */
export async function discardDraft(store: Store, runId: string): Promise<void> {
  await guarded(() => store.db.transaction('rw', store.db.drafts, () => store.db.drafts.delete(runId)));
}
