/**
 * The page's one link to the import worker: starts it for one file, passes its progress on, and
 * gives back its report or its error as the store's error classes (so screens show them as any
 * other). A file above the size limit is refused here, before a worker starts. Where no worker
 * can be made, the same import runs in the page.
 */
import { InputError } from '../../core/errors.ts';
import { StorageError } from '../../store/errors.ts';
import type { ImportReport } from '../../store/files.ts';
import type { Store } from '../../store/store.ts';
import { checkImportSize, importFile } from './import-file.ts';
import type { ImportMessage, ImportProgress } from './protocol.ts';

/** Imports a backup file off the page's thread; rejects with InputError or StorageError, nothing changed. */
export function importBackupFile(store: Store, file: File, onProgress: (p: ImportProgress) => void): Promise<ImportReport> {
  try {
    checkImportSize(file.size);
  } catch (err) {
    return Promise.reject(err);
  }
  if (typeof Worker === 'undefined') return importFile(store, file, onProgress);
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./import-worker.ts', import.meta.url), { type: 'module' });
    const finish = () => worker.terminate();
    worker.onmessage = (e: MessageEvent<ImportMessage>) => {
      const m = e.data;
      if (m.kind === 'progress') return onProgress(m.progress);
      finish();
      if (m.kind === 'done') resolve(m.report);
      else if (m.error === 'storage') reject(new StorageError(m.problem));
      else if (m.error === 'input') reject(new InputError(m.message));
      else reject(new Error(m.message));
    };
    worker.onerror = (e) => {
      finish();
      // The tab's memory ran out or the worker could not start: say so; nothing was merged.
      reject(new Error(`the import stopped before it finished (${e.message || 'the browser ended the worker'}); nothing was changed`));
    };
    worker.postMessage({ file });
  });
}
