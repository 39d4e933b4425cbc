/**
 * The id of one open form in this tab: kept in the tab's sessionStorage, so a reload of the same
 * tab finds its own draft again, while another tab (which has its own session) gets another id
 * and so another draft. Without sessionStorage (a private mode that refuses it) each opening
 * gets a fresh id: the typing is still kept, and the reload lists it as waiting typing to pick.
 */
const PREFIX = 'trialbook-form-id:';

/** The form id of `key` (for instance "run-form:<study>:<run>") in this tab, made once per tab. */
export function formIdFor(key: string): string {
  const fresh = () => crypto.randomUUID();
  let session: Storage | null = null;
  try {
    session = globalThis.sessionStorage ?? null;
  } catch {
    session = null; // a browser that blocks storage throws on the property itself
  }
  if (!session) return fresh();
  try {
    const kept = session.getItem(PREFIX + key);
    if (kept) return kept;
    const id = fresh();
    session.setItem(PREFIX + key, id);
    return id;
  } catch {
    return fresh();
  }
}
