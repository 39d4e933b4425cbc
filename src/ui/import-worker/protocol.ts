/** The messages between the page and the import worker (import-worker.ts, import-bridge.ts). */
import type { ImportReport } from '../../store/files.ts';
import type { StorageProblem } from '../../store/errors.ts';

/** How far an import has come: reading the file (with the fraction read), checking it, merging it. */
export type ImportProgress = { readonly stage: 'reading'; readonly fraction: number } | { readonly stage: 'checking' } | { readonly stage: 'merging' };

/** Page -> worker: the file to import. */
export interface ImportRequest {
  readonly file: Blob;
}

/** Worker -> page. */
export type ImportMessage =
  | { readonly kind: 'progress'; readonly progress: ImportProgress }
  | { readonly kind: 'done'; readonly report: ImportReport }
  | { readonly kind: 'error'; readonly error: 'input' | 'other'; readonly message: string }
  | { readonly kind: 'error'; readonly error: 'storage'; readonly problem: StorageProblem; readonly message: string };
