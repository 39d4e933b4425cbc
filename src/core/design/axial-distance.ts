/**
 * The axial distance alpha of a central composite design, in coded units: how far along each
 * axis its 2k axial runs go.
 * - 'face': alpha = 1, the axial runs on the faces of the cube, for machines whose settings
 *   cannot go past the tested range (Montgomery, Design and Analysis of Experiments, 8th ed.,
 *   section 11.4.1, the face-centred design);
 * - 'rotatable': alpha = F^(1/4) for F factorial runs (Box and Hunter 1957, Annals of
 *   Mathematical Statistics 28, 195-241; Montgomery 8th ed., Eq. 11.22, from memory);
 * - 'orthogonal': the factorial part and the axial part as two blocks, with
 *   alpha = sqrt(k (1 + ns0 / ns) / (1 + nc0 / nc)), nc factorial runs with nc0 center runs in
 *   their block and ns = 2k axial runs with ns0 center runs in theirs (Box and Hunter 1957);
 * - a number above 0.
 */
import { InputError } from '../errors.ts';

export type AxialDistance = 'face' | 'rotatable' | 'orthogonal' | number;

export interface AxialBlocks {
  /** Factorial runs (the factorial block, or all factorial blocks together). */
  readonly nc: number;
  /** Center runs in the factorial block(s). */
  readonly nc0: number;
  /** Axial runs, 2k. */
  readonly ns: number;
  /** Center runs in the axial block. */
  readonly ns0: number;
}

/**
 * Reads an axial distance as typed: face, rotatable, orthogonal or a positive number.
 * Throws InputError otherwise. Example: parseAxialDistance('1.5') -> 1.5; parseAxialDistance('Face') -> 'face'.
 */
export function parseAxialDistance(text: string): AxialDistance {
  const t = text.trim().toLowerCase();
  if (t === 'face' || t === 'rotatable' || t === 'orthogonal') return t;
  const v = /^[+]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/.test(t) ? Number(t) : Number.NaN;
  if (!(v > 0) || !Number.isFinite(v)) throw new InputError(`The axial distance is face, rotatable, orthogonal or a number above 0, got "${text}"`);
  return v;
}

/**
 * alpha for a choice (see the file comment), for k factors and F factorial runs; `blocks` is
 * needed for 'orthogonal' and refused without it. Cost O(1).
 * Throws InputError for k below 1, F below 1, a number that is not above 0, or 'orthogonal'
 * without two blocks.
 * Example: axialDistance('rotatable', 2, 4) -> 1.4142; axialDistance('orthogonal', 2, 4,
 * { nc: 4, nc0: 3, ns: 4, ns0: 3 }) -> 1.4142 (Montgomery 8th ed., section 11.4.3).
 */
export function axialDistance(choice: AxialDistance, k: number, factorialRuns: number, blocks?: AxialBlocks): number {
  if (!Number.isInteger(k) || k < 1) throw new InputError(`An axial distance needs a whole number of factors, 1 or more, got ${k}`);
  if (!Number.isInteger(factorialRuns) || factorialRuns < 1) throw new InputError(`An axial distance needs factorial runs, got ${factorialRuns}`);
  if (typeof choice === 'number') {
    if (!(Number.isFinite(choice) && choice > 0)) throw new InputError(`An axial distance must be a number above 0, got ${choice}`);
    return choice;
  }
  if (choice === 'face') return 1;
  if (choice === 'rotatable') return factorialRuns ** 0.25;
  if (choice !== 'orthogonal') throw new InputError(`The axial distance is face, rotatable, orthogonal or a number, got "${String(choice)}"`);
  if (!blocks) {
    throw new InputError('An orthogonally blocked axial distance needs two blocks (the factorial block and the axial block, each with its own center runs); ask for 2 blocks');
  }
  const { nc, nc0, ns, ns0 } = blocks;
  for (const [name, v, min] of [['nc', nc, 1], ['nc0', nc0, 0], ['ns', ns, 1], ['ns0', ns0, 0]] as const) {
    if (!Number.isInteger(v) || v < min) throw new InputError(`Orthogonal blocking needs ${name} a whole number, ${min} or more, got ${v}`);
  }
  return Math.sqrt((k * (1 + ns0 / ns)) / (1 + nc0 / nc));
}
