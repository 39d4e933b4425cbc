/**
 * Model terms from Wilkinson-Rogers notation (Wilkinson and Rogers 1973, Applied Statistics 22,
 * 392-399): `A + B + A:B`, `A*B*C` (all products), `(A+B+C)^2` (up to two-factor
 * interactions), and `-` to drop a term (`A*B*C - A:B:C`). Factors may be named by name or by
 * letter. The intercept is always in the model and is not written.
 * Example: parseTerms('A*B', factors) -> [0b01, 0b10, 0b11] (A, B, A:B).
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { compareTerms, termOrder, type Term } from './term.ts';

type Tok = { kind: 'name' | 'num' | 'op'; text: string; pos: number };

function tokenize(text: string): Tok[] {
  const out: Tok[] = [];
  const re = /\s*(?:([A-Za-z_][\w.]*|"[^"]*")|(\d+)|([-+*:^()]))/y;
  let pos = 0;
  while (pos < text.length) {
    if (/^\s*$/.test(text.slice(pos))) break;
    re.lastIndex = pos;
    const m = re.exec(text);
    if (!m) throw new InputError(`Model terms: cannot read "${text.slice(pos).trim()}" (position ${pos + 1})`);
    const at = m.index + m[0].length - (m[1] ?? m[2] ?? m[3]).length;
    if (m[1] !== undefined) out.push({ kind: 'name', text: m[1].replace(/^"|"$/g, ''), pos: at });
    else if (m[2] !== undefined) out.push({ kind: 'num', text: m[2], pos: at });
    else out.push({ kind: 'op', text: m[3], pos: at });
    pos = re.lastIndex;
  }
  return out;
}

/** Sorted, de-duplicated terms. */
function normalise(set: Set<Term>): Term[] {
  return [...set].filter((t) => t !== 0).sort(compareTerms);
}

function cross(a: Set<Term>, b: Set<Term>): Set<Term> {
  const out = new Set<Term>([...a, ...b]);
  for (const x of a) for (const y of b) out.add(x | y);
  return out;
}

/**
 * Parses a Wilkinson-Rogers model formula into terms in model order.
 * Throws InputError for an unknown factor name, a dangling operator or unbalanced parentheses.
 */
export function parseTerms(text: string, factors: readonly Factor[]): Term[] {
  const toks = tokenize(text);
  let i = 0;
  const peek = () => toks[i];
  const fail = (what: string): never => {
    const t = toks[i];
    throw new InputError(`Model terms "${text}": ${what}${t ? ` at "${t.text}" (position ${t.pos + 1})` : ' at the end'}`);
  };

  const lookup = (name: string): Term => {
    const key = name.toLowerCase();
    let idx = factors.findIndex((f) => f.name.toLowerCase() === key);
    if (idx < 0) idx = factors.findIndex((f) => f.letter.toLowerCase() === key);
    if (idx < 0) {
      // A run of letters such as "ABC" means the interaction of those factors.
      if (/^[A-Za-z]+$/.test(name) && name.length > 1) {
        let mask = 0;
        for (const ch of name) {
          const j = factors.findIndex((f) => f.letter === ch.toUpperCase());
          if (j < 0) return fail(`unknown factor "${name}" (factors: ${factors.map((f) => `${f.letter}=${f.name}`).join(', ')})`);
          mask |= 1 << j;
        }
        return mask;
      }
      return fail(`unknown factor "${name}" (factors: ${factors.map((f) => `${f.letter}=${f.name}`).join(', ')})`);
    }
    return 1 << idx;
  };

  // expr   := sum
  // sum    := prod (('+'|'-') prod)*
  // prod   := colon ('*' colon)*
  // colon  := power (':' power)*
  // power  := atom ('^' num)?
  // atom   := name | '(' sum ')'
  function atom(): Set<Term> {
    const t = peek();
    if (!t) return fail('a factor is missing');
    if (t.kind === 'name') {
      i++;
      return new Set([lookup(t.text)]);
    }
    if (t.kind === 'op' && t.text === '(') {
      i++;
      const s = sum();
      if (peek()?.text !== ')') fail('a closing ")" is missing');
      i++;
      return s;
    }
    return fail('a factor is expected');
  }
  function power(): Set<Term> {
    const base = atom();
    if (peek()?.text === '^') {
      i++;
      const n = peek();
      if (!n || n.kind !== 'num') return fail('"^" needs a whole number');
      i++;
      const order = Number(n.text);
      if (order < 1) fail('"^" needs an order of 1 or more');
      let acc = new Set(base);
      for (let k = 1; k < order; k++) acc = cross(acc, base);
      return new Set([...acc].filter((t) => termOrder(t) <= order));
    }
    return base;
  }
  function colon(): Set<Term> {
    let acc = power();
    while (peek()?.text === ':') {
      i++;
      const rhs = power();
      const out = new Set<Term>();
      for (const x of acc) for (const y of rhs) out.add(x | y);
      acc = out;
    }
    return acc;
  }
  function prod(): Set<Term> {
    let acc = colon();
    while (peek()?.text === '*') {
      i++;
      acc = cross(acc, colon());
    }
    return acc;
  }
  function sum(): Set<Term> {
    const acc = prod();
    while (peek() && (peek().text === '+' || peek().text === '-')) {
      const op = peek().text;
      i++;
      const rhs = prod();
      for (const t of rhs) op === '+' ? acc.add(t) : acc.delete(t);
    }
    return acc;
  }

  if (toks.length === 0) throw new InputError('Model terms: the formula is empty');
  const result = sum();
  if (i < toks.length) fail('unexpected text');
  const terms = normalise(result);
  if (terms.length === 0) throw new InputError(`Model terms "${text}": no terms are left`);
  return terms;
}

/**
 * All terms up to a maximum order over k factors, in model order.
 * Example: termsUpToOrder(3, 2) -> A, B, C, AB, AC, BC as masks [1, 2, 4, 3, 5, 6].
 */
export function termsUpToOrder(k: number, order: number): Term[] {
  if (!Number.isInteger(order) || order < 1) throw new InputError(`The model order must be a whole number of 1 or more, got ${order}`);
  const out: Term[] = [];
  for (let t = 1; t < 1 << k; t++) if (termOrder(t) <= order) out.push(t);
  return out.sort(compareTerms);
}

/** The default model: main effects plus two-factor interactions (common practice for screening). */
export function defaultTerms(k: number): Term[] {
  return termsUpToOrder(k, Math.min(2, k));
}
