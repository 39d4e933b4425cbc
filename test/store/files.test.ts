import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { BACKUP_VERSION, readBackup } from '../../src/io/backup/backup.ts';
import { canonicalJson } from '../../src/core/records/canonical-json.ts';
import { exportBackup, importBackup, payloadOf } from '../../src/store/files.ts';
import { createStudy } from '../../src/store/studies.ts';
import { excludeRun, getRun, openNewRun, openRun, saveRun } from '../../src/store/runs.ts';
import { safetyStatus, persistenceAnswer, BACKUP_REMINDER_MS } from '../../src/store/status.ts';
import type { Store } from '../../src/store/store.ts';
import { coatingPlan, freshStore } from './helpers.ts';

async function log(store: Store, studyId: string, plannedRun: number, thickness: string) {
  const state = await openNewRun(store, studyId, plannedRun);
  return saveRun(store, { ...state, studyId, values: parseRunForm(state.study, { ...state.form, readings: [thickness, ''] }) });
}

async function edit(store: Store, runId: string, thickness: string) {
  const state = await openRun(store, runId);
  return saveRun(store, { ...state, studyId: state.study.id, values: parseRunForm(state.study, { ...state.form, readings: [thickness, ''] }) });
}

/** Everything a store holds, in a form to compare. */
async function dump(store: Store) {
  const p = await payloadOf(store);
  const runs = await store.db.runs.toArray();
  return canonicalJson({ studies: [...p.studies].sort((a, b) => (a.id < b.id ? -1 : 1)), revisions: [...p.revisions].sort((a, b) => (a.id < b.id ? -1 : 1)), runs: runs.sort((a, b) => (a.id < b.id ? -1 : 1)) });
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
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    await log(a, study.id, 1, '70');
    const text = await exportBackup(a);
    const b = await freshStore();
    await importBackup(b, text);
    const once = await dump(b);
    const second = await importBackup(b, text);
    expect(second).toMatchObject({ studiesAdded: 0, revisionsAdded: 0, runsAdded: 0, studiesUnchanged: 1, revisionsUnchanged: 1 });
    expect(second.summary).toMatch(/Nothing new/);
    expect(await dump(b)).toBe(once);
  });

  it('two phones merge into their union, in either order, and a conflicting edit keeps both revisions', async () => {
    const phoneA = await freshStore();
    const study = await createStudy(phoneA, coatingPlan());
    const shared = await log(phoneA, study.id, 1, '70');
    const phoneB = await freshStore();
    await importBackup(phoneB, await exportBackup(phoneA));
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
    expect(r.summary).toMatch(/1 run was changed on two devices; both versions are kept/);
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
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    await log(a, study.id, 1, '70');
    const text = await exportBackup(a);
    const b = await freshStore();
    await importBackup(b, text);
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

  it('a file whose revision has the same id as a stored one but other content is refused whole', async () => {
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    const r = await log(a, study.id, 1, '70');
    const b = await freshStore();
    await importBackup(b, await exportBackup(a));
    await log(b, study.id, 2, '75');
    const before = await dump(b);
    // Make a valid file (right checksum) in which the stored revision's readings were changed.
    const doc = await readBackup(await exportBackup(a));
    const altered = { ...doc.payload, revisions: doc.payload.revisions.map((x) => (x.id === r.revision.id ? { ...x, readings: [[99], []] } : x)) };
    const { writeBackup } = await import('../../src/io/backup/backup.ts');
    const file = await writeBackup(altered, { device: a.device, exportedAt: new Date().toISOString(), scope: 'all' });
    await expect(importBackup(b, file)).rejects.toThrow(/differs from the revision with the same id on this device/);
    expect(await dump(b)).toBe(before);
  });
});

describe('keeping records safe', () => {
  it('reminds of a backup when runs saved more than a week ago are in no export, and knows when the last export was', async () => {
    let now = new Date('2024-03-01T08:00:00Z');
    const store = await freshStore({ now: () => now });
    const study = await createStudy(store, coatingPlan());
    const later = (ms: number) => (now = new Date(now.getTime() + ms));
    expect((await safetyStatus(store)).backupDue).toEqual([]); // nothing logged yet
    await log(store, study.id, 1, '70');
    later(60_000);
    expect((await safetyStatus(store)).backupDue).toEqual([]); // logged a minute ago: not overdue
    later(BACKUP_REMINDER_MS - 61_000);
    expect((await safetyStatus(store)).backupDue).toEqual([]); // a second short of a week
    later(2000);
    expect((await safetyStatus(store)).backupDue).toEqual([{ studyId: study.id, title: study.title, lastExport: null }]);
    await exportBackup(store, [study.id]);
    const exported = now.toISOString();
    expect((await safetyStatus(store)).lastExports[study.id]).toBe(exported);
    expect((await safetyStatus(store)).backupDue).toEqual([]);
    later(3 * BACKUP_REMINDER_MS);
    expect((await safetyStatus(store)).backupDue).toEqual([]); // an old export, but nothing new since
    await log(store, study.id, 2, '71');
    later(BACKUP_REMINDER_MS + 1000);
    expect((await safetyStatus(store)).backupDue.map((d) => d.lastExport)).toEqual([exported]);
  });

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
