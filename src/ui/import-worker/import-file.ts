/**
 * Importing a backup file: refused above MAX_BACKUP_BYTES before any of it is read; otherwise
 * read in chunks (progress by bytes), checked (readBackup: format, checksum, records) and merged
 * (mergeBackup: one transaction). Runs inside the import worker, off the page's thread; the same
 * function runs in the page where no worker can be made.
 */
import { InputError } from '../../core/errors.ts';
import { readBackup } from '../../io/backup/backup.ts';
import { checkBackupSize } from '../../io/backup/backup-size.ts';
import { mergeBackup, type ImportReport } from '../../store/files.ts';
import type { Store } from '../../store/store.ts';
import type { ImportProgress } from './protocol.ts';

/** Throws InputError when the file is above the size limit, in the same words as the command line (checkBackupSize). */
export function checkImportSize(size: number): void {
  checkBackupSize(size, 'import');
}

/** Reads a file as UTF-8 text in chunks, telling the fraction read. */
async function readText(file: Blob, onProgress: (p: ImportProgress) => void): Promise<string> {
  const reader = file.stream().getReader();
  const decoder = new TextDecoder('utf-8');
  const parts: string[] = [];
  let read = 0;
  onProgress({ stage: 'reading', fraction: 0 });
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    read += value.byteLength;
    parts.push(decoder.decode(value, { stream: true }));
    onProgress({ stage: 'reading', fraction: file.size > 0 ? read / file.size : 1 });
  }
  parts.push(decoder.decode());
  return parts.join('');
}

/** Imports a backup file into the store; nothing changes on any error. */
export async function importFile(store: Store, file: Blob, onProgress: (p: ImportProgress) => void): Promise<ImportReport> {
  checkImportSize(file.size);
  const text = await readText(file, onProgress);
  onProgress({ stage: 'checking' });
  const backup = await readBackup(text);
  onProgress({ stage: 'merging' });
  return mergeBackup(store, backup);
}
