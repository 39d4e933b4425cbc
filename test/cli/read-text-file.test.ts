import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readTextFile } from '../../src/cli/read-text-file.ts';
import { MAX_BACKUP_BYTES } from '../../src/io/backup/backup-size.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe('readTextFile', () => {
  it('refuses a backup above the limit from its size alone, and reads one at the limit', () => {
    const dir = mkdtempSync(join(tmpdir(), 'trialbook-size-'));
    try {
      const big = join(dir, 'big.json');
      writeFileSync(big, '');
      truncateSync(big, MAX_BACKUP_BYTES + 1); // a sparse file: nothing is written to disk
      expect(() => readTextFile(big, { backup: true })).toThrow(/^This backup file is 128\.0 MB; Trialbook reads backups of up to 128 MB \(134,217,728 bytes\)/);
      // The same file as plain text (no backup limit) is read: the limit is the backup's.
      const edge = join(dir, 'edge.json');
      writeFileSync(edge, '');
      truncateSync(edge, MAX_BACKUP_BYTES);
      expect(readTextFile(edge, { backup: true }).length).toBe(MAX_BACKUP_BYTES);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
  it('names a missing file or a folder in plain words (degenerate input)', () => {
    expect(() => readTextFile(join(tmpdir(), 'no-such-trialbook-file.json'), { backup: true })).toThrow(/^Cannot read the file ".*no-such-trialbook-file\.json": it does not exist$/);
    expect(() => readTextFile(tmpdir())).toThrow(/: it is a folder$/);
  });
  it('the command line refuses an oversized backup with the message and exit code 2, for csv and analyze', () => {
    const dir = mkdtempSync(join(tmpdir(), 'trialbook-size-'));
    try {
      const big = join(dir, 'big.json');
      writeFileSync(big, '');
      truncateSync(big, 200 * 1024 * 1024);
      for (const args of [['csv', big, '--study', 'x'], ['analyze', big, '--study', 'x', '--response', 'y']]) {
        const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });
        expect(r.status).toBe(2);
        expect(r.stderr).toMatch(new RegExp(`^trialbook ${args[0]}: This backup file is 200\\.0 MB; Trialbook reads backups of up to 128 MB.*Nothing was imported`));
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000);
});
