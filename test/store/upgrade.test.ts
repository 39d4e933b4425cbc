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
import { listDrafts, saveDraft } from '../../src/store/drafts.ts';
import { listRuns, openNewRun, openPlannedRun, openRun } from '../../src/store/runs.ts';
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

/** The table a record of an older version lives in after the upgrades: version 5 moves drafts to formDrafts. */
function upgradedTable(fromVersion: number, table: string): string {
  return fromVersion < 5 && table === 'drafts' ? 'formDrafts' : table;
}

/**
 * How a record of an older version looks after the upgrades, written out here rather than taken
 * from the upgrade code (db.ts), so that a wrong upgrade fails. Version 2: a study's planned runs
 * gain originBlock = block and their field yates becomes standardOrder, its responses
 * lowerBound = null. Version 5: a draft gains formId = its run's id (one draft per run before).
 * Every other table is unchanged.
 */
function upgraded(fromVersion: number, table: string, record: Row): Row {
  if (fromVersion < 5 && table === 'drafts') return { ...record, formId: record.runId };
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
        const table = store.db.table(upgradedTable(fx.schemaVersion, t));
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

  it('a draft typed under schema version 4 survives the upgrade to per-form drafts: its tab gets it back, other tabs see it waiting', async () => {
    const fx: StoreFixture = JSON.parse(readFileSync(fixtureDir + 'store-v4.json', 'utf8'));
    expect(fx.schemaVersion).toBe(4);
    // Two drafts as version 4 kept them (key runId): an edit of a logged run, and the typing of
    // the unlogged path run (a record that exists only as its draft).
    const logged = fx.tables.runs[0] as Row & { id: string; studyId: string; plannedRun: number; heads: string[] };
    const pathRun = (fx.tables.blocks[0] as { runs: { run: number }[] }).runs[1].run;
    const form = (notes: string, readings: string[]) => ({ actual: ['180', '3', '40'], readings, loggedAt: '', operator: 'Shift B (invented)', notes, excluded: false, reason: '' });
    const drafts: Row[] = [
      { runId: logged.id, studyId: logged.studyId, plannedRun: logged.plannedRun, revisionId: 'rev-typed-v4', parents: logged.heads, form: form('typed under v4', ['71.5', '83']), updatedAt: '2024-05-02T16:10:00.000Z' },
      { runId: 'run-path-typed-v4', studyId: logged.studyId, plannedRun: pathRun, revisionId: 'rev-path-v4', parents: [], form: form('path run typed', ['75', '']), updatedAt: '2024-05-02T16:20:00.000Z' },
    ];
    const name = `fixture-v4-draft-${Math.random()}`;
    await writeFixtureDb(name, { ...fx, tables: { ...fx.tables, drafts } });
    const store = await openStore({ name, storage: null });
    expect(store.db.verno).toBe(SCHEMA_VERSION);
    expect(store.db.tables.map((t) => t.name)).not.toContain('drafts');
    expect(await store.db.formDrafts.count()).toBe(2);
    // The tab that typed it (whose form id is now its run's id, as the upgrade gives it) gets it back whole.
    const own = await openRun(store, logged.id, logged.id);
    expect(own.fromDraft).toBe(true);
    expect(own.form).toEqual(drafts[0].form);
    expect(own.revisionId).toBe('rev-typed-v4');
    expect(own.parents).toEqual(logged.heads);
    // Any other tab opens the saved run and is told the typing waits.
    const other = await openRun(store, logged.id);
    expect(other.fromDraft).toBe(false);
    expect(other.otherDrafts.map((d) => d.form.notes)).toEqual(['typed under v4']);
    // The path run's typing: a new form of that planned run finds its record id and the waiting typing.
    const path = await openPlannedRun(store, logged.studyId, pathRun);
    expect(path.runId).toBe('run-path-typed-v4');
    expect(path.otherDrafts.map((d) => d.form.readings)).toEqual([['75', '']]);
    expect((await listDrafts(store, logged.studyId)).map((d) => d.formId)).toEqual([logged.id, 'run-path-typed-v4']);
    closeStore(store);
  });

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
    expect((await next.table('formDrafts').get(state.formId)).form.notes).toBe('typed just before the update');
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
