/**
 * A figure that is zero up to round-off, written as 0: |x| within CONSTANT_TOLERANCE of the
 * response's own scale (its largest magnitude), the same relative rule as the constant-response
 * check (validate-response.ts). Effects computed by two paths (Yates' algorithm and least
 * squares) then print the same where both are zero.
 * Cost O(1). Example: zeroIfRoundoff(1.2e-15, 10.9) -> 0; zeroIfRoundoff(0.2, 10.9) -> 0.2.
 */
import { CONSTANT_TOLERANCE } from '../tolerance.ts';

export function zeroIfRoundoff(x: number, scale: number): number {
  return Number.isFinite(x) && Math.abs(x) <= CONSTANT_TOLERANCE * Math.abs(scale) ? 0 : x;
}
