/**
 * The INVENTED demo backup (test/fixtures/trialbook-demo-backup.json) with three INVENTED
 * confirmation runs added as a block at Oven temperature 200 °C, Line speed 3 m/min, Powder flow
 * 40 g/min (coded 1, 0, 0): Film thickness 70 µm each, Gloss as given. Shared by the command
 * line's and the Next screen model's confirmation tests, so both judge the same study.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readBackupSync, writeBackup, type BackupPayload } from '../../src/io/backup/backup.ts';
import { fixturePath } from './fixtures.ts';

export const DEMO_BACKUP = readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8');
export const DEMO_STUDY = 'Invented demo: powder-coating cure trial';
/** Gloss of the three confirmation runs, invented. */
export const CONFIRMATION_GLOSS = [93.1, 92.4, 94.0];

/** The backup's text with the three runs planned and the first `logged` of them logged. */
export async function demoWithConfirmation(logged = CONFIRMATION_GLOSS.length): Promise<string> {
  const gloss = CONFIRMATION_GLOSS;
  const b = readBackupSync(DEMO_BACKUP);
  const study = b.payload.studies[0];
  const first = Math.max(...study.design.runs.map((r) => r.run)) + 1;
  const block = Math.max(...study.design.runs.map((r) => r.block)) + 1;
  const runs = gloss.map((_, i) => ({ run: first + i, standardOrder: null, replicate: 1, block, originBlock: block, kind: 'confirmation' as const, coded: [1, 0, 0] }));
  const revisions = gloss.slice(0, logged).map((g, i) => ({
    id: `00000000-0000-4000-8000-00000000000${i}`,
    runId: `00000000-0000-4000-8000-00000000010${i}`,
    studyId: study.id,
    plannedRun: first + i,
    rev: 1,
    device: b.device,
    parents: [],
    restoredFrom: null,
    savedAt: '2024-05-03T10:00:00.000Z',
    actual: [200, 3, 40],
    readings: [[70], [g]],
    loggedAt: '2024-05-03T10:00:00.000Z',
    operator: 'Shift A (invented)',
    notes: '',
    excluded: false,
    reason: '',
  }));
  const payload = {
    studies: b.payload.studies,
    revisions: [...b.payload.revisions, ...revisions],
    blocks: [{ id: '00000000-0000-4000-8000-000000000200', studyId: study.id, device: b.device, createdAt: '2024-05-03T09:00:00.000Z', purpose: 'confirmation', note: 'invented', runs }],
  } as unknown as BackupPayload;
  return writeBackup(payload, { device: b.device, exportedAt: '2024-05-03T11:00:00.000Z', scope: 'all' });
}

/** The same backup written to a file of its own in a new temporary folder, for the command line to read. */
export async function demoFileWithConfirmation(logged = CONFIRMATION_GLOSS.length): Promise<{ readonly file: string; readonly text: string }> {
  const text = await demoWithConfirmation(logged);
  const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'with-confirmation.json');
  writeFileSync(file, text);
  return { file, text };
}

/** The demo backup's text as stored (a fresh read each call). */
export function demoBackupText(): string {
  return readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8');
}
