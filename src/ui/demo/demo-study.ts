/**
 * The invented demo study: on first start, with no study on the device, the app merges the
 * demo backup (public/demo-study.json, a copy of test/fixtures/trialbook-demo-backup.json made by
 * the app's own export) into the store, so it is a normal, editable study. Its title and purpose
 * say it is invented, and every screen showing it says so again (is-demo.ts). The app loads this
 * module only when the store holds no study.
 */
import { readBackup } from '../../io/backup/backup.ts';
import { mergeBackup, type ImportReport } from '../../store/files.ts';
import { nextTask } from '../lib/next-task.ts';
import { listStudies } from '../../store/studies.ts';
import type { Store } from '../../store/store.ts';
import { demoUrl, fetchDemoText } from './demo-file.ts';

export { DEMO_FILE } from './demo-file.ts';

/** Imports the demo study when the store holds no study; returns the import report, or null when nothing was done. */
export async function addDemoIfEmpty(store: Store, fetchText: (url: string) => Promise<string> = fetchDemoText): Promise<ImportReport | null> {
  const studies = await listStudies(store);
  if (studies.length > 0) return null;
  const text = await fetchText(demoUrl());
  // The whole file is read and checked (format, checksum) before anything is written, as
  // importBackup does, with a new task between the two, so that a first start blocks the page
  // in two shorter tasks rather than one long one.
  const backup = await readBackup(text);
  await nextTask();
  return mergeBackup(store, backup);
}
