/**
 * Diverged edits: a logged run with more than one current revision (revisions nobody has built
 * on), because it was changed in two places (two devices, or two tabs of one) from the same
 * revision. The current value stays the one the revision order decides (compareRevisions);
 * this lists every such run with all its current revisions, so that screens, reports and
 * exports can say so and show each value.
 * Cost O(runs + heads).
 * Example: a run with heads [r2, r3] gives { plannedRun, current: r3, others: [r2] }.
 */
import { compareRevisions, type LoggedRun, type RunRevision } from './study.ts';

/** A run with two or more current revisions. */
export interface DivergedRun {
  readonly runId: string;
  readonly studyId: string;
  readonly plannedRun: number;
  /** The revision the revision order makes current (what the analysis uses). */
  readonly current: RunRevision;
  /** The other current revisions, in revision order. */
  readonly others: readonly RunRevision[];
  /** True when every current revision was saved by one device (two tabs or windows). */
  readonly oneDevice: boolean;
}

/**
 * The runs among `runs` whose edits diverged, by planned run, with their current revisions
 * looked up by id (a head that cannot be found is left out; a run left with one is not listed).
 */
export function divergedRuns(runs: readonly LoggedRun[], revisionOf: (id: string) => RunRevision | undefined): DivergedRun[] {
  const out: DivergedRun[] = [];
  for (const run of runs) {
    if (run.heads.length < 2) continue;
    const heads = run.heads.map(revisionOf).filter((r): r is RunRevision => r !== undefined).sort(compareRevisions);
    if (heads.length < 2) continue;
    const current = heads[heads.length - 1];
    out.push({
      runId: run.id,
      studyId: run.studyId,
      plannedRun: run.plannedRun,
      current,
      others: heads.slice(0, -1),
      oneDevice: heads.every((h) => h.device === current.device),
    });
  }
  return out.sort((a, b) => a.plannedRun - b.plannedRun || (a.runId < b.runId ? -1 : 1));
}
