/**
 * Opening the store: the database, this device's id, and what happens when another tab
 * upgrades the database (drafts are written, the database closes, and the screens are told),
 * when the browser deletes the database under the page (the screens are told, and nothing claims
 * a draft was kept), or when this tab's upgrade is blocked by another tab (the screens are told
 * what to do).
 */
import type { Dexie, DexieOptions } from 'dexie';
import { DB_NAME, TrialbookDB, declareSchema } from './db.ts';
import { StorageError, toStorageError } from './errors.ts';
import { newId } from './ids.ts';

/** The parts of navigator.storage the store uses (absent in Node and some browsers). */
export interface StorageManagerLike {
  estimate?(): Promise<{ usage?: number; quota?: number }>;
  persist?(): Promise<boolean>;
  persisted?(): Promise<boolean>;
}

export interface StoreOptions {
  /** Database name; tests use one per store. */
  readonly name?: string;
  /** Dexie options such as indexedDB and IDBKeyRange (tests); durability is always strict. */
  readonly dexie?: DexieOptions;
  /** Schema declaration (the test harness adds a version after the real ones). */
  readonly declare?: (db: Dexie) => void;
  /** Told when another tab upgrades the database and this tab has closed it. */
  readonly onClosed?: (message: string) => void;
  /** Told when the browser removed the database under the open page (its site data cleared). */
  readonly onCleared?: (message: string) => void;
  /** Told when opening waits for another tab to let go of an older version. */
  readonly onBlocked?: (message: string) => void;
  /** The clock for times shown to people and for the backup reminder (tests set it). */
  readonly now?: () => Date;
  /** navigator.storage, or a stand-in in tests. */
  readonly storage?: StorageManagerLike | null;
}

export interface Store {
  readonly db: TrialbookDB;
  /** This device's id, made on first open and kept. */
  readonly device: string;
  readonly now: () => Date;
  readonly storage: StorageManagerLike | null;
  /** Draft writes still running (waited for before closing for an upgrade). */
  readonly pending: Set<Promise<unknown>>;
  /** Why the store closed, once it has. */
  closed: string | null;
}

export const CLOSED_FOR_UPGRADE =
  'Trialbook was updated in another tab, so this tab has saved your draft and closed its database. Reload this page to go on with the new version.';
export const STORAGE_CLEARED =
  "The browser removed this device's Trialbook records (the site's stored data was cleared), so nothing typed here can be saved on this device any more, and no draft was kept. What is on this screen is still here, in this page only: download it now, before you close or reload the page.";
export const OPEN_BLOCKED =
  'Trialbook is waiting for another tab or window that still has an older version open. Close or reload the other Trialbook tabs, and this one will go on by itself.';

function defaultStorage(): StorageManagerLike | null {
  const nav = (globalThis as { navigator?: { storage?: StorageManagerLike } }).navigator;
  return nav?.storage ?? null;
}

/** Opens (creating or upgrading) the database and returns the store handle. */
export async function openStore(options: StoreOptions = {}): Promise<Store> {
  const db = new TrialbookDB(options.name ?? DB_NAME, options.dexie, options.declare ?? declareSchema);
  const store: Store = {
    db,
    device: '',
    now: options.now ?? (() => new Date()),
    storage: options.storage === undefined ? defaultStorage() : options.storage,
    pending: new Set(),
    closed: null,
  };
  db.on('blocked', () => {
    options.onBlocked?.(OPEN_BLOCKED);
  });
  // Subscribed after Dexie's own handler, so it runs first; returning false stops Dexie from
  // closing at once, so running draft writes finish before the close.
  // The database deleted under the page (site data cleared): a version change to no version, or
  // the browser closing the connection itself. Nothing can be written any more; say so plainly.
  const cleared = () => {
    if (store.closed !== null) return;
    store.closed = STORAGE_CLEARED;
    db.close({ disableAutoOpen: true });
    options.onCleared?.(STORAGE_CLEARED);
  };
  db.on('versionchange', (event: IDBVersionChangeEvent) => {
    if (event.newVersion === null) {
      cleared();
      return false;
    }
    void (async () => {
      await Promise.allSettled([...store.pending]);
      if (store.closed !== null) return;
      store.closed = CLOSED_FOR_UPGRADE; // first: the close below fires 'close', which must not read as a clearing
      db.close({ disableAutoOpen: true });
      options.onClosed?.(CLOSED_FOR_UPGRADE);
    })();
    return false;
  });
  try {
    await db.open();
    const device = await db.transaction('rw', db.meta, async () => {
      const row = await db.meta.get('device');
      if (row && typeof row.value === 'string') return row.value;
      const id = newId();
      await db.meta.add({ key: 'device', value: id });
      return id;
    });
    (store as { device: string }).device = device;
    // Fired by every close; the store's own closes set `closed` first, so only the browser's counts.
    db.on('close', cleared);
  } catch (err) {
    db.close();
    const e = toStorageError(err);
    if (e instanceof StorageError) throw e;
    throw new StorageError('upgrade', err);
  }
  return store;
}

/** Closes the store (a later call to any store function fails with a clear message). */
export function closeStore(store: Store): void {
  store.closed = 'closed'; // first, so the close is not taken for the browser's clearing
  store.db.close({ disableAutoOpen: true });
}
