/**
 * Lenth's method for unreplicated factorials (Lenth 1989, "Quick and easy analysis of
 * unreplicated factorials", Technometrics 31, 469-473):
 *   s0  = 1.5 * median |c_j|
 *   PSE = 1.5 * median { |c_j| : |c_j| < 2.5 s0 }        (pseudo standard error)
 *   ME  = t(0.975; d) * PSE                               (margin of error)
 *   SME = t(gamma; d) * PSE, gamma = (1 + 0.95^(1/m)) / 2 (simultaneous margin of error)
 * with d = m/3 degrees of freedom (not a whole number in general) over all m contrasts.
 * Cost O(m log m). Throws InputError for no contrasts or a non-finite one.
 * Example: lenth over m = 15 effects gives ME = 2.57 PSE and SME = 5.22 PSE (Lenth 1989, Table 1).
 */
import { InputError } from '../errors.ts';
import { tQuantile } from '../dist/student-t.ts';

export interface LenthResult {
  /** Number of contrasts m. */
  readonly m: number;
  /** Degrees of freedom d = m / 3. */
  readonly df: number;
  readonly pse: number;
  readonly me: number;
  readonly sme: number;
}

/** Fewer contrasts than this and Lenth's method has little power (Lenth 1989, section 4: m >= 7 recommended). */
export const LENTH_MIN_CONTRASTS = 7;

/** The median of the first n of the sorted values. */
function median(sorted: Float64Array, n: number): number {
  const h = n >> 1;
  return n % 2 ? sorted[h] : (sorted[h - 1] + sorted[h]) / 2;
}

export function lenth(effects: readonly number[]): LenthResult {
  const m = effects.length;
  if (m === 0) throw new InputError("Lenth's method needs at least one effect, got none");
  // A typed array sorts numbers by value without a comparison callback; the sizes are finite and
  // at least +0, so the order is that of (a, b) => a - b.
  const abs = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const e = effects[j];
    if (!Number.isFinite(e)) throw new InputError(`Lenth's method needs finite effects, got ${e}`);
    abs[j] = Math.abs(e);
  }
  abs.sort();
  const s0 = 1.5 * median(abs, m);
  // The sizes below 2.5 s0 are a leading run of the sorted ones.
  let kept = 0;
  while (kept < m && abs[kept] < 2.5 * s0) kept++;
  const pse = kept > 0 ? 1.5 * median(abs, kept) : s0;
  const df = m / 3;
  const [tMe, tSme] = quantiles(m);
  return { m, df, pse, me: tMe * pse, sme: tSme * pse };
}

/* One-entry memo: the two t quantiles depend on m only, and every analysis of a study asks for the same m. */
let memoM = -1;
let memoT: readonly [number, number] = [NaN, NaN];

/** t(0.975; m/3) and t(gamma; m/3), gamma = (1 + 0.95^(1/m)) / 2. */
function quantiles(m: number): readonly [number, number] {
  if (m !== memoM) {
    const df = m / 3;
    const gamma = (1 + Math.pow(0.95, 1 / m)) / 2;
    memoT = [tQuantile(0.975, df), tQuantile(gamma, df)];
    memoM = m;
  }
  return memoT;
}
