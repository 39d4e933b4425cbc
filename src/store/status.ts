/**
 * What the screens show about keeping records safe: the storage estimate (used, quota), whether
 * the browser granted persistent storage (asked once, after the first saved run, never on load),
 * and when each study was last exported, with a reminder when runs logged here more than a week ago
 * are in no export yet.
 * Browsers may delete best-effort storage under pressure, and some after days without a visit,
 * so the exported file is the real safety net.
 */
import { guarded } from './errors.ts';
import type { Store } from './store.ts';

/**
 * A reminder is due when a run logged (or changed) on this device this long ago is in no export
 * yet. A week: common practice for a reminder that is neither nagging nor too late.
 */
export const BACKUP_REMINDER_MS = 7 * 24 * 60 * 60 * 1000;

export interface StorageEstimate {
  /** Bytes used by this site, or null when the browser does not say. */
  readonly used: number | null;
  readonly quota: number | null;
}

export interface PersistenceAnswer {
  readonly asked: boolean;
  /** The browser's answer: true when storage is persistent. */
  readonly granted: boolean | null;
  readonly at: string | null;
}

export interface SafetyStatus extends StorageEstimate {
  readonly persistence: PersistenceAnswer;
  /** Time of the last export of each study that has one. */
  readonly lastExports: Readonly<Record<string, string>>;
  /**
   * Studies with a run logged or changed on this device more than a week ago and saved after the
   * study's last export (or never exported), with the time of the oldest such save.
   */
  readonly backupDue: readonly BackupDue[];
}

export interface BackupDue {
  readonly studyId: string;
  readonly title: string;
  readonly lastExport: string | null;
  /** When the oldest save not in any export was made (the store's clock). */
  readonly unexportedSince: string;
}

const estimates = new WeakMap<Store, StorageEstimate>();

/** Asks the browser how much storage is used and allowed, and keeps the answer for the screens. */
export async function refreshStorageEstimate(store: Store): Promise<StorageEstimate> {
  let estimate: StorageEstimate = { used: null, quota: null };
  try {
    const e = await store.storage?.estimate?.();
    estimate = { used: e?.usage ?? null, quota: e?.quota ?? null };
  } catch {
    // The browser does not say; the screens show "unknown".
  }
  estimates.set(store, estimate);
  return estimate;
}

/** The storage estimate last asked for (nulls until refreshStorageEstimate has run). */
export function storageEstimate(store: Store): StorageEstimate {
  return estimates.get(store) ?? { used: null, quota: null };
}

/** The kept answer to the persistent-storage request. */
export async function persistenceAnswer(store: Store): Promise<PersistenceAnswer> {
  const row = await guarded(() => store.db.meta.get('persistence'));
  return (row?.value as PersistenceAnswer | undefined) ?? { asked: false, granted: null, at: null };
}

const asking = new WeakMap<Store, Promise<PersistenceAnswer>>();

/** Asks once for persistent storage (called after a run is saved) and keeps the answer. */
export async function askPersistenceOnce(store: Store): Promise<PersistenceAnswer> {
  const running = asking.get(store);
  if (running) return running;
  const ask = (async () => {
    try {
      const before = await persistenceAnswer(store);
      if (before.asked) return before;
      let granted: boolean | null = null;
      try {
        if (store.storage?.persist) granted = await store.storage.persist();
      } catch {
        granted = false;
      }
      const answer: PersistenceAnswer = { asked: true, granted, at: store.now().toISOString() };
      await guarded(() => store.db.transaction('rw', store.db.meta, () => store.db.meta.put({ key: 'persistence', value: answer })));
      return answer;
    } catch {
      return { asked: false, granted: null, at: null };
    } finally {
      asking.delete(store);
    }
  })();
  asking.set(store, ask);
  return ask;
}

/** Times of the last export of each study. */
export async function lastExports(store: Store): Promise<Record<string, string>> {
  const row = await guarded(() => store.db.meta.get('exports'));
  return { ...((row?.value as Record<string, string> | undefined) ?? {}) };
}

/**
 * Notes that these studies were exported at `at` (now when not given): the time taken before
 * the exported records were read, so a save made while the file was written counts as unexported.
 */
export async function markExported(store: Store, studyIds: readonly string[], at: string = store.now().toISOString()): Promise<void> {
  await guarded(() =>
    store.db.transaction('rw', store.db.meta, async () => {
      const row = await store.db.meta.get('exports');
      const map = { ...((row?.value as Record<string, string> | undefined) ?? {}) };
      for (const id of studyIds) map[id] = at;
      await store.db.meta.put({ key: 'exports', value: map });
    }),
  );
}

/** Storage, persistence and export status, with the studies due for a backup. */
export async function safetyStatus(store: Store): Promise<SafetyStatus> {
  const [estimate, persistence, exportsMap, studies] = await Promise.all([
    refreshStorageEstimate(store),
    persistenceAnswer(store),
    lastExports(store),
    guarded(() => store.db.studies.toArray()),
  ]);
  const now = store.now().getTime();
  const backupDue: BackupDue[] = [];
  for (const s of studies) {
    const since = await oldestUnexportedSave(store, s.id, exportsMap[s.id] ?? null);
    if (since !== null && now - Date.parse(since) > BACKUP_REMINDER_MS) backupDue.push({ studyId: s.id, title: s.title, lastExport: exportsMap[s.id] ?? null, unexportedSince: since });
  }
  return { ...estimate, persistence, lastExports: exportsMap, backupDue };
}

/**
 * The oldest save made on this device after the study's last export (any save when it was never
 * exported), or null when every save here is in an export. Saves from another device came in by
 * a backup file, so a file holds them already. One pass over the study's revisions.
 */
async function oldestUnexportedSave(store: Store, studyId: string, lastExport: string | null): Promise<string | null> {
  const after = lastExport === null ? -Infinity : Date.parse(lastExport);
  let oldest: number | null = null;
  let oldestText: string | null = null;
  await guarded(() =>
    store.db.revisions
      .where('studyId')
      .equals(studyId)
      .each((r) => {
        if (r.device !== store.device) return;
        const t = Date.parse(r.savedAt);
        if (t > after && (oldest === null || t < oldest)) {
          oldest = t;
          oldestText = r.savedAt;
        }
      }),
  );
  return oldestText;
}
