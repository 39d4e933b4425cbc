/**
 * The import worker: a thin wrapper that opens the store in the worker, runs importFile (read,
 * check, merge) off the page's thread and posts its progress and its result.
 */
import { InputError } from '../../core/errors.ts';
import { StorageError } from '../../store/errors.ts';
import { closeStore, openStore } from '../../store/store.ts';
import { importFile } from './import-file.ts';
import type { ImportMessage, ImportRequest } from './protocol.ts';

// The worker's global scope (the page's tsconfig has the DOM library, not the worker's).
const scope = self as unknown as { onmessage: ((e: MessageEvent<ImportRequest>) => void) | null; postMessage(m: ImportMessage): void };

scope.onmessage = (e) => {
  void (async () => {
    try {
      const store = await openStore();
      try {
        const report = await importFile(store, e.data.file, (progress) => scope.postMessage({ kind: 'progress', progress }));
        scope.postMessage({ kind: 'done', report });
      } finally {
        closeStore(store);
      }
    } catch (err) {
      if (err instanceof StorageError) scope.postMessage({ kind: 'error', error: 'storage', problem: err.problem, message: err.message });
      else if (err instanceof InputError) scope.postMessage({ kind: 'error', error: 'input', message: err.message });
      else scope.postMessage({ kind: 'error', error: 'other', message: err instanceof Error ? err.message : String(err) });
    }
  })();
};
