/**
 * The size limit of a backup file, the same on export and import, in the app and on the command
 * line: a file above it is refused before it is parsed (import) or before it is offered (export),
 * so no device ever writes a file that another would refuse.
 */
import { InputError } from '../../core/errors.ts';

/**
 * Largest backup file, in bytes of UTF-8: 128 MiB. Reading a file keeps its text, the parsed
 * document and the checked records in memory at once, several times the file's size (the
 * command line peaked at 483 MB for a 100 MB file and 567 MB for 126 MB; see backup-format.md),
 * which is about what a phone's tab can hold; a device's whole history of small studies is a few
 * megabytes. Common practice: a fixed
 * limit on untrusted input, stated in the format's description.
 */
export const MAX_BACKUP_BYTES = 128 * 1024 * 1024;

const MB = 1024 * 1024;
const mb = (bytes: number) => `${(bytes / MB).toFixed(1)} MB`;
const LIMIT = `${MAX_BACKUP_BYTES / MB} MB (${MAX_BACKUP_BYTES.toLocaleString('en-US')} bytes)`;

/**
 * Refuses a backup larger than MAX_BACKUP_BYTES, saying how large it is, the limit, and what to
 * do instead. `action` is "import" for a file being read, "export" for one being written;
 * `bytes` may be Infinity for a size known only to be too large.
 * Example: checkBackupSize(200 * 2 ** 20, 'import') throws "This backup file is 200.0 MB; ...".
 */
export function checkBackupSize(bytes: number, action: 'import' | 'export'): void {
  if (bytes <= MAX_BACKUP_BYTES) return;
  const size = Number.isFinite(bytes) ? mb(bytes) : `over ${LIMIT}`;
  if (action === 'import') {
    throw new InputError(`This backup file is ${size}; Trialbook reads backups of up to ${LIMIT}, so that a phone can check one in memory. Nothing was imported. On the device that made it, export the studies one at a time and import those files.`);
  }
  throw new InputError(`This backup would be ${size}; Trialbook writes and reads backups of up to ${LIMIT}, so this one could not be imported anywhere. Nothing was written. Export the studies one at a time instead.`);
}
