/** Shared test helpers: factors with given names, and model columns of effects over runs. */
import { defineFactors, type Factor } from '../../../src/core/factor/factor.ts';
import { termValue } from '../../../src/core/model/term.ts';

/** k numeric factors named F1..Fk (letters A, B, C, ... skipping I). */
export function numericFactors(k: number): Factor[] {
  return defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `F${i + 1}`, low: 0, high: 1 })));
}

/** Column of effect `mask` over coded rows. */
export function column(mask: number, rows: readonly (readonly number[])[]): number[] {
  return rows.map((r) => termValue(mask, r));
}

export function dot(a: readonly number[], b: readonly number[]): number {
  return a.reduce((s, x, i) => s + x * b[i], 0);
}

/** Mask of letters over the standard letters A..P skipping I. */
export function mask(letters: string): number {
  const L = 'ABCDEFGHJKLMNOPQRSTUVWXYZ';
  return [...letters].reduce((m, ch) => m | (1 << L.indexOf(ch)), 0);
}
