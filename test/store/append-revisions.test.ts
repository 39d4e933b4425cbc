/**
 * The one write path: appendRevisions checks every record, stamps revisions made here with this
 * device and the store's clock, updates the runs it touches, and writes all or nothing.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.ts';
import { appendRevisions, type MadeRevision } from '../../src/store/append-revisions.ts';
import { importRunsCsv, mergeBackup } from '../../src/store/files.ts';
import { openNewRun, runHistory, saveRun } from '../../src/store/runs.ts';
import { createStudy, newStudyRecord } from '../../src/store/studies.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { mapRunsCsv, inspectRunsCsv } from '../../src/io/csv/runs-import.ts';
import { coatingPlan, freshStore } from './helpers.ts';

const CLOCK = '2031-01-02T03:04:05.000Z'; // an arbitrary fixed time, far from the wall clock

function made(studyId: string, over: Partial<MadeRevision> = {}): MadeRevision {
  return {
    id: `rev-${Math.random().toString(36).slice(2)}`,
    runId: 'run-1',
    studyId,
    plannedRun: 1,
    rev: 1,
    parents: [],
    restoredFrom: null,
    actual: [160, 2, 30],
    readings: [[70.5], []],
    loggedAt: null,
    operator: null,
    notes: '',
    excluded: false,
    reason: '',
    ...over,
  };
}

describe('appendRevisions', () => {
  it('stamps a made revision with this device and the store\'s clock, and updates its run', async () => {
    const store = await freshStore({ now: () => new Date(CLOCK) });
    const study = await createStudy(store, coatingPlan());
    expect(study.createdAt).toBe(CLOCK);
    const first = made(study.id);
    const out = await appendRevisions(store, { made: [first] });
    expect(out.revisions[0]).toMatchObject({ id: first.id, device: store.device, savedAt: CLOCK });
    expect(out.runs).toEqual([await store.db.runs.get('run-1')]);
    expect(out.runs[0]).toMatchObject({ revisionId: first.id, revisions: 1, heads: [first.id] });
    const second = made(study.id, { rev: 2, parents: [first.id], readings: [[71], []] });
    const next = await appendRevisions(store, { made: [second] });
    expect(next.runs[0]).toMatchObject({ revisionId: second.id, revisions: 2, heads: [second.id], readings: [[71], []] });
  });

  it('saving a run, a CSV import and creating a study all take their times from the store\'s clock', async () => {
    const store = await freshStore({ now: () => new Date(CLOCK) });
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 2);
    const saved = await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, readings: ['70', '80'] }) });
    expect(saved.revision.savedAt).toBe(CLOCK);
    const csv = 'Temperature (°C),Gloss\r\n160,80\r\n200,91\r\n';
    const mapped = mapRunsCsv(csv, { ...inspectRunsCsv(csv).suggestion, title: 'Invented trial' });
    const imported = await importRunsCsv(store, mapped);
    expect(imported.study.createdAt).toBe(CLOCK);
    const revs = await store.db.revisions.where('studyId').equals(imported.study.id).toArray();
    expect(revs.map((r) => r.savedAt)).toEqual([CLOCK, CLOCK]);
    expect(revs.every((r) => r.device === store.device)).toBe(true);
  });

  it('keeps an imported revision as it was written (device and time of the other phone)', async () => {
    const store = await freshStore({ now: () => new Date(CLOCK) });
    const study = newStudyRecord(store, coatingPlan());
    const other = { ...made(study.id), device: 'phone-2', savedAt: '2024-05-02T10:00:00.000Z' };
    await mergeBackup(store, { payload: { studies: [study], revisions: [other] } });
    expect(await store.db.revisions.get(other.id)).toEqual(other);
  });

  it('writes nothing when any record fails its checks, naming the record', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const good = made(study.id, { runId: 'run-a' });
    const bad = made(study.id, { runId: 'run-b', plannedRun: 2, readings: [[Number.NaN], []] });
    await expect(appendRevisions(store, { made: [good, bad] })).rejects.toThrow(/^Run 2\.readings\[0\]\[0\]: needs a finite number, got NaN$/);
    const badStudy = { ...newStudyRecord(store, coatingPlan('Invented second study')), responses: [{ name: 'Gloss', goal: 'maximize' as const, lowerBound: Number.POSITIVE_INFINITY }] };
    await expect(appendRevisions(store, { studies: [badStudy], made: [good] })).rejects.toThrow(/^study\.responses\[0\]\.lowerBound: needs a finite number, got Infinity$/);
    expect(await store.db.revisions.count()).toBe(0);
    expect(await store.db.runs.count()).toBe(0);
    expect(await store.db.studies.count()).toBe(1);
  });

  it('refuses a revision whose parent the run does not have, or that reuses a stored id', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const orphan = made(study.id, { rev: 2, parents: ['nowhere'] });
    await expect(appendRevisions(store, { made: [orphan] })).rejects.toThrow(/parents\[0\]: needs a revision in this file, got "nowhere"/);
    const first = made(study.id);
    await appendRevisions(store, { made: [first] });
    await expect(appendRevisions(store, { made: [{ ...first, notes: 'changed' }] })).rejects.toThrow(/revision ids must differ/);
    expect((await runHistory(store, 'run-1')).map((r) => r.notes)).toEqual(['']);
  });

  it('a study made from a plan without lower bounds is stored with null; one with a bound keeps it', async () => {
    const store = await freshStore();
    const plan = coatingPlan();
    const s = await createStudy(store, { ...plan, responses: [{ ...plan.responses[0], lowerBound: 0 }, plan.responses[1]] });
    expect(s.responses.map((r) => r.lowerBound)).toEqual([0, null]);
    expect(await store.db.studies.get(s.id)).toEqual(s);
    await expect(createStudy(store, { ...plan, responses: [{ ...plan.responses[0], lowerBound: Number.NaN }] })).rejects.toThrow(InputError);
  });

  it('a file\'s revision counter above 1,000,000,000 is refused, saying why; one at the bound imports and the run can still be saved', async () => {
    const store = await freshStore({ now: () => new Date(CLOCK) });
    const study = await createStudy(store, coatingPlan());
    const fromFile = (rev: number, id: string) => ({ ...made(study.id, { rev, id, runId: `run-${id}` }), device: 'other', savedAt: CLOCK });
    // Number.MAX_SAFE_INTEGER (ECMA-262): a counter there could never be followed exactly.
    await expect(mergeBackup(store, { payload: { studies: [], revisions: [fromFile(Number.MAX_SAFE_INTEGER, 'huge')] } })).rejects.toThrow(
      /^revisions\[0\]\.rev: needs a revision counter from 1 to 1000000000, got 9007199254740991; each save adds one to a run's counter, so no real history comes near this, and a counter this large would leave no room for the saves after it/,
    );
    expect(await store.db.revisions.count()).toBe(0);
    await mergeBackup(store, { payload: { studies: [], revisions: [fromFile(1_000_000_000, 'edge')] } });
    const state = await (await import('../../src/store/runs.ts')).openRun(store, 'run-edge');
    const saved = await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, readings: ['71', ''] }) });
    expect(saved.revision.rev).toBe(1_000_000_001);
    expect((await runHistory(store, 'run-edge')).map((r) => r.rev)).toEqual([1_000_000_000, 1_000_000_001]);
  });
});
