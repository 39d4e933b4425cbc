import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readBackupFile } from '../../src/cli/read-backup-file.ts';
import { DEMO_BACKUP, demoWithConfirmation } from '../helpers/confirmation-backup.ts';

// The command line reads and checks a backup once per command (common practice: the file does
// not change while the command runs), and reads it again once it is written anew.
describe('readBackupFile', () => {
  it('the same file twice gives the same checked backup; a file written again is read again', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'backup.json');
    writeFileSync(file, DEMO_BACKUP);
    const first = readBackupFile(file);
    expect(readBackupFile(file)).toBe(first);
    const runs = first.payload.revisions.length;
    writeFileSync(file, await demoWithConfirmation());
    const second = readBackupFile(file);
    expect(second).not.toBe(first);
    expect(second.payload.revisions.length).toBe(runs + 3);
  });

  it('a damaged file is refused each time with the checker message, and nothing is kept of it', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'damaged.json');
    writeFileSync(file, DEMO_BACKUP.slice(0, 200));
    expect(() => readBackupFile(file)).toThrow();
    expect(() => readBackupFile(file)).toThrow();
  });
});
