/**
 * Field checks of stored and exported records: each takes a value read from a file or about to
 * be stored and a path naming where it is ("payload.revisions[3].readings[0][1]"), returns the
 * value with its type known, and throws InputError saying what was needed and what came.
 * Method: common practice (a schema's type, length and range rules, written out as functions).
 * Cost: constant per field, linear in a list's length.
 * Example: int(3, 'rev', 1) -> 3; int(0, 'rev', 1) throws "rev: needs a whole number from 1 to ...".
 */
import { InputError } from '../errors.ts';
import { describe } from '../study/study.ts';
import { isIsoDateTime } from './iso-date-time.ts';

/** Longest text accepted in any field (a note of a few pages); longer means a damaged file. */
export const MAX_TEXT = 100_000;
/** Most planned runs in one study. */
export const MAX_PLANNED_RUNS = 100_000;

/** A JSON object as read. */
export type Obj = Record<string, unknown>;

export function fail(path: string, what: string, got: unknown): never {
  throw new InputError(`${path}: needs ${what}, got ${describe(got)}`);
}

export function obj(v: unknown, path: string): Obj {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) fail(path, 'an object', v);
  return v as Obj;
}

export function list(v: unknown, path: string, max = Number.MAX_SAFE_INTEGER): unknown[] {
  if (!Array.isArray(v)) fail(path, 'a list', v);
  if (v.length > max) throw new InputError(`${path}: holds at most ${max} items, got ${v.length}`);
  return v;
}

export function text(v: unknown, path: string, opts: { nonEmpty?: boolean } = {}): string {
  if (typeof v !== 'string') fail(path, 'text', v);
  if (v.length > MAX_TEXT) throw new InputError(`${path}: text of at most ${MAX_TEXT} characters, got ${v.length}`);
  if (opts.nonEmpty && v.trim() === '') fail(path, 'non-empty text', v);
  return v;
}

export function id(v: unknown, path: string): string {
  if (typeof v !== 'string' || !/^[A-Za-z0-9_-]{1,100}$/.test(v)) fail(path, 'an id (1 to 100 letters, digits, - or _)', v);
  return v;
}

/** Longest date and time text accepted (an ISO 8601 time with fractions and offset is under 40). */
export const MAX_TIME = 40;

/** The words every time field's message uses for what it needs. */
export const TIME_NEEDED = 'a date and time (ISO 8601, e.g. 2026-03-01T14:05 or 2026-03-01T14:05:00Z)';

export function time(v: unknown, path: string): string {
  if (typeof v !== 'string' || v.length > MAX_TIME || !isIsoDateTime(v)) fail(path, TIME_NEEDED, v);
  return v;
}

/**
 * Largest revision counter a file may bring: a run's counter starts at 1 and each save adds one
 * to the highest its device knows, so a real history stays far below a billion; a larger one
 * was made by hand, and one near the largest exact whole number (2^53 - 1) would leave no room
 * for the saves after it. Saves on a device may go on above it (MAX_SAVED_REV). Common practice.
 */
export const MAX_IMPORTED_REV = 1_000_000_000;

/** Largest counter a save on this device may write: one below 2^53 - 1, so a counter and the
 * next one are always exact (ECMA-262 Number.MAX_SAFE_INTEGER). */
export const MAX_SAVED_REV = Number.MAX_SAFE_INTEGER - 1;

/** A revision counter from a file (at most MAX_IMPORTED_REV) or from a save (MAX_SAVED_REV), with the reason in the message. */
export function revisionCounter(v: unknown, path: string, max: number = MAX_IMPORTED_REV): number {
  if (typeof v === 'number' && Number.isSafeInteger(v) && v > max && max === MAX_IMPORTED_REV) {
    throw new InputError(`${path}: needs a revision counter from 1 to ${max}, got ${v}; each save adds one to a run's counter, so no real history comes near this, and a counter this large would leave no room for the saves after it. The file was altered or damaged`);
  }
  return int(v, path, 1, max);
}

export function finite(v: unknown, path: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) fail(path, 'a finite number', v);
  return v;
}

export function int(v: unknown, path: string, min: number, max = Number.MAX_SAFE_INTEGER): number {
  if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < min || v > max) fail(path, `a whole number from ${min} to ${max}`, v);
  return v;
}

export function bool(v: unknown, path: string): boolean {
  if (typeof v !== 'boolean') fail(path, 'true or false', v);
  return v;
}

export function oneOf<T extends string>(v: unknown, path: string, options: readonly T[]): T {
  if (typeof v !== 'string' || !options.includes(v as T)) fail(path, options.map((o) => `"${o}"`).join(' or '), v);
  return v as T;
}

export function texts(v: unknown, path: string): string[] {
  return list(v, path, 100_000).map((s, i) => text(s, `${path}[${i}]`));
}

/** Refuses members that the format does not have (a typo or a newer writer would otherwise be silently dropped). */
export function only(o: Obj, path: string, allowed: readonly string[]): void {
  for (const k of Object.keys(o)) if (!allowed.includes(k)) throw new InputError(`${path}: has no field "${k.slice(0, 40)}" in this format`);
}
