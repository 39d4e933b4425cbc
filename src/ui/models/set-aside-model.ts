/**
 * The records set aside by imports: the list (oldest first) with each study's title where this
 * device holds the study, the file of all of them (share sheet or download), and the removal of
 * one, which the screen does only after the person confirms it there. Nothing here writes to the
 * studies or their runs.
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import { valueAtPath } from '../../core/records/value-at-path.ts';
import { setAsideRemoved, setAsideSaved, setAsideValues, setAsideWhat } from '../../core/text/set-aside-text.ts';
import { writeSetAsideFile } from '../../io/backup/set-aside-file.ts';
import type { SetAsideRow } from '../../store/db.ts';
import { listSetAside, removeSetAside, storedRecordOf } from '../../store/set-aside.ts';
import { listStudies } from '../../store/study-list.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { saveText } from '../lib/save-file.ts';

/** The file's name: 'trialbook-set-aside-2026-12-03.json'. */
export function setAsideFileName(date = new Date()): string {
  return `trialbook-set-aside-${date.toISOString().slice(0, 10)}.json`;
}

export const SetAsideModel = createModel((store: Store) => {
  const rows = signal<SetAsideRow[] | null>(null);
  const titles = signal<ReadonlyMap<string, string>>(new Map());
  const problem = signal<Problem | null>(null);
  const done = signal<string | null>(null);
  const busy = signal(false);
  /** The keys of the records that were in a file saved (or shared) from this screen. */
  const saved = signal<ReadonlySet<string>>(new Set());
  /** The record whose removal waits for the person's answer. */
  const confirming = signal<string | null>(null);

  /** For each record that clashes on a field: what the file and this device hold there. */
  const values = signal<ReadonlyMap<string, string>>(new Map());

  async function refresh() {
    const [list, studies] = await Promise.all([listSetAside(store), listStudies(store)]);
    const both = new Map<string, string>();
    for (const r of list) {
      if (r.field === null) continue;
      const stored = await storedRecordOf(store, r);
      if (stored !== undefined) both.set(r.key, setAsideValues(valueAtPath(r.record, r.field), valueAtPath(stored, r.field)));
    }
    titles.value = new Map(studies.map((s) => [s.id, s.title]));
    values.value = both;
    rows.value = list;
  }

  async function run(task: () => Promise<string | null>) {
    if (busy.peek()) return;
    busy.value = true;
    problem.value = null;
    done.value = null;
    try {
      done.value = await task();
    } catch (err) {
      problem.value = problemOf(err);
    } finally {
      busy.value = false;
    }
  }

  return {
    rows: rows as ReadonlySignal<SetAsideRow[] | null>,
    loading: computed(() => rows.value === null && problem.value === null),
    problem: problem as ReadonlySignal<Problem | null>,
    done: done as ReadonlySignal<string | null>,
    busy: busy as ReadonlySignal<boolean>,
    saved: saved as ReadonlySignal<ReadonlySet<string>>,
    confirming: confirming as ReadonlySignal<string | null>,
    /** The study's title when this device holds it, else null. */
    titleOf: (studyId: string): string | null => titles.value.get(studyId) ?? null,
    /** "In the file: …; on this device: …." for a record that clashes on a field, else null. */
    valuesOf: (key: string): string | null => values.value.get(key) ?? null,

    async load() {
      try {
        await refresh();
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
    /** Every set-aside record in one file, through the share sheet where the browser accepts it, else downloaded. */
    saveAll() {
      return run(async () => {
        const list = rows.peek() ?? [];
        const text = await writeSetAsideFile(list, { device: store.device, exportedAt: store.now().toISOString() });
        const name = setAsideFileName(store.now());
        const outcome = await saveText(text, name, 'application/json', 'Trialbook: set-aside records');
        if (outcome !== 'cancelled') saved.value = new Set([...saved.peek(), ...list.map((r) => r.key)]);
        return setAsideSaved(outcome, name, list.length);
      });
    },
    /** First step of a removal: asks; nothing is removed yet. */
    askRemove(key: string) {
      done.value = null;
      confirming.value = key;
    },
    /** The person kept the record. */
    cancelRemove() {
      confirming.value = null;
    },
    /** Second step, on the person's explicit yes: removes that one record. */
    confirmRemove(key: string) {
      if (confirming.peek() !== key) return Promise.resolve();
      return run(async () => {
        const row = (rows.peek() ?? []).find((r) => r.key === key);
        const what = row ? setAsideWhat(row, titles.peek().get(row.studyId) ?? null) : 'The record';
        const removed = await removeSetAside(store, key);
        confirming.value = null;
        await refresh();
        return removed ? setAsideRemoved(what) : null;
      });
    },
  };
});
