/**
 * Studies: made once with their plan, then read. A study's plan never changes after it is made
 * (what was planned is the record against which the runs are read).
 */
import { InputError } from '../core/errors.ts';
import { checkStudy } from '../core/records/check-study.ts';
import type { StudyPlan, StudyRecord } from '../core/study/study.ts';
import { planOf } from './added-blocks.ts';
import { appendRevisions } from './append-revisions.ts';
import { guarded } from './errors.ts';
import { newId } from './ids.ts';
import type { Store } from './store.ts';

/**
 * Checks a plan with the record checks every stored study passes and gives it an id, this device
 * and the time from the store's clock. A response without a lower bound is stored with null.
 */
export function newStudyRecord(store: Store, plan: StudyPlan): StudyRecord {
  const { factors: _inDesign, ...design } = plan.design as StudyPlan['design'] & { factors?: unknown };
  const responses = Array.isArray(plan.responses) ? plan.responses.map((r) => (typeof r === 'object' && r !== null ? { ...r, lowerBound: r.lowerBound ?? null } : r)) : plan.responses;
  const draft = { ...plan, responses, design, id: newId(), device: store.device, createdAt: store.now().toISOString() };
  // The same checks as an import, so that every stored study can be exported and read back
  // (checked before the JSON copy: JSON would turn a NaN into null instead of refusing it).
  return JSON.parse(JSON.stringify(checkStudy(draft, 'study'))) as StudyRecord;
}

/** Makes a study from its plan and saves it; resolves once it is on disk. */
export async function createStudy(store: Store, plan: StudyPlan): Promise<StudyRecord> {
  const record = newStudyRecord(store, plan);
  const { studies } = await guarded(() => appendRevisions(store, { studies: [record] }));
  return studies[0];
}

/** All studies, newest first, each with the planned runs added to it (see added-blocks.ts). */
export async function listStudies(store: Store): Promise<StudyRecord[]> {
  const all = await guarded(() => store.db.transaction('r', [store.db.studies, store.db.blocks], async () => Promise.all((await store.db.studies.toArray()).map((s) => planOf(store, s)))));
  return all.sort((a, b) => (a.createdAt < b.createdAt ? 1 : a.createdAt > b.createdAt ? -1 : a.id < b.id ? -1 : 1));
}

/** One study by id, with the planned runs added to it; throws InputError when there is none. */
export async function getStudy(store: Store, studyId: string): Promise<StudyRecord> {
  const s = await guarded(() => store.db.transaction('r', [store.db.studies, store.db.blocks], async () => {
    const study = await store.db.studies.get(studyId);
    return study ? planOf(store, study) : undefined;
  }));
  if (!s) throw new InputError(`There is no study with id "${studyId}" on this device`);
  return s;
}
