/**
 * Coded units. For a numeric factor x = (u - M) / D with M = (high+low)/2 and D = (high-low)/2,
 * so low -> -1, high -> +1 and the center -> 0 (Montgomery, Design and Analysis of Experiments,
 * 8th ed., section 6.7 "coded variables"). On a log scale the same formula applies to log(u), so
 * the center is the geometric mean sqrt(low*high) (common practice for settings such as
 * concentration or speed that act multiplicatively). A categorical factor's first level is -1,
 * its second +1; it has no center.
 * Example: toCoded({kind:'numeric',low:160,high:200,...}, 190) -> 0.5.
 */
import { InputError } from '../errors.ts';
import type { Factor, NumericFactor } from './factor.ts';

function transform(f: NumericFactor, u: number): number {
  return f.scale === 'log' ? Math.log(u) : u;
}

/**
 * Center M and half-range D of a numeric factor on its coding scale. Each end is halved before
 * the sum or difference: halving is exact in binary64 (above the subnormal range), so M and D are
 * the same numbers as (hi + lo) / 2 and (hi - lo) / 2, but stay finite for settings near the
 * largest double (1e308 and -1e308 would overflow the sum and give a NaN setting).
 */
export function centerAndHalfRange(f: NumericFactor): { center: number; halfRange: number } {
  const lo = transform(f, f.low);
  const hi = transform(f, f.high);
  return { center: hi / 2 + lo / 2, halfRange: hi / 2 - lo / 2 };
}

/**
 * Real setting -> coded value. A numeric factor takes a finite number (positive on a log
 * scale); a categorical factor takes one of its two level labels (case-insensitive).
 * Throws InputError otherwise, naming the factor and what came.
 */
export function toCoded(f: Factor, value: number | string): number {
  if (f.kind === 'categorical') {
    const label = String(value).trim().toLowerCase();
    if (label === f.levels[0].toLowerCase()) return -1;
    if (label === f.levels[1].toLowerCase()) return 1;
    throw new InputError(`${f.name} has the levels "${f.levels[0]}" and "${f.levels[1]}", got "${value}"`);
  }
  const u = typeof value === 'number' ? value : parseNumber(value);
  if (!Number.isFinite(u)) throw new InputError(`${f.name} needs a number, got "${value}"`);
  if (f.scale === 'log' && u <= 0) throw new InputError(`${f.name} is coded on a log scale and needs a positive setting, got ${u}`);
  const { center, halfRange } = centerAndHalfRange(f);
  return (transform(f, u) - center) / halfRange;
}

/**
 * Coded value -> real setting. A categorical factor accepts only -1 or +1 (it has no settings in
 * between) and returns its label.
 */
export function toReal(f: Factor, coded: number): number | string {
  if (!Number.isFinite(coded)) throw new InputError(`${f.name} needs a finite coded value, got ${coded}`);
  if (f.kind === 'categorical') {
    if (coded === -1) return f.levels[0];
    if (coded === 1) return f.levels[1];
    throw new InputError(`${f.name} is categorical: only -1 ("${f.levels[0]}") or +1 ("${f.levels[1]}"), got ${coded}`);
  }
  const { center, halfRange } = centerAndHalfRange(f);
  const t = center + coded * halfRange;
  return f.scale === 'log' ? Math.exp(t) : t;
}

/** Strict number parsing: the whole text must be a number ("12,5" and "12abc" are refused). */
export function parseNumber(text: string): number {
  const s = text.trim();
  if (s === '' || !/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s)) return Number.NaN;
  return Number(s);
}
