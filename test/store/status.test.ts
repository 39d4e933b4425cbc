import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { exportBackup, importBackup } from '../../src/store/files.ts';
import { BACKUP_REMINDER_MS, safetyStatus } from '../../src/store/status.ts';
import { createStudy } from '../../src/store/studies.ts';
import { coatingPlan, freshStore, logThickness as log, editThickness as edit } from './helpers.ts';

const DAY = 24 * 60 * 60 * 1000;

/** A store whose clock the test moves. */
async function clockedStore(start = '2024-03-01T08:00:00Z') {
  const clock = { now: new Date(start) };
  const store = await freshStore({ now: () => clock.now });
  const later = (ms: number) => void (clock.now = new Date(clock.now.getTime() + ms));
  return { store, clock, later };
}

describe('a backup is due', () => {
  it('not minutes after logging, but once a run logged over a week ago is in no export', async () => {
    const { store, later } = await clockedStore();
    const study = await createStudy(store, coatingPlan());
    expect((await safetyStatus(store)).backupDue).toEqual([]); // nothing logged yet
    await log(store, study.id, 1, '70');
    later(5 * 60 * 1000);
    expect((await safetyStatus(store)).backupDue).toEqual([]); // the tryout's complaint: due minutes after logging
    later(BACKUP_REMINDER_MS - 5 * 60 * 1000 - 1000);
    expect((await safetyStatus(store)).backupDue).toEqual([]); // one second short of a week
    later(2000);
    expect((await safetyStatus(store)).backupDue).toEqual([
      { studyId: study.id, title: study.title, lastExport: null, unexportedSince: '2024-03-01T08:00:00.000Z' },
    ]);
  });

  it('is not due when the last export is old but nothing was logged since', async () => {
    const { store, later } = await clockedStore();
    const study = await createStudy(store, coatingPlan());
    await log(store, study.id, 1, '70');
    later(DAY);
    await exportBackup(store, [study.id]);
    later(30 * DAY);
    const status = await safetyStatus(store);
    expect(status.lastExports[study.id]).toBe('2024-03-02T08:00:00.000Z');
    expect(status.backupDue).toEqual([]);
  });

  it('counts from the oldest save after the last export, edits included', async () => {
    const { store, later } = await clockedStore();
    const study = await createStudy(store, coatingPlan());
    const first = await log(store, study.id, 1, '70');
    await exportBackup(store, [study.id]);
    later(DAY);
    await edit(store, first.run.id, '71'); // 2024-03-02: a change after the export
    later(DAY);
    await log(store, study.id, 2, '72'); // 2024-03-03
    later(BACKUP_REMINDER_MS - DAY - 1000); // six days and 23:59:59 after the edit
    expect((await safetyStatus(store)).backupDue).toEqual([]);
    later(2000);
    const due = (await safetyStatus(store)).backupDue;
    expect(due.map((d) => [d.lastExport, d.unexportedSince])).toEqual([['2024-03-01T08:00:00.000Z', '2024-03-02T08:00:00.000Z']]);
    await exportBackup(store, [study.id]);
    expect((await safetyStatus(store)).backupDue).toEqual([]);
  });

  it('looks at each study on its own', async () => {
    const { store, later } = await clockedStore();
    const a = await createStudy(store, coatingPlan('Invented demo: line A'));
    const b = await createStudy(store, coatingPlan('Invented demo: line B'));
    await log(store, a.id, 1, '70');
    await log(store, b.id, 1, '70');
    await exportBackup(store, [a.id]);
    later(8 * DAY);
    expect((await safetyStatus(store)).backupDue.map((d) => d.title)).toEqual(['Invented demo: line B']);
  });

  it('leaves out runs that came in from another device\'s backup: a file holds them already', async () => {
    const other = await clockedStore();
    const study = await createStudy(other.store, coatingPlan());
    await log(other.store, study.id, 1, '70');
    const file = await exportBackup(other.store);
    const { store, later } = await clockedStore('2024-03-20T08:00:00Z');
    await importBackup(store, file);
    expect((await safetyStatus(store)).backupDue).toEqual([]);
    await log(store, study.id, 2, '72');
    later(8 * DAY);
    expect((await safetyStatus(store)).backupDue.map((d) => d.unexportedSince)).toEqual(['2024-03-20T08:00:00.000Z']);
  });
});
