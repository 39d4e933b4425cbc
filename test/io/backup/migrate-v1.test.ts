/**
 * Backup format version 1 to 2: the version-1 fixture (test/fixtures/trialbook-backup-v1.json,
 * the invented demo backup as format version 1 wrote it) reads with the current code, and every
 * record comes out as the format description (backup-format.md, "Versions") says, checked here
 * field by field against the raw file rather than against the migration code.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { BACKUP_VERSION, readBackup, readBackupSync, writeBackup } from '../../../src/io/backup/backup.ts';
import { backupV1ToV2 } from '../../../src/io/backup/migrate-v1.ts';
import { exportBackup, importBackup } from '../../../src/store/files.ts';
import { listRuns } from '../../../src/store/runs.ts';
import { listStudies } from '../../../src/store/studies.ts';
import { fixturePath } from '../../helpers/fixtures.ts';
import { freshStore } from '../../store/helpers.ts';

type Row = { [k: string]: unknown };
const v1Text = readFileSync(fixturePath('trialbook-backup-v1.json'), 'utf8');
const v1 = JSON.parse(v1Text) as Row & { payload: { studies: (Row & { responses: Row[]; design: Row & { runs: Row[] } })[]; revisions: Row[] } };

describe('backup format version 1', () => {
  it('the fixture is a version-1 file without the fields version 2 adds', () => {
    expect(v1.formatVersion).toBe(1);
    expect(v1Text).not.toMatch(/originBlock|lowerBound/);
    expect(v1.payload.studies.length).toBeGreaterThan(0);
    expect(BACKUP_VERSION).toBe(2);
  });

  it('reads as version 2, record by record and field by field', async () => {
    for (const backup of [readBackupSync(v1Text), await readBackup(v1Text)]) {
      expect(backup.formatVersion).toBe(2);
      expect(backup.counts).toEqual(v1.counts);
      expect(backup.device).toBe(v1.device);
      expect(backup.exportedAt).toBe(v1.exportedAt);
      expect(backup.payload.studies.length).toBe(v1.payload.studies.length);
      backup.payload.studies.forEach((study, i) => {
        const old = v1.payload.studies[i];
        for (const k of ['id', 'device', 'createdAt', 'title', 'purpose', 'factors'] as const) expect(study[k], k).toEqual(old[k]);
        expect(study.responses.length).toBe(old.responses.length);
        study.responses.forEach((r, j) => expect(r, `response ${j}`).toEqual({ ...old.responses[j], lowerBound: null }));
        const { runs, ...design } = study.design;
        const { runs: oldRuns, ...oldDesign } = old.design;
        expect(design).toEqual(oldDesign);
        expect(runs.length).toBe(oldRuns.length);
        runs.forEach((run, j) => {
          const o = oldRuns[j];
          expect(run.originBlock, `run ${j + 1}`).toBe(o.block);
          expect(run.kind, `run ${j + 1}`).toBe(o.kind);
          const { yates, ...rest } = o as typeof o & { yates: number | null };
          expect(run.standardOrder, `run ${j + 1}`).toBe(yates);
          expect(run).toEqual({ ...rest, standardOrder: yates, originBlock: o.block });
        });
      });
      // Revisions are unchanged by the migration.
      expect(backup.payload.revisions).toEqual(v1.payload.revisions);
    }
  });

  it('imports into a store, and exports again as version 2 that reads back the same', async () => {
    const store = await freshStore();
    const report = await importBackup(store, v1Text);
    expect(report.studiesAdded).toBe(v1.payload.studies.length);
    expect(report.revisionsAdded).toBe(v1.payload.revisions.length);
    const [study] = await listStudies(store);
    expect(study.design.runs.every((r) => r.originBlock === r.block)).toBe(true);
    expect((await listRuns(store, study.id)).length).toBe((v1.counts as Row).runs);
    const again = await exportBackup(store);
    expect(JSON.parse(again).formatVersion).toBe(2);
    const back = readBackupSync(again);
    expect(back.payload).toEqual(readBackupSync(v1Text).payload);
    // Importing the migrated file over the version-1 import changes nothing.
    expect((await importBackup(store, again)).summary).toMatch(/^Nothing new/);
  });
});

describe('backupV1ToV2', () => {
  it('is pure: the input is not changed, and a second pass changes nothing more', () => {
    const input = structuredClone(v1) as Row;
    const once = backupV1ToV2(input);
    expect(input).toEqual(v1);
    expect(backupV1ToV2(once)).toEqual(once);
  });

  it('keeps an origin block or lower bound that is already there', () => {
    const doc = structuredClone(v1);
    doc.payload.studies[0].design.runs[0].originBlock = 7;
    doc.payload.studies[0].responses[0].lowerBound = 0;
    const out = backupV1ToV2(doc) as typeof v1;
    expect(out.payload.studies[0].design.runs[0].originBlock).toBe(7);
    expect(out.payload.studies[0].responses[0].lowerBound).toBe(0);
    expect(out.payload.studies[0].responses[1].lowerBound).toBe(null);
  });

  it('leaves a document without studies as it was, for the checks to refuse', () => {
    const odd = { format: 'trialbook-backup', formatVersion: 1, payload: [] };
    expect(backupV1ToV2(odd)).toBe(odd);
  });
});

describe('version 2', () => {
  it('a version-2 file must carry the new fields: one without them is refused, naming the field', async () => {
    const doc = JSON.parse(v1Text);
    const text = await writeBackup(doc.payload, { device: doc.device, exportedAt: doc.exportedAt, scope: doc.scope });
    expect(JSON.parse(text).formatVersion).toBe(2);
    expect(() => readBackupSync(text)).toThrow(/payload\.studies\[0\]\.responses\[0\]\.lowerBound: needs a number or null/);
  });
});
