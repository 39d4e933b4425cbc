/**
 * The app's store: opened once, the demo study added on first start, and what the store says
 * about other tabs (closed for an upgrade, blocked by an older tab).
 */
import { createModel, signal, type ReadonlySignal } from '@preact/signals';
import { openStore, type Store } from '../../store/store.ts';
import { listStudies } from '../../store/study-list.ts';
import { problemOf, type Problem } from '../lib/problem.ts';

export const AppModel = createModel(() => {
  const store = signal<Store | null>(null);
  const problem = signal<Problem | null>(null);
  const closed = signal<string | null>(null);
  const blocked = signal<string | null>(null);
  const demoProblem = signal<string | null>(null);
  let started = false;

  return {
    /** The open store, or null while opening (or when it could not be opened). */
    store: store as ReadonlySignal<Store | null>,
    /** Why the store could not be opened. */
    problem: problem as ReadonlySignal<Problem | null>,
    /** Set when another tab upgraded the database and this tab closed it. */
    closed: closed as ReadonlySignal<string | null>,
    /** Set while opening waits for another tab. */
    blocked: blocked as ReadonlySignal<string | null>,
    /** Set when the demo study could not be added (the app still works). */
    demoProblem: demoProblem as ReadonlySignal<string | null>,

    async start() {
      if (started) return;
      started = true;
      try {
        const s = await openStore({
          onClosed: (m) => (closed.value = m),
          onBlocked: (m) => (blocked.value = m),
        });
        blocked.value = null;
        try {
          // Adding the demo brings the backup import with it: loaded only for a device with no study.
          if ((await listStudies(s)).length === 0) await (await import('../demo/demo-study.ts')).addDemoIfEmpty(s);
        } catch (err) {
          demoProblem.value = `The invented demo study could not be added: ${problemOf(err).message}`;
        }
        store.value = s;
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
  };
});
