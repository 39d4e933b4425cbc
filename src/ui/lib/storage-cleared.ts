/**
 * When the browser removes this device's records under the open page (its site data cleared):
 * the store's message, for every screen, and a mark kept outside the database that the device
 * held studies, so that a later start never takes an emptied store for a first start (and never
 * seeds the demo over it). The mark lives in localStorage and sessionStorage: a clearing of the
 * database alone leaves them; a clearing of everything leaves the tab that saw it, which writes
 * the mark again after the clearing.
 */
import { signal } from '@preact/signals';

/** The store's message once the browser removed the database under this page, else null. */
export const storageCleared = signal<string | null>(null);

const HELD = 'trialbook-held-studies';

function stores(): Storage[] {
  const out: Storage[] = [];
  for (const get of [() => globalThis.localStorage, () => globalThis.sessionStorage]) {
    try {
      const s = get();
      if (s) out.push(s);
    } catch {
      // storage switched off: no mark can be kept, and none is read
    }
  }
  return out;
}

/** Notes that this device's store holds studies (called whenever it is seen to). */
export function markHeldStudies(): void {
  for (const s of stores()) {
    try {
      s.setItem(HELD, '1');
    } catch {
      // full or refused: the other store may still keep it
    }
  }
}

/** True when this device's store was seen holding studies before. */
export function heldStudiesBefore(): boolean {
  return stores().some((s) => {
    try {
      return s.getItem(HELD) === '1';
    } catch {
      return false;
    }
  });
}

/** Says that the browser removed the records: every screen shows it, and the mark is written again. */
export function reportCleared(message: string): void {
  markHeldStudies();
  storageCleared.value = message;
}
