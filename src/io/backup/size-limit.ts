/**
 * The largest backup file the app and the command line read or write. Our own choice: about 50
 * times the records of a busy year on one line (a few MB), and well inside what a phone's tab
 * can hold while the file is read, checked and merged (a small multiple of the file).
 */
export const MAX_BACKUP_BYTES = 128 * 1024 * 1024;

/** "128 MB", for messages. */
export const MAX_BACKUP_TEXT = `${MAX_BACKUP_BYTES / (1024 * 1024)} MB`;
