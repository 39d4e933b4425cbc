import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { MAX_BACKUP_BYTES, checkBackupSize } from '../../../src/io/backup/backup-size.ts';

describe('checkBackupSize', () => {
  it('accepts a file up to the limit, 128 MiB, and refuses one byte more', () => {
    expect(MAX_BACKUP_BYTES).toBe(134_217_728); // 128 x 1024 x 1024
    expect(() => checkBackupSize(0, 'import')).not.toThrow();
    expect(() => checkBackupSize(MAX_BACKUP_BYTES, 'import')).not.toThrow();
    expect(() => checkBackupSize(MAX_BACKUP_BYTES + 1, 'import')).toThrow(InputError);
  });
  it('says how large the file is, the limit, that nothing changed, and what to do', () => {
    expect(() => checkBackupSize(200 * 1024 * 1024, 'import')).toThrow(
      /^This backup file is 200\.0 MB; Trialbook reads backups of up to 128 MB \(134,217,728 bytes\).*Nothing was imported\. .*export the studies one at a time/,
    );
    expect(() => checkBackupSize(Number.POSITIVE_INFINITY, 'export')).toThrow(/^This backup would be over 128 MB \(134,217,728 bytes\); /);
    expect(() => checkBackupSize(150 * 1024 * 1024, 'export')).toThrow(/^This backup would be 150\.0 MB; .*up to 128 MB.*Nothing was written\. Export the studies one at a time/);
  });
});
