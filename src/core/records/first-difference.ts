/**
 * Where two records first differ, as a field path ("readings[0][1]", "title"), so a message can
 * name the field rather than say only that two records differ. Members are visited in the
 * canonical order (names sorted as UTF-16 code units), lists place by place; a member present on
 * one side only is a difference at that member. Iterative, and bounded by MAX_NESTING.
 * Method: common practice (a parallel walk of two JSON values). Cost: linear in the smaller value.
 * Throws nothing. Example: firstDifference({ a: 1, b: [1, 2] }, { a: 1, b: [1, 3] }) -> 'b[1]'.
 */
import { MAX_NESTING } from './canonical-json.ts';

const LENGTH = Symbol('a list longer on one side');
const isObj = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const join = (path: string, key: string | number) =>
  typeof key === 'number' ? `${path}[${key}]` : /^[A-Za-z_][A-Za-z0-9_]*$/.test(key) ? (path ? `${path}.${key}` : key) : `${path}[${JSON.stringify(key)}]`;

/** The path of the first difference, '' when the values differ as a whole, null when equal. */
export function firstDifference(a: unknown, b: unknown): string | null {
  const todo: [unknown, unknown, string, number][] = [[a, b, '', 0]];
  while (todo.length > 0) {
    const [x, y, path, depth] = todo.pop()!;
    if (x === LENGTH) return path;
    if (Array.isArray(x) && Array.isArray(y)) {
      if (depth >= MAX_NESTING) return path;
      const common = Math.min(x.length, y.length);
      // Pushed last to first, so the first place is visited first; a longer list differs at
      // its first extra place, after the common ones.
      if (x.length !== y.length) todo.push([LENGTH, null, join(path, common), depth]);
      for (let i = common - 1; i >= 0; i--) todo.push([x[i], y[i], join(path, i), depth + 1]);
    } else if (isObj(x) && isObj(y)) {
      if (depth >= MAX_NESTING) return path;
      const keys = [...new Set([...Object.keys(x), ...Object.keys(y)])].filter((k) => x[k] !== undefined || y[k] !== undefined).sort((p, q) => (p < q ? -1 : p > q ? 1 : 0));
      for (let i = keys.length - 1; i >= 0; i--) todo.push([x[keys[i]], y[keys[i]], join(path, keys[i]), depth + 1]);
    } else if (!Object.is(x, y) && !(x === 0 && y === 0)) return path;
  }
  return null;
}
