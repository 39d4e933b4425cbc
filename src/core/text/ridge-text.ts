/**
 * The words around the ridge table on the phone (ridge analysis: Hoerl 1959, Chemical Engineering
 * Progress 55, 69-78; Draper 1963, Technometrics 5, 469-479, from memory): what the rows are,
 * and why the table is shown when the stationary point is no answer by itself.
 */
import type { SurfaceNature } from '../optimum/canonical-analysis.ts';

/**
 * The table's caption.
 * Example: ridgeCaption('max', 'Yield') -> 'Highest Yield at each distance from the center'.
 */
export function ridgeCaption(sense: 'max' | 'min', response: string): string {
  return `${sense === 'max' ? 'Highest' : 'Lowest'} ${response} at each distance from the center`;
}

/**
 * Why the ridge table is shown: a saddle, a ridge, a stationary point outside the tested box, or
 * none at all; null when the stationary point is inside and a maximum or minimum.
 * Example: ridgeReason('saddle', true) -> 'The surface is a saddle, so its stationary point is not
 * the best setting. The table follows the best fitted value outward from the center, one ring
 * (radius in coded units) at a time.'
 */
export function ridgeReason(nature: SurfaceNature, inside: boolean | null): string | null {
  const rest = 'The table follows the best fitted value outward from the center, one ring (radius in coded units) at a time.';
  if (nature === 'saddle') return `The surface is a saddle, so its stationary point is not the best setting. ${rest}`;
  if (inside === null) return `The surface has no single stationary point. ${rest}`;
  if (!inside) return `The stationary point lies outside the tested box. ${rest}`;
  if (nature === 'ridge') return `The surface is a ridge: many settings give nearly the same result. ${rest}`;
  return null;
}

/** Under the table when some rows lie beyond radius 1 (past the factorial box on some factor). */
export const RIDGE_BEYOND_ONE = 'Rows beyond radius 1 (marked *) lie past the factorial range on some factor, within the axial runs: the standing caution applies there most of all.';
