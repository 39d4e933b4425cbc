/**
 * What the screens show about keeping records safe: the storage estimate (used, quota), whether
 * the browser granted persistent storage (asked once, after the first saved run, never on load),
 * and when each study was last exported, with a reminder when runs saved more than a week ago
 * have never been exported (not merely when the last export is old: a study whose runs are all
 * in an export needs no reminder, and a run saved minutes ago is not yet overdue).
 * Browsers may delete best-effort storage under pressure, and some after days without a visit,
 * so the exported file is the real safety net.
 */
import { guarded } from './errors.ts';
import type { Store } from './store.ts';

/** A reminder is due when a run saved longer ago than this is in no export (common practice: a weekly backup). */
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
  /** Studies with a revision saved more than a week ago and after the study's last export (or never exported). */
  readonly backupDue: readonly { readonly studyId: string; readonly title: string; readonly lastExport: string | null }[];
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

/** Notes that these studies were exported now (inside the caller's transaction or alone). */
export async function markExported(store: Store, studyIds: readonly string[]): Promise<void> {
  const at = store.now().toISOString();
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
  const backupDue: SafetyStatus['backupDue'][number][] = [];
  for (const s of studies) {
    const last = exportsMap[s.id] ?? null;
    const exportedAt = last === null ? -Infinity : Date.parse(last);
    const revisions = await guarded(() => store.db.revisions.where('studyId').equals(s.id).toArray());
    // Saving times are the store's clock (appendRevisions), compared as instants.
    const overdue = revisions.some((r) => {
      const saved = Date.parse(r.savedAt);
      return saved > exportedAt && now - saved > BACKUP_REMINDER_MS;
    });
    if (overdue) backupDue.push({ studyId: s.id, title: s.title, lastExport: last });
  }
  return { ...estimate, persistence, lastExports: exportsMap, backupDue };
}
