/**
 * The history of one logged run, for the phone: every revision, newest first, with what changed
 * from the revision it was made from, in plain words. Order is the revision order of the store
 * (the revision counter, then device, then id), never the clock. Restoring an earlier revision
 * adds a new revision; nothing is deleted. A restore that fails changes nothing and says why.
 * A long history is shown in pages, newest first (HISTORY_PAGE at a time).
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import { compareRevisions, type RunRevision, type StudyRecord } from '../../core/study/study.ts';
import { restoreRevision, runHistory } from '../../store/runs.ts';
import type { Store } from '../../store/store.ts';
import { num, setting, when } from '../lib/format.ts';
import { problemOf, type Problem } from '../lib/problem.ts';

/** One revision as the history list shows it. */
export interface HistoryEntry {
  readonly revision: RunRevision;
  /** 1 for the oldest, in revision order. */
  readonly number: number;
  readonly isCurrent: boolean;
  /** The revision number this one restored, or null. */
  readonly restoredFromNumber: number | null;
  /** True when another revision was made from the same revision as this one (diverged edits). */
  readonly sharesParent: boolean;
  /** True when every revision made from the same start as this one was saved by one device (two tabs or windows). */
  readonly forkOnThisDevice: boolean;
  /** What changed from the revision it was made from, one phrase each; empty when nothing did. */
  readonly changes: readonly string[];
  /** True for the first revision (there is nothing before it). */
  readonly first: boolean;
}

const readingsText = (r: readonly number[]) => (r.length === 0 ? 'none' : r.map((x) => num(x, 6)).join('; '));
const quoted = (s: string) => `"${s}"`;

/** What changed from `before` to `after`, in plain words ("Gloss 88.6 -> 88.9", "excluded: seal leak"). */
export function describeChanges(study: Pick<StudyRecord, 'factors' | 'responses'>, before: RunRevision, after: RunRevision): string[] {
  const out: string[] = [];
  study.factors.forEach((f, i) => {
    const a = before.actual[i];
    const b = after.actual[i];
    if (a !== b) {
      const unit = f.kind === 'numeric' ? f.unit : undefined;
      out.push(`${f.name} ${setting(a, unit)} -> ${setting(b, unit)}`);
    }
  });
  study.responses.forEach((r, i) => {
    const a = before.readings[i] ?? [];
    const b = after.readings[i] ?? [];
    if (readingsText(a) !== readingsText(b)) out.push(`${r.name} ${readingsText(a)} -> ${readingsText(b)}`);
  });
  if (before.loggedAt !== after.loggedAt) out.push(`time of run ${when(before.loggedAt)} -> ${when(after.loggedAt)}`);
  if ((before.operator ?? '') !== (after.operator ?? '')) out.push(after.operator ? `operator: ${after.operator}` : 'operator removed');
  if (before.notes !== after.notes) out.push(after.notes === '' ? 'notes removed' : `notes: ${quoted(after.notes)}`);
  if (!before.excluded && after.excluded) out.push(`excluded: ${after.reason}`);
  else if (before.excluded && !after.excluded) out.push('used in the analysis again');
  else if (after.excluded && before.reason !== after.reason) out.push(`reason for excluding: ${after.reason}`);
  return out;
}

/** The history entries of a run's revisions, newest first. */
export function historyEntries(study: Pick<StudyRecord, 'factors' | 'responses'>, revisions: readonly RunRevision[]): HistoryEntry[] {
  const sorted = [...revisions].sort(compareRevisions);
  const numberOf = new Map(sorted.map((r, i) => [r.id, i + 1]));
  const byId = new Map(sorted.map((r) => [r.id, r]));
  // How many revisions were made from each starting point ('' for "from nothing").
  const starts = new Map<string, number>();
  const startDevices = new Map<string, Set<string>>();
  for (const r of sorted) {
    const keys = r.parents.length === 0 ? [''] : r.parents;
    for (const k of keys) {
      starts.set(k, (starts.get(k) ?? 0) + 1);
      startDevices.set(k, (startDevices.get(k) ?? new Set()).add(r.device));
    }
  }
  const entries = sorted.map((r, i): HistoryEntry => {
    const parent = r.parents.map((p) => byId.get(p)).filter((p): p is RunRevision => p !== undefined).sort(compareRevisions).at(-1);
    const before = parent ?? (i > 0 ? sorted[i - 1] : undefined);
    const keys = r.parents.length === 0 ? [''] : r.parents;
    return {
      revision: r,
      number: i + 1,
      isCurrent: i === sorted.length - 1,
      restoredFromNumber: r.restoredFrom ? (numberOf.get(r.restoredFrom) ?? null) : null,
      sharesParent: keys.some((k) => (starts.get(k) ?? 0) > 1),
      forkOnThisDevice: keys.filter((k) => (starts.get(k) ?? 0) > 1).every((k) => startDevices.get(k)!.size === 1),
      changes: before ? describeChanges(study, before, r) : [],
      first: i === 0,
    };
  });
  return entries.reverse();
}

export type RestoreState = 'idle' | 'restoring' | 'restored';

/** How many revisions the history shows at first, and how many more each "older" tap adds: a
 * long history (thousands of revisions) opens and closes at once. Our own choice: a page fits a
 * few phone screens. */
export const HISTORY_PAGE = 20;

export const RunHistoryModel = createModel((store: Store, study: StudyRecord, runId: string) => {
  const revisions = signal<RunRevision[] | null>(null);
  const problem = signal<Problem | null>(null);
  /** The revision whose restore is waiting for a yes, or null. */
  const confirming = signal<string | null>(null);
  const restoreState = signal<RestoreState>('idle');
  /** The revision number of the last restore's new revision, and the one it brought back. */
  const lastRestore = signal<{ from: number; to: number } | null>(null);
  const shownCount = signal(HISTORY_PAGE);
  const entries = computed(() => (revisions.value ? historyEntries(study, revisions.value) : []));

  async function load() {
    try {
      revisions.value = await runHistory(store, runId);
    } catch (err) {
      problem.value = problemOf(err);
    }
  }

  return {
    revisions: revisions as ReadonlySignal<RunRevision[] | null>,
    entries,
    /** The newest entries, as many as are shown (HISTORY_PAGE at first). */
    shownEntries: computed(() => entries.value.slice(0, shownCount.value)),
    /** How many older revisions are not shown yet. */
    hiddenCount: computed(() => Math.max(0, entries.value.length - shownCount.value)),
    /** Shows the next page of older revisions. */
    showOlder() {
      shownCount.value += HISTORY_PAGE;
    },
    problem: problem as ReadonlySignal<Problem | null>,
    confirming: confirming as ReadonlySignal<string | null>,
    restoreState: restoreState as ReadonlySignal<RestoreState>,
    lastRestore: lastRestore as ReadonlySignal<{ from: number; to: number } | null>,
    load,
    ask(revisionId: string | null) {
      confirming.value = revisionId;
      if (revisionId) lastRestore.value = null;
    },
    /** Restores the revision waiting for a yes; true when a new revision was written. */
    async restore(): Promise<boolean> {
      const from = confirming.peek();
      if (!from || restoreState.peek() === 'restoring') return false;
      const fromNumber = historyEntries(study, revisions.peek() ?? []).find((e) => e.revision.id === from)?.number ?? 0;
      restoreState.value = 'restoring';
      problem.value = null;
      try {
        const result = await restoreRevision(store, runId, from);
        await load();
        confirming.value = null;
        lastRestore.value = { from: fromNumber, to: result.run.revisions };
        restoreState.value = 'restored';
        return true;
      } catch (err) {
        problem.value = problemOf(err);
        restoreState.value = 'idle';
        return false;
      }
    },
  };
});
