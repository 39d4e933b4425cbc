/**
 * A 2^(4-1) half fraction with generator D = ABC (defining relation I = ABCD, so AB = CD,
 * AC = BD, AD = BC; Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2),
 * factor D categorical, with center runs at both levels of D. The responses are INVENTED (a
 * demo roughness), not a published data set.
 */
import { defineFactors } from '../../src/core/factor/factor.ts';
import type { ResponseData } from '../../src/core/study/response-data.ts';

export const laserFactors = defineFactors([
  { kind: 'numeric', name: 'Power', low: 70, high: 90 },
  { kind: 'numeric', name: 'Speed', low: 2, high: 4 },
  { kind: 'numeric', name: 'Focus', low: 0, high: 2 },
  { kind: 'categorical', name: 'Gas', levels: ['air', 'N2'] },
]);

/** The eight corners of the fraction in standard order, D = ABC. */
export function halfFractionCorners(): number[][] {
  const out: number[][] = [];
  for (let i = 0; i < 8; i++) {
    const a = i & 1 ? 1 : -1;
    const b = i & 2 ? 1 : -1;
    const c = i & 4 ? 1 : -1;
    out.push([a, b, c, a * b * c]);
  }
  return out;
}

/** Invented roughness values: the 8 corners, then centers at air, N2, N2. */
export const laserY = [1.76, 3.36, 1.33, 1.33, 3.25, 2.92, 0.75, 2.91, 1.39, 2.32, 2.37];

/** The planned runs; `offTarget` replaces run 2's coded Power (+1 planned) with the given value. */
export function laserData(offTarget?: number): ResponseData {
  const planned = [...halfFractionCorners(), [0, 0, 0, -1], [0, 0, 0, 1], [0, 0, 0, 1]];
  const coded = planned.map((r, i) => (i === 1 && offTarget !== undefined ? [offTarget, ...r.slice(1)] : [...r]));
  return { factors: laserFactors, response: 'Roughness', coded, y: laserY, blocks: null, labels: coded.map((_, i) => String(i + 1)), messages: [] };
}
