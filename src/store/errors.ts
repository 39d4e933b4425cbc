/**
 * What goes wrong when writing, told so a person can act: the storage is full, the browser
 * canceled the write, or the database was closed for an upgrade in another tab. Every such
 * failure leaves nothing half written (each write is one transaction) and keeps the draft.
 */
import { InputError } from '../core/errors.ts';

export type StorageProblem = 'quota' | 'aborted' | 'closed' | 'upgrade' | 'unavailable';

const MESSAGES: Record<StorageProblem, string> = {
  quota:
    'The storage for Trialbook on this device is full, so this was not saved. What you typed is kept as a draft. Export a backup now, then free space on the device.',
  aborted:
    'The browser stopped the write before it finished, so nothing was saved. What you typed is kept as a draft. Try again; if it keeps failing, export a backup.',
  closed:
    'Trialbook was updated in another tab, so this tab closed its database. What you typed is kept as a draft. Reload this page to go on.',
  upgrade:
    'Trialbook could not bring its database up to this version, so it left the stored records as they were. Export a backup from a tab with the earlier version, and report the problem.',
  unavailable:
    'This browser gives Trialbook no database here (a private window, or storage switched off), so nothing can be saved. Open Trialbook in a normal window.',
};

/** A write or open that failed for a reason of the storage, not of the input. */
export class StorageError extends Error {
  /** True when the person should be offered an export of a backup. */
  readonly offerExport: boolean;
  constructor(
    readonly problem: StorageProblem,
    /** The browser's or Dexie's error, for reports. */
    readonly underlying?: unknown,
  ) {
    super(MESSAGES[problem]);
    this.name = 'StorageError';
    this.offerExport = problem === 'quota' || problem === 'aborted' || problem === 'upgrade';
  }
}

type ErrorLike = { name?: unknown; message?: unknown; inner?: unknown; cause?: unknown; failures?: unknown };

/** The error and the errors it wraps (Dexie's inner, a cause, a bulk write's failures). */
function chain(err: unknown): ErrorLike[] {
  const out: ErrorLike[] = [];
  const queue: unknown[] = [err];
  while (queue.length > 0 && out.length < 20) {
    const e = queue.shift();
    if (!e || typeof e !== 'object') continue;
    const x = e as ErrorLike;
    out.push(x);
    queue.push(x.inner, x.cause);
    if (Array.isArray(x.failures)) queue.push(...x.failures);
    else if (x.failures && typeof x.failures === 'object') queue.push(...Object.values(x.failures));
  }
  return out;
}

/** True when the error is, or wraps, a full storage (QuotaExceededError, also inside an AbortError). */
export function isQuotaError(err: unknown): boolean {
  return chain(err).some((e) => e.name === 'QuotaExceededError' || (typeof e.message === 'string' && /quota/i.test(e.message)));
}

/** The error a caller gets: InputError as it came, storage failures as a StorageError. */
export function toStorageError(err: unknown): Error {
  if (err instanceof InputError || err instanceof StorageError) return err;
  if (isQuotaError(err)) return new StorageError('quota', err);
  const names = chain(err).map((e) => e.name);
  if (names.includes('DatabaseClosedError')) return new StorageError('closed', err);
  if (names.includes('UpgradeError')) return new StorageError('upgrade', err);
  if (names.includes('MissingAPIError') || names.includes('InvalidStateError')) return new StorageError('unavailable', err);
  if (names.includes('AbortError') || names.includes('TransactionInactiveError') || names.includes('UnknownError')) return new StorageError('aborted', err);
  return err instanceof Error ? err : new Error(String(err));
}

/** Runs a write, turning a storage failure into a StorageError. */
export async function guarded<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (err) {
    throw toStorageError(err);
  }
}
