/**
 * The app's store: opened once, the demo study added on first start (never over a store that
 * held studies), and what the store says about other tabs (closed for an upgrade, blocked by an
 * older tab) and about the browser removing the records under the page.
 */
import { createModel, signal, type ReadonlySignal } from '@preact/signals';
import { openStore, type Store } from '../../store/store.ts';
import { listStudies } from '../../store/study-list.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { fetchDemoText } from '../demo/demo-file.ts';
import { heldStudiesBefore, markHeldStudies, reportCleared } from '../lib/storage-cleared.ts';

/** Said at start when the store is empty but this device held studies before (the browser removed them). */
export const RECORDS_GONE =
  "The browser removed this device's Trialbook records: this device held studies before, and its storage is now empty. The demo study was not added. Import a backup file (Export screen of a study, or the studies list) to bring the records back.";

/**
 * The demo file's text and the demo module, both started at once (the file does not wait for the
 * code). The text's promise is handled here, so a failed read is reported when the demo is added,
 * never as an unhandled rejection.
 */
function loadDemo(): Promise<{ addDemoIfEmpty: typeof import('../demo/demo-study.ts').addDemoIfEmpty; text: Promise<string> }> {
  const text = fetchDemoText();
  text.catch(() => undefined);
  return import('../demo/demo-study.ts').then((m) => ({ addDemoIfEmpty: m.addDemoIfEmpty, text }));
}

export const AppModel = createModel(() => {
  const store = signal<Store | null>(null);
  const problem = signal<Problem | null>(null);
  const closed = signal<string | null>(null);
  const blocked = signal<string | null>(null);
  const demoProblem = signal<string | null>(null);
  const recordsGone = signal<string | null>(null);
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
    /** Set at start when the store is empty but held studies before. */
    recordsGone: recordsGone as ReadonlySignal<string | null>,
    /** Set when the demo study could not be added (the app still works). */
    demoProblem: demoProblem as ReadonlySignal<string | null>,

    async start() {
      if (started) return;
      started = true;
      // A device that never held a study is on its first start: the demo's code and file are
      // fetched beside the store's opening, not after it, because the demo study's card is the
      // first screen's largest element (its paint is the largest contentful paint).
      const demo = heldStudiesBefore() ? null : loadDemo();
      demo?.catch(() => undefined);
      try {
        const s = await openStore({
          onClosed: (m) => (closed.value = m),
          onCleared: (m) => {
            closed.value = m;
            reportCleared(m);
          },
          onBlocked: (m) => (blocked.value = m),
        });
        blocked.value = null;
        const held = (await listStudies(s)).length > 0;
        if (!held && heldStudiesBefore()) {
          // Never add the demo over a store that held studies: say what happened instead.
          recordsGone.value = RECORDS_GONE;
        } else {
          try {
            // Adding the demo brings the backup import with it: loaded only for a device with no study.
            if (!held) {
              const { addDemoIfEmpty, text } = await (demo ?? loadDemo());
              await addDemoIfEmpty(s, () => text);
            }
          } catch (err) {
            demoProblem.value = `The invented demo study could not be added: ${problemOf(err).message}`;
          }
          if (held || (await listStudies(s)).length > 0) markHeldStudies();
        }
        store.value = s;
      } catch (err) {
        problem.value = problemOf(err);
      }
    },
  };
});
