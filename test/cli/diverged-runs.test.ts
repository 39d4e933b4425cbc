import { afterEach, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { csv } from '../../src/cli/commands/csv.ts';
import { readBackupSync, writeBackup } from '../../src/io/backup/backup.ts';

// The invented demo backup with run 3 edited on two devices from its first revision (invented
// readings): the command line still uses the current one, and says that there are two.
const fixture = readBackupSync(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8'));
const study = fixture.payload.studies[0];
const first = fixture.payload.revisions.find((r) => r.plannedRun === 3)!;
const editA = { ...first, id: '00000000-0000-4000-8000-00000000000a', rev: 2, device: '00000000-0000-4000-8000-0000000000d1', parents: [first.id], readings: [[68.7], [75.5]] };
const editB = { ...first, id: '00000000-0000-4000-8000-00000000000b', rev: 2, device: '00000000-0000-4000-8000-0000000000d2', parents: [first.id], readings: [[68.7], [71.9]] };

let dir: string | null = null;
afterEach(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
  dir = null;
  vi.restoreAllMocks();
});

async function backupFile(): Promise<string> {
  dir = mkdtempSync(join(tmpdir(), 'trialbook-diverged-'));
  const path = join(dir, 'two-devices.json');
  writeFileSync(path, await writeBackup({ studies: fixture.payload.studies, revisions: [...fixture.payload.revisions, editA, editB] }, { device: fixture.device, exportedAt: fixture.exportedAt, scope: 'all' }));
  return path;
}

describe('a run with two current revisions on the command line', () => {
  it('analyze names it with both values in the report and in the JSON warnings, and uses the current one', async () => {
    const path = await backupFile();
    const args = [path, '--study', study.id, '--response', 'Gloss'];
    const text = await analyze.run(args);
    // compareRevisions: equal counters, so the greater device id (…d2, edit B, 71.9) is current.
    expect(text).toContain('Run 3 has 2 current revisions (changed on two devices from the same revision): the one used holds Film thickness 68.7 µm, Gloss 71.9 GU; the other holds Film thickness 68.7 µm, Gloss 75.5 GU.');
    const json = JSON.parse(await analyze.run([...args, '--json']));
    expect(json.warnings.filter((w: string) => w.startsWith('Run 3 has 2 current revisions'))).toHaveLength(1);
    expect(json.runs.find((r: { run: string }) => r.run === '3').y).toBe(71.9);
  });

  it('csv writes the current revision and names the run with both values on stderr', async () => {
    const path = await backupFile();
    const err: string[] = [];
    vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => (err.push(String(chunk)), true));
    const out = await csv.run([path, '--study', study.id]);
    expect(out).toContain('71.9');
    expect(out).not.toContain('75.5');
    expect(err.join('')).toMatch(/^trialbook csv: Run 3 has 2 current revisions .*Gloss 71\.9 GU; the other holds .*Gloss 75\.5 GU/);
  });

  it('a backup without diverged runs says nothing of the kind', async () => {
    dir = mkdtempSync(join(tmpdir(), 'trialbook-diverged-'));
    const path = join(dir, 'plain.json');
    writeFileSync(path, await writeBackup(fixture.payload, { device: fixture.device, exportedAt: fixture.exportedAt, scope: 'all' }));
    expect(await analyze.run([path, '--study', study.id, '--response', 'Gloss'])).not.toMatch(/current revisions/);
  });
});
