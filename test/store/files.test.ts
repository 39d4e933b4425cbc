import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { BACKUP_VERSION, readBackup } from '../../src/io/backup/backup.ts';
import { canonicalJson } from '../../src/core/records/canonical-json.ts';
import { exportBackup, importBackup, payloadOf } from '../../src/store/files.ts';
import { createStudy } from '../../src/store/studies.ts';
import { excludeRun, getRun, listDivergedRuns } from '../../src/store/runs.ts';
import { safetyStatus, persistenceAnswer } from '../../src/store/status.ts';
import type { Store } from '../../src/store/store.ts';
import { coatingPlan, freshStore, logThickness as log, editThickness as edit } from './helpers.ts';

/** Everything a store holds, in a form to compare. */
async function dump(store: Store) {
  const p = await payloadOf(store);
  const runs = await store.db.runs.toArray();
  return canonicalJson({ studies: [...p.studies].sort((a, b) => (a.id < b.id ? -1 : 1)), revisions: [...p.revisions].sort((a, b) => (a.id < b.id ? -1 : 1)), runs: runs.sort((a, b) => (a.id < b.id ? -1 : 1)) });
}

/** A store with the coating study and run 1 logged, and a second store that imported its backup. */
async function copied() {
  const a = await freshStore();
  const study = await createStudy(a, coatingPlan());
  const r = await log(a, study.id, 1, '70');
  const text = await exportBackup(a);
  const b = await freshStore();
  await importBackup(b, text);
  return { a, b, study, r, text };
}

describe('backup export and import', () => {
  it('export then import into an empty store gives the same records, history included', async () => {
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    const r1 = await log(a, study.id, 1, '70.2 69.8');
    await edit(a, r1.run.id, '70.0');
    const r2 = await log(a, study.id, 2, '66');
    await excludeRun(a, r2.run.id, 'oven door left open');
    const text = await exportBackup(a);
    const b = await freshStore();
    const report = await importBackup(b, text);
    expect(report).toMatchObject({ studiesAdded: 1, runsAdded: 2, revisionsAdded: 4, conflicts: [] });
    expect(await dump(b)).toBe(await dump(a));
    // ... and exporting again from the copy gives the same payload.
    const again = await readBackup(await exportBackup(b));
    expect(canonicalJson(again.payload)).toBe(canonicalJson((await readBackup(text)).payload));
  });

  it('importing the same file twice changes nothing the second time', async () => {
    const { b, text } = await copied();
    const once = await dump(b);
    const second = await importBackup(b, text);
    expect(second).toMatchObject({ studiesAdded: 0, revisionsAdded: 0, runsAdded: 0, studiesUnchanged: 1, revisionsUnchanged: 1 });
    expect(second.summary).toMatch(/Nothing new/);
    expect(await dump(b)).toBe(once);
  });

  it('two phones merge into their union, in either order, and a conflicting edit keeps both revisions', async () => {
    const { a: phoneA, b: phoneB, study, r: shared } = await copied();
    // Both phones go on offline: each logs its own runs and both change run 1.
    await log(phoneA, study.id, 2, '71');
    await edit(phoneA, shared.run.id, '70.4');
    await log(phoneB, study.id, 3, '72');
    await edit(phoneB, shared.run.id, '69.6');
    const fileA = await exportBackup(phoneA);
    const fileB = await exportBackup(phoneB);

    const ab = await freshStore();
    await importBackup(ab, fileA);
    const r = await importBackup(ab, fileB);
    const ba = await freshStore();
    await importBackup(ba, fileB);
    await importBackup(ba, fileA);
    expect(await dump(ab)).toBe(await dump(ba));
    expect(r.conflicts).toHaveLength(1);
    expect(r.conflicts[0]).toMatchObject({ runId: shared.run.id, plannedRun: 1 });
    expect(r.summary).toMatch(/1 run was changed on two devices; both revisions are kept/);
    expect(r.summary).toContain(`run 1 of "${study.title}"`);
    expect(r.summary).toMatch(/marked on the run sheet and the run's form/);
    // The run is listed with both current revisions, the one used last, both values shown.
    const split = await listDivergedRuns(ab, study.id);
    expect(split.map((d) => [d.plannedRun, d.oneDevice])).toEqual([[1, false]]);
    expect([split[0].current, ...split[0].others].map((x) => x.readings[0][0]).sort()).toEqual([69.6, 70.4]);
    const merged = await getRun(ab, shared.run.id);
    expect(merged.heads).toHaveLength(2);
    expect(merged.revisions).toBe(3);
    // The current revision is decided by revision counter and device id, not by who merged first.
    const expectedDevice = [phoneA.device, phoneB.device].sort()[1];
    expect(merged.device).toBe(expectedDevice);
    expect((await ab.db.runs.count())).toBe(3);

    // Each phone importing the other's file reaches the same state as the merges.
    await importBackup(phoneA, fileB);
    await importBackup(phoneB, fileA);
    const strip = async (s: Store) => JSON.parse(await dump(s));
    expect((await strip(phoneA)).runs).toEqual((await strip(ab)).runs);
    expect((await strip(phoneB)).revisions).toEqual((await strip(ab)).revisions);
  });

  it('an altered or damaged file is refused with a clear message and changes nothing', async () => {
    const { b, text } = await copied();
    const before = await dump(b);
    const tampered = text.replace('"70"', '"71"').replace(/\[\s*70\s*\]/, '[71]');
    expect(tampered).not.toBe(text);
    await expect(importBackup(b, tampered)).rejects.toThrow(/checksum: the payload does not match/);
    await expect(importBackup(b, text.slice(0, text.length / 2))).rejects.toThrow(/not valid JSON.*line \d+, column \d+/);
    const newer = JSON.parse(text);
    newer.formatVersion = 99;
    await expect(importBackup(b, JSON.stringify(newer))).rejects.toThrow(new RegExp(`format version 99, written by a newer Trialbook; this one reads versions up to ${BACKUP_VERSION}`));
    expect(await dump(b)).toBe(before);
  });

  it('a revision with a stored id but other content is set aside with the field that differs; the rest imports; both are kept', async () => {
    const { a, b, study, r } = await copied();
    await log(b, study.id, 2, '75');
    const storedBefore = await b.db.revisions.get(r.revision.id);
    // On a: a later edit of run 1 (built on the revision that will be altered) and a new run 3.
    const child = await edit(a, r.run.id, '71');
    const run3 = await log(a, study.id, 3, '68');
    // Make a valid file (right checksum) in which the revision b holds has other readings.
    const doc = await readBackup(await exportBackup(a));
    const altered = { ...doc.payload, revisions: doc.payload.revisions.map((x) => (x.id === r.revision.id ? { ...x, readings: [[99], []] } : x)) };
    const { writeBackup } = await import('../../src/io/backup/backup.ts');
    const file = await writeBackup(altered, { device: a.device, exportedAt: new Date().toISOString(), scope: 'all' });
    const report = await importBackup(b, file);
    // The clash and the edit built on it are set aside; run 3 (consistent) is imported.
    expect(report.setAside.map((x) => [x.id, x.field])).toEqual([
      [r.revision.id, 'readings[0][0]'],
      [child.revision.id, null],
    ]);
    expect(report.setAside[0].reason).toMatch(/differs from the revision with the same id on this device in readings\[0\]\[0\]/);
    expect(report.setAside[1].reason).toMatch(new RegExp(`builds on revision ${r.revision.id}, which was set aside`));
    expect(report.revisionsAdded).toBe(1);
    expect(report.summary).toMatch(/Imported 0 new studies, 1 new logged run, 1 new revision\. 2 records of the file were set aside, not merged: 1 has the id of a record on this device with other content \(revision .* of run 1 \(readings\[0\]\[0\] differs\)\) and 1 depend on it\. Both records are kept/);
    expect(await b.db.revisions.get(run3.revision.id)).toBeDefined();
    expect(await b.db.revisions.get(child.revision.id)).toBeUndefined();
    // The device's own revision is as it was; the file's version is kept apart, whole.
    expect(await b.db.revisions.get(r.revision.id)).toEqual(storedBefore);
    const { listSetAside } = await import('../../src/store/set-aside.ts');
    const kept = await listSetAside(b);
    expect(kept.map((k) => k.id).sort()).toEqual([r.revision.id, child.revision.id].sort());
    expect(kept.find((k) => k.id === r.revision.id)!.record).toEqual({ ...storedBefore, readings: [[99], []] });
    expect(kept[0].fromDevice).toBe(a.device);
    // The same file again: nothing new, and nothing set aside twice; a later file from a still imports.
    const again = await importBackup(b, file);
    expect(again.revisionsAdded).toBe(0);
    expect(again.setAsideNew).toBe(0);
    expect((await listSetAside(b)).length).toBe(2);
    const run4 = await log(a, study.id, 4, '66');
    const doc2 = await readBackup(await exportBackup(a));
    const file2 = await writeBackup({ ...doc2.payload, revisions: doc2.payload.revisions.map((x) => (x.id === r.revision.id ? { ...x, readings: [[99], []] } : x)) }, { device: a.device, exportedAt: new Date().toISOString(), scope: 'all' });
    const later = await importBackup(b, file2);
    expect(later.revisionsAdded).toBe(1);
    expect(await b.db.revisions.get(run4.revision.id)).toBeDefined();
  });

  it('a study with a stored id but another plan is set aside with its revisions; the device\'s study stays', async () => {
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    await log(a, study.id, 1, '70');
    const b = await freshStore();
    await importBackup(b, await exportBackup(a));
    await log(a, study.id, 2, '72');
    const doc = await readBackup(await exportBackup(a));
    const { writeBackup } = await import('../../src/io/backup/backup.ts');
    const file = await writeBackup({ ...doc.payload, studies: doc.payload.studies.map((s) => ({ ...s, title: 'Renamed' })) }, { device: a.device, exportedAt: new Date().toISOString(), scope: 'all' });
    const before = await dump(b);
    const report = await importBackup(b, file);
    expect(report.setAside.map((x) => [x.kind, x.field])).toEqual([
      ['study', 'title'],
      ['revision', null],
    ]);
    expect(report.setAside[1].reason).toMatch(/belongs to study "Renamed" .* which was set aside/);
    expect(await dump(b)).toBe(before);
  });
});

describe('keeping records safe', () => {
  it('asks for persistent storage after the first saved run, not on open, once, and keeps the answer', async () => {
    let asked = 0;
    const storage = { persist: async () => (asked++, true), estimate: async () => ({ usage: 1234, quota: 10_000_000 }) };
    const store = await freshStore({ storage });
    const study = await createStudy(store, coatingPlan());
    expect(asked).toBe(0);
    expect((await persistenceAnswer(store)).asked).toBe(false);
    await log(store, study.id, 1, '70');
    await new Promise((r) => setTimeout(r, 20));
    await log(store, study.id, 2, '71');
    await new Promise((r) => setTimeout(r, 20));
    expect(asked).toBe(1);
    const status = await safetyStatus(store);
    expect(status.persistence).toMatchObject({ asked: true, granted: true });
    expect([status.used, status.quota]).toEqual([1234, 10_000_000]);
  });
});
