/**
 * What the list of studies reads: the studies, newest first, how many planned runs each has
 * beyond its own plan (added blocks: path, foldover or confirmation runs), and how many of its
 * planned runs have a logged run. Reads only, in their own file, so the first screen does not load the write
 * path (the record checks, revisions and run forms) with them.
 */
import type { StudyRecord } from '../core/study/study.ts';
import { guarded } from './errors.ts';
import type { Store } from './store.ts';

/** All studies, newest first (ties by id). */
export async function listStudies(store: Store): Promise<StudyRecord[]> {
  const all = await guarded(() => store.db.studies.toArray());
  return all.sort((a, b) => (a.createdAt < b.createdAt ? 1 : a.createdAt > b.createdAt ? -1 : a.id < b.id ? -1 : 1));
}

/** For each study with logged runs, the number of its planned runs that have at least one (one pass over the runs). */
export async function loggedPlannedRuns(store: Store): Promise<Map<string, number>> {
  const planned = new Map<string, Set<number>>();
  await guarded(() =>
    store.db.runs.each((run) => {
      let set = planned.get(run.studyId);
      if (!set) planned.set(run.studyId, (set = new Set()));
      set.add(run.plannedRun);
    }),
  );
  return new Map([...planned].map(([id, set]) => [id, set.size]));
}

/** For each study with added blocks, the number of planned runs they add (one pass over the blocks). */
export async function addedPlannedRuns(store: Store): Promise<Map<string, number>> {
  const added = new Map<string, number>();
  await guarded(() => store.db.blocks.each((block) => void added.set(block.studyId, (added.get(block.studyId) ?? 0) + block.runs.length)));
  return added;
}
