import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { readBackup, writeBackup } from '../../src/io/backup/backup.ts';
import { exportBackup, importBackup } from '../../src/store/files.ts';
import { listSetAside, removeSetAside } from '../../src/store/set-aside.ts';
import { createStudy } from '../../src/store/studies.ts';
import { openNewRun, saveRun } from '../../src/store/runs.ts';
import type { Store } from '../../src/store/store.ts';
import { coatingPlan, freshStore } from './helpers.ts';

async function log(store: Store, studyId: string, plannedRun: number, thickness: string) {
  const state = await openNewRun(store, studyId, plannedRun);
  return saveRun(store, { ...state, studyId, values: parseRunForm(state.study, { ...state.form, readings: [thickness, ''] }) });
}

/** A store b that holds two set-aside records: a study whose plan was altered in the file (title) and its revision. */
async function withSetAside() {
  const a = await freshStore();
  const study = await createStudy(a, coatingPlan());
  await log(a, study.id, 1, '70');
  const b = await freshStore();
  await importBackup(b, await exportBackup(a));
  await log(a, study.id, 2, '72');
  const doc = await readBackup(await exportBackup(a));
  const file = await writeBackup({ ...doc.payload, studies: doc.payload.studies.map((s) => ({ ...s, title: 'Renamed' })) }, { device: a.device, exportedAt: new Date().toISOString(), scope: 'all' });
  await importBackup(b, file);
  return b;
}

describe('removing a set-aside record', () => {
  it('removes that one record only; the others and every study and revision stay', async () => {
    const b = await withSetAside();
    const before = await listSetAside(b);
    expect(before.map((r) => r.kind).sort()).toEqual(['revision', 'study']);
    const studies = await b.db.studies.toArray();
    const revisions = await b.db.revisions.toArray();
    expect(await removeSetAside(b, before[1].key)).toBe(true);
    expect((await listSetAside(b)).map((r) => r.key)).toEqual([before[0].key]);
    expect(await b.db.studies.toArray()).toEqual(studies);
    expect(await b.db.revisions.toArray()).toEqual(revisions);
  });

  it('a record already removed (another tab) is not there: false, and nothing else changes', async () => {
    const b = await withSetAside();
    const [first, second] = await listSetAside(b);
    await removeSetAside(b, first.key);
    expect(await removeSetAside(b, first.key)).toBe(false);
    expect(await removeSetAside(b, 'no-such-key')).toBe(false);
    expect((await listSetAside(b)).map((r) => r.key)).toEqual([second.key]);
  });
});

describe('the record on this device beside a set-aside one', () => {
  it('is the stored study with the same id, whose title differs from the file\'s where the field says', async () => {
    const b = await withSetAside();
    const study = (await listSetAside(b)).find((r) => r.kind === 'study')!;
    expect(study.field).toBe('title');
    const { storedRecordOf } = await import('../../src/store/set-aside.ts');
    const stored = (await storedRecordOf(b, study)) as { title: string };
    expect(stored.title).not.toBe('Renamed');
    expect((study.record as { title: string }).title).toBe('Renamed');
    expect(await storedRecordOf(b, { kind: 'revision', id: 'no-such-id' })).toBeUndefined();
  });
});
