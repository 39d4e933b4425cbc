/**
 * Schema versions: a database written by every earlier schema version (a fixture in
 * test/fixtures/store-v<N>.json, written by that version's code) opens with the current code and
 * loses nothing; an upgrade that throws leaves the old database as it was; another tab's upgrade
 * closes this one after its draft writes finish; an open blocked by another tab says what to do.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Dexie } from 'dexie';
import { checkStudy } from '../../src/core/records/check-study.ts';
import { withAddedBlocks } from '../../src/core/study/added-block.ts';
import { readBackup } from '../../src/io/backup/backup.ts';
import { SCHEMA_VERSION, declareSchema } from '../../src/store/db.ts';
import { exportBackup } from '../../src/store/files.ts';
import { StorageError } from '../../src/store/errors.ts';
import { saveDraft } from '../../src/store/drafts.ts';
import { listRuns, openNewRun } from '../../src/store/runs.ts';
import { createStudy, listStudies } from '../../src/store/studies.ts';
import { CLOSED_FOR_UPGRADE, OPEN_BLOCKED, STORAGE_CLEARED, closeStore, openStore } from '../../src/store/store.ts';
import { coatingPlan, freshStore } from './helpers.ts';

const fixtureDir = fileURLToPath(new URL('../fixtures/', import.meta.url));
const fixtures = readdirSync(fixtureDir).filter((f) => /^store-v\d+\.json$/.test(f));

interface StoreFixture {
  schemaVersion: number;
  stores: Record<string, string>;
  tables: Record<string, Row[]>;
}

type Row = { [k: string]: unknown };

/**
 * How a record of an older version looks after the upgrades, written out here rather than taken
 * from the upgrade code (db.ts), so that a wrong upgrade fails. Version 2: a study's planned runs
 * gain originBlock = block and their field yates becomes standardOrder, its responses
 * lowerBound = null; every other table is unchanged.
 */
function upgraded(fromVersion: number, table: string, record: Row): Row {
  if (fromVersion >= 2 || table !== 'studies') return record;
  const design = record.design as Row & { runs: Row[] };
  return {
    ...record,
    responses: (record.responses as Row[]).map((r) => ({ ...r, lowerBound: null })),
    design: {
      ...design,
      runs: design.runs.map(({ yates, ...run }) => ({ ...run, standardOrder: yates, originBlock: run.block })),
    },
  };
}

/** Writes a fixture as a database of its own schema version, with nothing of the current code. */
async function writeFixtureDb(name: string, fx: StoreFixture) {
  const old = new Dexie(name);
  old.version(fx.schemaVersion).stores(fx.stores);
  await old.open();
  await old.transaction('rw', old.tables, async () => {
    for (const [t, rows] of Object.entries(fx.tables)) await old.table(t).bulkAdd(rows);
  });
  old.close();
}

describe('schema upgrades', () => {
  it('there is a fixture of every schema version up to the current one', () => {
    const versions = fixtures.map((f) => Number(/\d+/.exec(f)![0])).sort((a, b) => a - b);
    expect(versions).toEqual(Array.from({ length: SCHEMA_VERSION }, (_, i) => i + 1));
  });

  for (const file of fixtures) {
    it(`a database written by ${file.replace('.json', '')} opens with the current code and loses nothing`, async () => {
      const fx: StoreFixture = JSON.parse(readFileSync(fixtureDir + file, 'utf8'));
      // The fixture is what its version wrote: version 1 knew no origin block and no lower bound.
      if (fx.schemaVersion === 1) expect(JSON.stringify(fx.tables.studies)).not.toMatch(/originBlock|lowerBound/);
      const name = `fixture-${file}-${Math.random()}`;
      await writeFixtureDb(name, fx);
      const store = await openStore({ name, storage: null });
      expect(store.db.verno).toBe(SCHEMA_VERSION);
      let total = 0;
      for (const [t, rows] of Object.entries(fx.tables)) {
        const table = store.db.table(t);
        for (const row of rows) {
          const key = (row as Record<string, unknown>)[table.schema.primKey.keyPath as string] as string;
          expect(await table.get(key), `${t} ${key}`).toEqual(upgraded(fx.schemaVersion, t, row));
          total++;
        }
        expect(await table.count()).toBe(rows.length);
      }
      expect(total).toBeGreaterThan(20);
      const [study] = await listStudies(store);
      expect((await listRuns(store, study.id)).length).toBe(fx.tables.runs.length);
      // Every upgraded study passes the record checks, so it exports and reads back whole.
      expect(checkStudy(JSON.parse(JSON.stringify(study)), 'study')).toEqual(study);
      const back = await readBackup(await exportBackup(store));
      // The study as read carries its added blocks' runs (schema 3); the file keeps them apart.
      expect(back.payload.studies.map((s) => withAddedBlocks(s, back.payload.blocks ?? []))).toEqual([study]);
      expect(back.payload.blocks?.length ?? 0).toBe(fx.tables.blocks?.length ?? 0);
      expect(back.payload.revisions.length).toBe(fx.tables.revisions.length);
      closeStore(store);
    });
  }

  it('an upgrade that throws leaves the old database intact, at its old version', async () => {
    const store = await freshStore();
    const name = store.db.name;
    const study = await createStudy(store, coatingPlan());
    closeStore(store);
    const throwing = (db: Dexie) => {
      declareSchema(db);
      db.version(SCHEMA_VERSION + 1)
        .stores({ runs: 'id, studyId, plannedRun' })
        .upgrade(async (tx) => {
          await tx.table('studies').clear(); // a half-done change that must not survive
          throw new Error('upgrade step failed');
        });
    };
    const err = await openStore({ name, storage: null, declare: throwing }).catch((e) => e);
    expect(err).toBeInstanceOf(StorageError);
    expect((err as StorageError).problem).toBe('upgrade');
    expect((err as Error).message).toMatch(/left the stored records as they were/);
    const again = await openStore({ name, storage: null });
    expect(again.db.verno).toBe(SCHEMA_VERSION);
    expect((await listStudies(again)).map((s) => s.id)).toEqual([study.id]);
    closeStore(again);
  });

  it('when another tab upgrades, this tab finishes its draft write, closes and says so', async () => {
    const messages: string[] = [];
    const store = await freshStore({ onClosed: (m) => messages.push(m) });
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 1);
    const draftWrite = saveDraft(store, { ...state, studyId: study.id }, { ...state.form, notes: 'typed just before the update' });
    const next = new Dexie(store.db.name);
    declareSchema(next);
    next.version(SCHEMA_VERSION + 1).stores({});
    await draftWrite;
    await next.open();
    expect(messages).toEqual([CLOSED_FOR_UPGRADE]);
    expect((await next.table('drafts').get(state.runId)).form.notes).toBe('typed just before the update');
    await expect(listStudies(store)).rejects.toThrow(StorageError);
    next.close();
  });

  it('when the browser deletes the database under the page, the store says so plainly, claims no draft, and writes nothing', async () => {
    const closed: string[] = [];
    const cleared: string[] = [];
    const store = await freshStore({ onClosed: (m) => closed.push(m), onCleared: (m) => cleared.push(m) });
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 1);
    // What clearing the site's data does to an open database: it is deleted (a version change to no version).
    await new Promise<void>((resolve, reject) => {
      const req = indexedDB.deleteDatabase(store.db.name);
      req.onsuccess = () => resolve();
      req.onerror = () => reject(req.error);
    });
    expect(cleared).toEqual([STORAGE_CLEARED]);
    expect(closed).toEqual([]); // not "updated in another tab"
    expect(store.closed).toBe(STORAGE_CLEARED);
    expect(STORAGE_CLEARED).not.toMatch(/kept as a draft|saved your draft|another tab/);
    // A draft write now fails (it must not recreate an empty database behind the person's back).
    await expect(saveDraft(store, { ...state, studyId: study.id }, { ...state.form, notes: 'typed after the clearing' })).rejects.toThrow(StorageError);
    const names = (await indexedDB.databases()).map((d) => d.name);
    expect(names).not.toContain(store.db.name);
  });

  it('the store\'s own close is not taken for a clearing', async () => {
    const cleared: string[] = [];
    const store = await freshStore({ onCleared: (m) => cleared.push(m) });
    closeStore(store);
    expect(cleared).toEqual([]);
    expect(store.closed).toBe('closed');
  });

  it('an open blocked by another tab that holds the old version says what to do, then goes on', async () => {
    const store = await freshStore();
    const name = store.db.name;
    closeStore(store);
    // A connection that does not let go when asked (an old tab of another app version).
    const raw = await new Promise<IDBDatabase>((resolve, reject) => {
      const req = indexedDB.open(name);
      req.onsuccess = () => resolve(req.result);
      req.onerror = () => reject(req.error);
    });
    raw.onversionchange = () => {};
    const blocked: string[] = [];
    const upgrading = openStore({
      name,
      storage: null,
      onBlocked: (m) => blocked.push(m),
      declare: (db) => {
        declareSchema(db);
        db.version(SCHEMA_VERSION + 1).stores({});
      },
    });
    await new Promise((r) => setTimeout(r, 100));
    expect(blocked).toEqual([OPEN_BLOCKED]);
    raw.close();
    const opened = await upgrading;
    expect(opened.db.verno).toBe(SCHEMA_VERSION + 1);
    closeStore(opened);
  });
});
