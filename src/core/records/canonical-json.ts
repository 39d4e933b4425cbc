/**
 * Canonical JSON text of a value, the form the backup checksum is taken over: no whitespace,
 * object members sorted by their names compared as UTF-16 code units, strings and numbers written
 * as ECMAScript's JSON.stringify writes them. This is the JSON Canonicalization Scheme of RFC 8785
 * for the values a backup holds (finite numbers, text, true/false/null, lists and objects).
 * The store takes it for comparing revisions' values and deriving ids; the backup for its checksum.
 * Cost: linear in the size of the value, plus sorting each object's member names.
 * Throws InputError for a value JSON cannot hold (a non-finite number, a function, a bigint).
 * Example: canonicalJson({b: 1, a: [true, null]}) -> '{"a":[true,null],"b":1}'.
 */
import { InputError } from '../errors.ts';

/** Canonical JSON text; members whose value is undefined are left out, as JSON.stringify does. */
export function canonicalJson(value: unknown): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'boolean':
      return value ? 'true' : 'false';
    case 'string':
      return JSON.stringify(value);
    case 'number':
      if (!Number.isFinite(value)) throw new InputError(`JSON has no place for the number ${value}`);
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) return '[' + value.map((v) => (v === undefined ? 'null' : canonicalJson(v))).join(',') + ']';
      const obj = value as Record<string, unknown>;
      const keys = Object.keys(obj)
        .filter((k) => obj[k] !== undefined)
        .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
      return '{' + keys.map((k) => JSON.stringify(k) + ':' + canonicalJson(obj[k])).join(',') + '}';
    }
    default:
      throw new InputError(`JSON has no place for a ${typeof value}`);
  }
}
