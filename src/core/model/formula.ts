/**
 * Model terms from Wilkinson-Rogers notation (Wilkinson and Rogers 1973, Applied Statistics 22,
 * 392-399): `A + B + A:B`, `A*B*C` (all products), `(A+B+C)^2` (up to two-factor
 * interactions), and `-` to drop a term (`A*B*C - A:B:C`). Factors may be named by name or by
 * letter. The intercept is always in the model and is not written.
 * Squares: a power of a single factor's name means that power of the factor, so `A^2` and
 * `Temperature^2` are its square (only a numeric factor has one), while a power of a
 * parenthesised sum keeps its crossing meaning (`(A+B+C)^2`). `quadratic` stands for the full
 * second-order model (see quadraticTerms). Cubes, squares inside interactions (`A^2:B`) and
 * squares of categorical factors are refused with a message.
 * Example: parseTerms('A*B', factors) -> [0b01, 0b10, 0b11] (A, B, A:B).
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { compareTerms, isProduct, squareTerm, termLetters, termMask, termOrder, type Term } from './term.ts';

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
function normalize(set: Set<Term>): Term[] {
  return [...set].filter((t) => t !== 0).sort(compareTerms);
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

  // The product of two terms: the union of their factors (A:A is A, as in Wilkinson-Rogers).
  // A square only multiplies itself: anything else would be a cube or a square inside an interaction.
  const times = (x: Term, y: Term): Term => {
    if (isProduct(x) && isProduct(y)) return x | y;
    if (x === y) return x;
    const both = `${termLetters(x, factors)}:${termLetters(y, factors)}`;
    return fail(
      (termMask(x) & termMask(y)) !== 0
        ? `${both} would hold a factor three times or more; cubes and higher powers are not supported`
        : `${both} would put a square inside an interaction, which is not supported; write the interaction and the square as separate terms`,
    );
  };
  const cross = (a: Set<Term>, b: Set<Term>): Set<Term> => {
    const out = new Set<Term>([...a, ...b]);
    for (const x of a) for (const y of b) out.add(times(x, y));
    return out;
  };
  const isKeyword = (name: string): boolean =>
    name.toLowerCase() === 'quadratic' && !factors.some((f) => f.name.toLowerCase() === 'quadratic' || f.letter.toLowerCase() === 'quadratic');

  // expr   := sum
  // sum    := prod (('+'|'-') prod)*
  // prod   := colon ('*' colon)*
  // colon  := power (':' power)*
  // power  := atom ('^' num)?      (name ^ 2: the square of one factor; ( sum ) ^ n: crossing)
  // atom   := 'quadratic' | name | '(' sum ')'
  function atom(): Set<Term> {
    const t = peek();
    if (!t) return fail('a factor is missing');
    if (t.kind === 'name') {
      i++;
      if (isKeyword(t.text)) return new Set(quadraticTerms(factors));
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
    const first = peek();
    const bare = first !== undefined && first.kind === 'name' && !isKeyword(first.text);
    const base = atom();
    if (peek()?.text === '^') {
      i++;
      const n = peek();
      if (!n || n.kind !== 'num') return fail('"^" needs a whole number');
      const order = Number(n.text);
      if (order < 1) fail('"^" needs an order of 1 or more');
      if (bare) {
        // A power of one name: the power of that factor (or of a run of letters, which holds several).
        const [t] = base;
        if (order === 1) {
          i++;
          return base;
        }
        if (termOrder(t) > 1) fail(`${first.text}^${order} would put a square inside an interaction, which is not supported; a power of a sum such as (A+B)^2 gives the crossing`);
        if (order > 2) fail(`${first.text}^${order}: cubes and higher powers of a factor are not supported, only squares`);
        const f = factors[31 - Math.clz32(t)];
        if (f.kind !== 'numeric') {
          fail(`${f.name} is categorical ("${f.levels[0]}" or "${f.levels[1]}"): its square is the same at both levels, so only a numeric factor can have a square term`);
        }
        i++;
        return new Set([squareTerm(31 - Math.clz32(t), factors)]);
      }
      i++;
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
      for (const x of acc) for (const y of rhs) out.add(times(x, y));
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
  const terms = normalize(result);
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

/**
 * The full second-order (quadratic) model: main effects, two-factor interactions and the square
 * of every numeric factor, in model order; y = b0 + sum b_i x_i + sum_{i<j} b_ij x_i x_j +
 * sum b_ii x_i^2 (Montgomery, Design and Analysis of Experiments, 8th ed., section 11.1, Eq.
 * 11.2, from memory). A categorical factor has no square (two levels only). Cost O(k^2).
 * Throws InputError for no factors.
 * Example: with numeric A, B and categorical C: A, B, C, AB, AC, BC, A^2, B^2.
 */
export function quadraticTerms(factors: readonly Factor[]): Term[] {
  if (factors.length === 0) throw new InputError('A quadratic model needs at least one factor, got none');
  const out = termsUpToOrder(factors.length, Math.min(2, factors.length));
  factors.forEach((f, i) => f.kind === 'numeric' && out.push(squareTerm(i, factors)));
  return out.sort(compareTerms);
}
