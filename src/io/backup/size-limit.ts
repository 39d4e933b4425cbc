/**
 * The backup size limit as the screens word it. The limit itself is set once, in
 * backup-size.ts (MAX_BACKUP_BYTES), for the app and the command line alike.
 */
import { MAX_BACKUP_BYTES } from './backup-size.ts';

export { MAX_BACKUP_BYTES };

/** "128 MB", for messages. */
export const MAX_BACKUP_TEXT = `${MAX_BACKUP_BYTES / (1024 * 1024)} MB`;
