/**
 * Whether a plan's runs can estimate the full second-order (quadratic) model: the question the
 * analysis screen asks before it offers that model.
 */
import type { Factor } from '../factor/factor.ts';
import { predictionVariance } from './prediction-variance.ts';

/**
 * True when every factor is numeric and the planned points give a full-rank model matrix for the
 * full quadratic model (intercept, main effects, two-factor interactions, squares), the test
 * predictionVariance makes (Myers, Montgomery and Anderson-Cook, Response Surface Methodology,
 * 3rd ed., section 7.1, from memory: a second-order design needs at least three levels of each
 * factor and enough distinct points). A two-level factorial with center runs is not enough: its
 * squares are all estimated together. Cost O(N p^2), p = 1 + 2k + k(k-1)/2.
 * Example: a 2-factor central composite design -> true; a 2^2 with 4 center runs -> false.
 */
export function supportsQuadratic(factors: readonly Factor[], points: readonly (readonly number[])[]): boolean {
  if (factors.length === 0 || points.length === 0 || factors.some((f) => f.kind !== 'numeric')) return false;
  return predictionVariance(points) !== null;
}
