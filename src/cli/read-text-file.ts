/**
 * Reads a file named on the command line as text: its encoding by its byte-order mark, else
 * strict UTF-8 (io/decode-text.ts), with a message in plain words when it cannot be read or
 * decoded. A backup is measured before it is read: one above the backup size limit
 * (MAX_BACKUP_BYTES) is refused without loading it.
 */
import { readFileSync, statSync } from 'node:fs';
import { InputError } from '../core/errors.ts';
import { checkBackupSize } from '../io/backup/backup-size.ts';
import { decodeText } from '../io/decode-text.ts';

function cannotRead(path: string, err: unknown): never {
  const code = (err as NodeJS.ErrnoException).code;
  throw new InputError(`Cannot read the file "${path}": ${code === 'ENOENT' ? 'it does not exist' : code === 'EISDIR' ? 'it is a folder' : (err as Error).message}`);
}

/** The file's text; with `backup`, a file above the backup size limit is refused unread. */
export function readTextFile(path: string, options: { backup?: boolean } = {}): string {
  if (options.backup) {
    let size: number;
    try {
      size = statSync(path).size;
    } catch (err) {
      cannotRead(path, err);
    }
    checkBackupSize(size, 'import');
  }
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (err) {
    cannotRead(path, err);
  }
  return decodeText(bytes, `The file "${path}"`).text;
}
