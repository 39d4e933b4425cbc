import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { readTextFile } from '../../src/cli/read-text-file.ts';
import { MAX_BACKUP_BYTES } from '../../src/io/backup/backup-size.ts';
import { fixturePath } from '../helpers/fixtures.ts';

// Montgomery, Design and Analysis of Experiments, 8th ed., example 6.6 (2^2 with five center
// points), as a European spreadsheet writes it: semicolons, decimal commas, saved as UTF-16LE
// with a byte-order mark, and as UTF-8 with mixed line ends. Each must give the analysis of the
// original file exactly.
const original = fixturePath('montgomery-8e-ex6-6-center-points.csv');
const text = readFileSync(original, 'utf8');
const european = text.replaceAll(',', ';').replace(/(\d)\.(\d)/g, '$1,$2');
const dir = mkdtempSync(join(tmpdir(), 'trialbook-read-'));
const args = ['--factors', 'Time,Temperature', '--response', 'Yield', '--terms', 'A*B', '--json'];

function write(name: string, bytes: Uint8Array | string): string {
  const path = join(dir, name);
  writeFileSync(path, bytes);
  return path;
}

describe('files from other spreadsheets and locales, through the command line', () => {
  it('a UTF-16LE file with semicolons and decimal commas analyzes as the original, and the report says how it was read', async () => {
    const utf16 = write('eu-utf16.csv', new Uint8Array(Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(european, 'utf16le')])));
    expect(readTextFile(utf16)).toBe(european);
    const ref = JSON.parse(await analyze.run([original, ...args]));
    const got = JSON.parse(await analyze.run([utf16, ...args]));
    expect(got.terms[0].effect).toBeCloseTo(1.55, 10); // Montgomery 8th ed., example 6.6: Time effect 1.55
    expect(got.terms[1].effect).toBeCloseTo(0.65, 10); // and Temperature 0.65
    expect({ ...got, warnings: null }).toEqual({ ...ref, warnings: null });
    expect(got.warnings).toEqual(['Read as a file separated by semicolons with decimal commas in the column "Yield"', ...ref.warnings]);
  });
  it('mixed CRLF and LF line ends are one file', async () => {
    const lines = text.trimEnd().split('\n');
    const mixed = write('mixed.csv', lines.map((l, i) => l + (i % 2 ? '\r\n' : '\n')).join(''));
    const ref = JSON.parse(await analyze.run([original, ...args]));
    expect(JSON.parse(await analyze.run([mixed, ...args]))).toEqual(ref);
  });
  it('a Windows-1252 file is refused with the line, the byte and how to save it', async () => {
    const cp1252 = write('cp1252.csv', new Uint8Array([...Buffer.from('Time (min),Temperature ('), 0xb0, ...Buffer.from('F),Yield\n30,150,39.3\n')]));
    await expect(analyze.run([cp1252, ...args])).rejects.toThrow(
      new RegExp(`^The file "${cp1252.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}" is not UTF-8: line 1 has byte 0xB0 \\("°" in Windows-1252\\)`),
    );
  });
});


const root = fileURLToPath(new URL('../..', import.meta.url));

describe('readTextFile', () => {
  it('refuses a backup above the limit from its size alone, and reads one at the limit', () => {
    const dir = mkdtempSync(join(tmpdir(), 'trialbook-size-'));
    try {
      const big = join(dir, 'big.json');
      writeFileSync(big, '');
      truncateSync(big, MAX_BACKUP_BYTES + 1); // a sparse file: nothing is written to disk
      expect(() => readTextFile(big, { backup: true })).toThrow(/^This backup file is 128\.0 MB; Trialbook reads backups of up to 128 MB \(134,217,728 bytes\)/);
      // A file of exactly the limit passes the size check.
      const edge = join(dir, 'edge.json');
      writeFileSync(edge, '');
      truncateSync(edge, MAX_BACKUP_BYTES);
      // A sparse file is all NUL bytes: it passes the size check and is then refused as not text.
      expect(() => readTextFile(edge, { backup: true })).toThrow(/holds NUL bytes/);
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
