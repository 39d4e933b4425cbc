import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { csv } from '../../src/cli/commands/csv.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { DEMO_STUDY, demoWithConfirmation } from '../helpers/confirmation-backup.ts';

describe('csv --confirmations: the verdicts file beside the runs file (invented demo data)', async () => {
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-'));
  const backupFile = join(dir, 'with-confirmation.json');
  writeFileSync(backupFile, await demoWithConfirmation());

  it("gives the same verdict as analyze's confirmations with the default model", async () => {
    const rows = Papa.parse<string[]>((await csv.run([backupFile, '--study', DEMO_STUDY, '--confirmations'])).trimEnd(), { header: false }).data;
    const h = rows[0];
    const gloss = rows.find((r) => r[0] === 'Gloss')!;
    const json = JSON.parse(await analyze.run([backupFile, '--study', DEMO_STUDY, '--response', 'Gloss', '--json']));
    const c = json.confirmations[0];
    expect(Number(gloss[h.indexOf('Predicted')])).toBe(c.predicted);
    expect(Number(gloss[h.indexOf('Interval high')])).toBe(c.interval[1]);
    expect(gloss[h.indexOf('Outcome')]).toBe(c.outcome);
    expect(gloss[h.indexOf('Verdict')]).toBe(c.statement);
  });

  it('the runs file stays as it was without the option', async () => {
    const runs = await csv.run([backupFile, '--study', DEMO_STUDY]);
    expect(runs.split('\r\n')[0].startsWith('Run,Std order')).toBe(true);
  });

  it('bad input: a study without confirmation runs says so and what to do', async () => {
    await expect(csv.run([fixturePath('trialbook-demo-backup.json'), '--study', DEMO_STUDY, '--confirmations'])).rejects.toThrow(/has no confirmation runs planned, so there is no verdict to write; plan them in the app/);
  });
});
