import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { visibleText } from '../../src/cli/visible-text.ts';
import { writeBackup, type BackupPayload } from '../../src/io/backup/backup.ts';
import { fixturePath } from '../helpers/fixtures.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const cli = (args: string[]) => spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], { cwd: root, encoding: 'utf8' });

// ECMA-48 (5th ed., 1991): ESC ] ... BEL is an operating system command (xterm: set the title);
// ESC [ 2 J erases the screen; U+009B is the 8-bit CSI; U+202E is the right-to-left override.
const RETITLE = '\u001b]0;owned\u0007';
const ERASE = '\u001b[2J';
const RAW = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

describe('visibleText', () => {
  it('writes control characters as \\uXXXX and leaves tab, line feed and CRLF as they are', () => {
    expect(visibleText(`Title${RETITLE}`)).toBe('Title\\u001b]0;owned\\u0007');
    expect(visibleText('a\tb\r\nc\nd')).toBe('a\tb\r\nc\nd');
    expect(visibleText('over\rwrite')).toBe('over\\u000dwrite');
    expect(visibleText('x\u009b31my\u202eevil\u0000')).toBe('x\\u009b31my\\u202eevil\\u0000');
    expect(visibleText('Temperatur (°C) — Ölbad 温度')).toBe('Temperatur (°C) — Ölbad 温度');
    expect(visibleText('')).toBe('');
  });
  it('keeps a JSON text the same JSON value (RFC 8259, section 7: any character may be escaped)', () => {
    const value = { name: `Gloss${RETITLE}\u009b\u202e`, list: ['\u0085', 'plain'] };
    const text = JSON.stringify(value, null, 2);
    const shown = visibleText(text);
    expect(shown).not.toMatch(RAW);
    expect(JSON.parse(shown)).toEqual(value);
  });
});

describe('the command line prints file text with its controls made visible', () => {
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-visible-'));
  // Invented data: a 2^2 with a hostile response name and factor header.
  const csv = join(dir, 'hostile.csv');
  writeFileSync(csv, `A${ERASE},B,Gloss${RETITLE}\n-1,-1,70\n1,-1,75\n-1,1,72\n1,1,80\n-1,-1,71\n1,-1,76\n-1,1,72\n1,1,79\n`);

  it('in the text report, the JSON output and an error message', () => {
    const text = cli(['analyze', csv, '--factors', `A${ERASE},B`, '--response', `Gloss${RETITLE}`]);
    expect(text.status).toBe(0);
    expect(text.stdout).not.toMatch(RAW);
    expect(text.stdout).toContain('Gloss\\u001b]0;owned\\u0007');
    const json = cli(['analyze', csv, '--factors', `A${ERASE},B`, '--response', `Gloss${RETITLE}`, '--json']);
    expect(json.status).toBe(0);
    expect(json.stdout).not.toMatch(RAW);
    expect(JSON.stringify(JSON.parse(json.stdout))).toContain('Gloss\\u001b]0;owned\\u0007');
    const bad = cli(['analyze', csv, '--factors', 'A,B', '--response', 'Gloss']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).not.toMatch(RAW);
    expect(bad.stderr).toContain('(columns: A\\u001b[2J, B, Gloss\\u001b]0;owned\\u0007)');
  }, 60_000);

  it('the csv command writes the export exactly when stdout is not a terminal (no record changes)', async () => {
    const demo = JSON.parse(readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8'));
    const payload: BackupPayload = demo.payload;
    const rev = payload.revisions[0];
    const changed: BackupPayload = { studies: payload.studies, revisions: [{ ...rev, notes: `hot${RETITLE}` }, ...payload.revisions.slice(1)] };
    const file = join(dir, 'backup.json');
    writeFileSync(file, await writeBackup(changed, { device: demo.device, exportedAt: demo.exportedAt, scope: 'all' }));
    const out = cli(['csv', file, '--study', payload.studies[0].id]);
    expect(out.status).toBe(0);
    expect(out.stdout).toContain(`hot${RETITLE}`);
  }, 60_000);
});
