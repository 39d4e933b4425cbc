/**
 * The record checks that span several revisions: whole histories, and ids unique in a list.
 */
import { InputError } from '../errors.ts';
import type { RunRevision } from '../study/study.ts';

/**
 * Checks that revisions form whole histories: ids unique, every parent (and restored-from) a
 * revision of the same logged run with a smaller counter, one study and planned run per logged
 * run. Method: common practice for an append-only history (each revision names the ones it was
 * built on). Cost: linear in the revisions and their parents. Throws InputError at the first
 * problem. Example: a revision whose parent is missing throws "...parents[0]: needs a revision in
 * this file, got ...".
 */
export function checkHistories(revisions: readonly RunRevision[], path: string): void {
  const byId = new Map<string, number>();
  revisions.forEach((r, i) => {
    if (byId.has(r.id)) throw new InputError(`${path}[${i}].id: revision ids must differ, got "${r.id}" twice (also at [${byId.get(r.id)}])`);
    byId.set(r.id, i);
  });
  const runOf = new Map<string, RunRevision>();
  revisions.forEach((r, i) => {
    const first = runOf.get(r.runId);
    if (!first) runOf.set(r.runId, r);
    else if (first.studyId !== r.studyId || first.plannedRun !== r.plannedRun) {
      throw new InputError(`${path}[${i}]: logged run "${r.runId}" needs one study and planned run in all its revisions, got run ${r.plannedRun} of "${r.studyId}" and run ${first.plannedRun} of "${first.studyId}"`);
    }
    const related = [...r.parents.map((p, j) => [p, `parents[${j}]`] as const), ...(r.restoredFrom ? [[r.restoredFrom, 'restoredFrom'] as const] : [])];
    for (const [pid, field] of related) {
      const at = byId.get(pid);
      if (at === undefined) throw new InputError(`${path}[${i}].${field}: needs a revision in this file, got "${pid}", which it does not hold`);
      const p = revisions[at];
      if (p.runId !== r.runId) throw new InputError(`${path}[${i}].${field}: needs a revision of the same logged run, got one of "${p.runId}"`);
      if (p.rev >= r.rev) throw new InputError(`${path}[${i}].rev: needs a counter above its earlier revision's (${p.rev}), got ${r.rev}`);
    }
  });
}

/**
 * Refuses a second record with the same id in one list. Cost: linear. Throws InputError naming
 * both places. Example: checkUniqueIds([{id:'a'},{id:'a'}], 'studies', 'study') throws
 * 'studies[1].id: study ids must differ, got "a" twice (also at [0])'.
 */
export function checkUniqueIds(items: readonly { id: string }[], path: string, what: string): void {
  const seen = new Map<string, number>();
  items.forEach((s, i) => {
    if (seen.has(s.id)) throw new InputError(`${path}[${i}].id: ${what} ids must differ, got "${s.id}" twice (also at [${seen.get(s.id)}])`);
    seen.set(s.id, i);
  });
}
