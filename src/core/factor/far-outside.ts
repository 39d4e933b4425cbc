/**
 * Actual settings far outside the planned range: a numeric setting whose coded value lies
 * beyond FAR_OUTSIDE_CODED (1600 typed where the plan runs 160 to 200 is coded +71). Such a
 * setting is most often a typing slip (a digit too many), and a fit through it extrapolates
 * every effect; the run form asks before saving it, and the sheet and the analysis name it.
 * Method: code the setting, (x - center) / half range (log scale: of log x), and compare |coded|.
 * Cost O(k) per run.
 * Example: farOutsideSettings(factors, [1600, 3]) -> [{ factor: 0, value: 1600, coded: 71 }]
 *   for Temperature 160..200.
 */
import type { Factor } from './factor.ts';
import { toCoded } from './coding.ts';

/**
 * How far outside the plan (in coded units) a setting is "far outside". Our own choice: beyond
 * the axial distance of a rotatable central composite design for up to 6 factors
 * (alpha = 2^(6/4) = 2.83; Montgomery, Design and Analysis of Experiments, 8th ed., section
 * 11.4.2, section from memory), so no planned point is flagged, while a slipped digit (coded 71) always is.
 */
export const FAR_OUTSIDE_CODED = 3;

/** One setting far outside its factor's planned range. */
export interface FarOutside {
  /** Index of the factor in the study's declared order. */
  readonly factor: number;
  readonly value: number;
  readonly coded: number;
}

/** The numeric settings of one run that are far outside their planned ranges (categorical factors and unreadable settings are skipped). */
export function farOutsideSettings(factors: readonly Factor[], actual: readonly (number | string)[]): FarOutside[] {
  const out: FarOutside[] = [];
  factors.forEach((f, i) => {
    const v = actual[i];
    if (f.kind !== 'numeric' || typeof v !== 'number' || !Number.isFinite(v)) return;
    let coded: number;
    try {
      coded = toCoded(f, v);
    } catch {
      return; // a setting the coding refuses (log scale, not positive) is reported by the coding itself
    }
    if (Math.abs(coded) > FAR_OUTSIDE_CODED) out.push({ factor: i, value: v, coded });
  });
  return out;
}
