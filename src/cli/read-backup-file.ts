/**
 * A backup named on the command line, read and checked once while a command runs: `analyze`
 * needs it for the data, the response's goal and the confirmation runs, and reading and checking
 * a 100 MB backup takes seconds (checksum, canonical JSON). The one entry kept is keyed by the
 * file's path, size and modification time, so a file written again is read again.
 */
import { statSync } from 'node:fs';
import { readBackupSync, type Backup } from '../io/backup/backup.ts';
import { readTextFile } from './read-text-file.ts';

let last: { readonly key: string; readonly backup: Backup } | null = null;

function keyOf(path: string): string | null {
  try {
    const s = statSync(path);
    return `${s.size}:${s.mtimeMs}:${path}`;
  } catch {
    return null; // readTextFile gives the message
  }
}

/** The backup in the file at `path`, read, size-checked and verified unless it was just that. */
export function readBackupFile(path: string): Backup {
  const key = keyOf(path);
  if (key !== null && last?.key === key) return last.backup;
  const backup = readBackupSync(readTextFile(path, { backup: true }));
  last = key === null ? null : { key, backup };
  return backup;
}
