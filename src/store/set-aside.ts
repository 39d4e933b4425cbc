/**
 * Records of imported files that were set aside (same id as a stored record, other content),
 * kept in their own table so that neither revision is lost and the person can see both.
 */
import { canonicalJson } from '../core/records/canonical-json.ts';
import { sha256, toHex, utf8Encode } from '../core/records/sha256.ts';
import type { SetAside } from '../io/backup/merge.ts';
import type { SetAsideRow } from './db.ts';
import { guarded } from './errors.ts';
import type { Store } from './store.ts';

/** The row key of a set-aside record: kind, id and the checksum of its content. */
export function setAsideKey(s: SetAside): string {
  return `${s.kind}:${s.id}:${toHex(sha256(utf8Encode(canonicalJson(s.record))))}`;
}

/**
 * Keeps set-aside records, inside the caller's transaction over db.setAside; a record already
 * kept (the same file imported again) is not added twice. Returns how many were new.
 */
export async function keepSetAside(store: Store, records: readonly SetAside[], fromDevice: string | null): Promise<number> {
  if (records.length === 0) return 0;
  const setAsideAt = store.now().toISOString();
  const rows: SetAsideRow[] = records.map((s) => ({ ...s, key: setAsideKey(s), fromDevice, setAsideAt }));
  const have = await store.db.setAside.bulkGet(rows.map((r) => r.key));
  const seen = new Set<string>();
  const fresh = rows.filter((r, i) => {
    if (have[i] || seen.has(r.key)) return false;
    seen.add(r.key);
    return true;
  });
  if (fresh.length > 0) await store.db.setAside.bulkAdd(fresh);
  return fresh.length;
}

/** Every set-aside record on this device, oldest first. */
export async function listSetAside(store: Store): Promise<SetAsideRow[]> {
  const rows = await guarded(() => store.db.setAside.toArray());
  return rows.sort((a, b) => (a.setAsideAt < b.setAsideAt ? -1 : a.setAsideAt > b.setAsideAt ? 1 : a.key < b.key ? -1 : 1));
}

/**
 * Removes one set-aside record, only when the person has confirmed it on the screen (the screen
 * asks first and offers the file of them). Returns false when no such record is kept (already
 * removed, in another tab): nothing else is touched either way.
 */
export async function removeSetAside(store: Store, key: string): Promise<boolean> {
  return guarded(() =>
    store.db.transaction('rw', store.db.setAside, async () => {
      if (!(await store.db.setAside.get(key))) return false;
      await store.db.setAside.delete(key);
      return true;
    }),
  );
}

/** The record on this device with the set-aside record's id (its study or revision), or undefined. */
export async function storedRecordOf(store: Store, s: Pick<SetAsideRow, 'kind' | 'id'>): Promise<unknown> {
  return guarded<unknown>(async () => (s.kind === 'study' ? await store.db.studies.get(s.id) : await store.db.revisions.get(s.id)));
}
