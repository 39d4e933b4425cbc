/**
 * Regular two-level fractional factorials 2^(k-p): the basic factors (those no generator defines)
 * run through a full factorial in standard (Yates) order, and each generated factor takes the
 * product of its basic factors' columns, times its sign (Box, Hunter and Hunter, Statistics for
 * Experimenters, 2nd ed., section 6.2; Montgomery, Design and Analysis of Experiments, 8th ed.,
 * section 8.3). With no generators this is the full factorial.
 */
import { InputError } from '../errors.ts';
import { termFactors } from '../model/term.ts';
import { fullFactorial } from './full-factorial.ts';
import type { Generator } from './generators.ts';

/** A factorial point: its standard-order index (from 1) and coded settings in declared order. */
export interface FactorialPoint {
  readonly standardOrder: number;
  readonly coded: readonly number[];
}

/**
 * Indices of the basic factors (those no generator defines), in declared order.
 * Throws InputError when a generator names a factor outside 0..k-1.
 * Example: basicFactors(5, [E=ABCD]) -> [0, 1, 2, 3].
 */
export function basicFactors(k: number, generators: readonly Generator[]): number[] {
  for (const g of generators) {
    if (g.factor < 0 || g.factor >= k) throw new InputError(`Generator "${g.text}" names factor ${g.factor + 1}, but the design has ${k} factors`);
  }
  const generated = new Set(generators.map((g) => g.factor));
  return Array.from({ length: k }, (_, i) => i).filter((i) => !generated.has(i));
}

/**
 * The 2^(k-p) factorial points in standard order of the basic factors. Cost: k*2^(k-p).
 * Throws InputError when fewer than one basic factor is left, or (from fullFactorial) when the
 * basic factors alone exceed the run limit.
 * Example: fractionalFactorial(3, [C=AB]) -> coded rows [-1,-1,1], [1,-1,-1], [-1,1,-1], [1,1,1].
 */
export function fractionalFactorial(k: number, generators: readonly Generator[]): FactorialPoint[] {
  if (!Number.isInteger(k) || k < 1) throw new InputError(`A design needs a whole number of factors, 1 or more, got ${k}`);
  const basic = basicFactors(k, generators);
  if (basic.length < 1) throw new InputError(`${generators.length} generators for ${k} factors leave no basic factor to build runs from`);
  return fullFactorial(basic.length).map((row, i) => {
    const coded = new Array<number>(k).fill(0);
    basic.forEach((f, j) => (coded[f] = row[j]));
    for (const g of generators) {
      let v = g.product.sign as number;
      for (const f of termFactors(g.product.mask)) v *= coded[f];
      coded[g.factor] = v;
    }
    return { standardOrder: i + 1, coded };
  });
}

/**
 * Reads a fraction "1/2", "1/4", ... (1/2^p) and returns p. Throws InputError unless the text is
 * 1/N with N a power of two from 2 to 2048.
 * Example: parseFraction('1/8') -> 3.
 */
export function parseFraction(text: string): number {
  const m = /^\s*1\s*\/\s*(\d+)\s*$/.exec(text);
  const n = m ? Number(m[1]) : Number.NaN;
  const p = Math.log2(n);
  if (!m || !Number.isInteger(p) || p < 1 || p > 11) {
    throw new InputError(`A fraction is written 1/2, 1/4, 1/8, ... (one over a power of two), got "${text}"`);
  }
  return p;
}
