/**
 * The value at a field path as firstDifference writes it ("readings[0][1]", "title",
 * "factors[2].name", 'meta["a b"]'), so a screen can show what each side holds where two records
 * differ. Method: common practice (a walk of the path's steps). Cost: linear in the path.
 * Throws nothing: a path that does not parse, or names no value, gives { found: false }.
 * Example: valueAtPath({ readings: [[70.4, 69.5]] }, 'readings[0][1]') -> { found: true, value: 69.5 }.
 */

export type PathValue = { readonly found: true; readonly value: unknown } | { readonly found: false };

/** The steps of a path: member names and list places; null when the text is not a path. */
function steps(path: string): (string | number)[] | null {
  const out: (string | number)[] = [];
  let i = 0;
  while (i < path.length) {
    if (path[i] === '[') {
      const end = path[i + 1] === '"' ? closingQuote(path, i + 1) : path.indexOf(']', i);
      if (end < 0) return null;
      if (path[i + 1] === '"') {
        if (path[end + 1] !== ']') return null;
        try {
          out.push(JSON.parse(path.slice(i + 1, end + 1)) as string);
        } catch {
          return null;
        }
        i = end + 2;
      } else {
        const n = path.slice(i + 1, end);
        if (!/^\d+$/.test(n)) return null;
        out.push(Number(n));
        i = end + 1;
      }
    } else {
      if (out.length > 0) {
        if (path[i] !== '.') return null;
        i++;
      }
      const m = /^[A-Za-z_][A-Za-z0-9_]*/.exec(path.slice(i));
      if (!m) return null;
      out.push(m[0]);
      i += m[0].length;
    }
  }
  return out;
}

/** The place of the quote that closes the JSON string opening at `open`, or -1. */
function closingQuote(text: string, open: number): number {
  for (let j = open + 1; j < text.length; j++) {
    if (text[j] === '\\') j++;
    else if (text[j] === '"') return j;
  }
  return -1;
}

export function valueAtPath(record: unknown, path: string): PathValue {
  const list = steps(path);
  if (list === null) return { found: false };
  let at: unknown = record;
  for (const s of list) {
    if (typeof s === 'number') {
      if (!Array.isArray(at) || s >= at.length) return { found: false };
      at = at[s];
    } else {
      if (typeof at !== 'object' || at === null || Array.isArray(at) || !Object.prototype.hasOwnProperty.call(at, s)) return { found: false };
      at = (at as Record<string, unknown>)[s];
    }
  }
  return at === undefined ? { found: false } : { found: true, value: at };
}
