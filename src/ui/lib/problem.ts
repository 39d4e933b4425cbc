/**
 * What went wrong, for a screen: the message to show and whether to offer a backup export
 * (a StorageError says so; a wrong entry never does).
 */
import { InputError } from '../../core/errors.ts';
import { StorageError } from '../../store/errors.ts';

export interface Problem {
  readonly message: string;
  /** True for a storage failure where an exported backup is the safe next step. */
  readonly offerExport: boolean;
  /** 'input' for something typed or chosen that cannot be used; 'storage' for the device's storage. */
  readonly kind: 'input' | 'storage' | 'other';
}

export function problemOf(err: unknown): Problem {
  if (err instanceof StorageError) return { message: err.message, offerExport: err.offerExport, kind: 'storage' };
  if (err instanceof InputError) return { message: err.message, offerExport: false, kind: 'input' };
  const message = err instanceof Error ? err.message : String(err);
  return { message: `Something went wrong: ${message}`, offerExport: false, kind: 'other' };
}
