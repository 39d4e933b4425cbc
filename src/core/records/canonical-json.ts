/**
 * Canonical JSON text of a value, the form the backup checksum is taken over: no whitespace,
 * object members sorted by their names compared as UTF-16 code units, strings and numbers written
 * as ECMAScript's JSON.stringify writes them. This is the JSON Canonicalization Scheme of RFC 8785
 * for the values a backup holds (finite numbers, text, true/false/null, lists and objects).
 * The store takes it for comparing revisions' values and deriving ids; the backup for its checksum.
 * The walk is iterative (an explicit stack, never recursion), so no nesting can overflow the
 * call stack, and it refuses nesting deeper than MAX_NESTING (which also stops a cycle).
 * Cost: linear in the size of the value, plus sorting each object's member names; memory: the
 * stack of open lists and objects.
 * Throws InputError for a value JSON cannot hold (a non-finite number, a function, a bigint) and
 * for nesting deeper than MAX_NESTING, naming where.
 * Example: canonicalJson({b: 1, a: [true, null]}) -> '{"a":[true,null],"b":1}'.
 */
import { InputError } from '../errors.ts';

/**
 * Deepest nesting of lists and objects in any record or file: a backup needs 7 (file, payload,
 * studies, a study, its design, its aliases, one alias), so 64 leaves ample room and refuses a
 * file made to exhaust a parser or a walker (common practice: bounded depth for untrusted JSON).
 */
export const MAX_NESTING = 64;

type Frame =
  | { readonly list: readonly unknown[]; i: number; readonly keys: null; readonly obj: null }
  | { readonly list: null; i: number; readonly keys: readonly string[]; readonly obj: Record<string, unknown> };

const byCodeUnits = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** Where the walk is, for a message: $ then [i] and .name for every open list and object. */
function where(stack: readonly Frame[]): string {
  let s = '$';
  for (const f of stack) {
    const k = f.i - 1;
    if (f.list) s += `[${k}]`;
    else if (k >= 0) s += /^[A-Za-z_][A-Za-z0-9_]*$/.test(f.keys[k]) ? `.${f.keys[k]}` : `[${JSON.stringify(f.keys[k].slice(0, 40))}]`;
  }
  return s;
}

/**
 * Writes the canonical JSON of a value as pieces in order (their concatenation is the text), so
 * a checksum can be taken without the whole text in memory. Members whose value is undefined are
 * left out and undefined in a list is written null, as JSON.stringify does.
 * Example: writeCanonicalJson([1, {}], (p) => out.push(p)) makes out.join('') '[1,{}]'.
 */
export function writeCanonicalJson(value: unknown, emit: (piece: string) => void): void {
  const stack: Frame[] = [];
  const open = (v: unknown): void => {
    if (v === null) return emit('null');
    switch (typeof v) {
      case 'boolean':
        return emit(v ? 'true' : 'false');
      case 'string':
        return emit(JSON.stringify(v));
      case 'number':
        if (!Number.isFinite(v)) throw new InputError(`${where(stack)}: JSON has no place for the number ${v}; it needs a finite number`);
        return emit(JSON.stringify(v));
      case 'object': {
        if (stack.length >= MAX_NESTING) {
          throw new InputError(`${where(stack)}: lists and objects nested deeper than ${MAX_NESTING} levels; a Trialbook record needs fewer than 10`);
        }
        if (Array.isArray(v)) {
          emit('[');
          stack.push({ list: v, i: 0, keys: null, obj: null });
        } else {
          const obj = v as Record<string, unknown>;
          const keys = Object.keys(obj).filter((k) => obj[k] !== undefined).sort(byCodeUnits);
          emit('{');
          stack.push({ list: null, i: 0, keys, obj });
        }
        return;
      }
      default:
        throw new InputError(`${where(stack)}: JSON has no place for a ${typeof v}`);
    }
  };
  open(value);
  while (stack.length > 0) {
    const top = stack[stack.length - 1];
    if (top.list) {
      if (top.i === top.list.length) {
        stack.pop();
        emit(']');
        continue;
      }
      if (top.i > 0) emit(',');
      const x = top.list[top.i++];
      open(x === undefined ? null : x);
    } else {
      if (top.i === top.keys.length) {
        stack.pop();
        emit('}');
        continue;
      }
      if (top.i > 0) emit(',');
      const k = top.keys[top.i++];
      emit(JSON.stringify(k) + ':');
      open(top.obj[k]);
    }
  }
}

/** Canonical JSON text; members whose value is undefined are left out, as JSON.stringify does. */
export function canonicalJson(value: unknown): string {
  const pieces: string[] = [];
  writeCanonicalJson(value, (p) => pieces.push(p));
  return pieces.join('');
}
