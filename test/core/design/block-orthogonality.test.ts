import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { blocksOrthogonal } from '../../../src/core/design/block-orthogonality.ts';
import { fullQuadraticTerms } from '../../../src/core/design/second-order-terms.ts';

/** Block 1: the 2^2 factorial with 3 centers; block 2: the axial runs at +-alpha with 3 centers. */
function twoBlocks(alpha: number): { points: number[][]; blocks: number[] } {
  const f = [[-1, -1], [1, -1], [-1, 1], [1, 1], [0, 0], [0, 0], [0, 0]];
  const a = [[-alpha, 0], [alpha, 0], [0, -alpha], [0, alpha], [0, 0], [0, 0], [0, 0]];
  return { points: [...f, ...a], blocks: [...f.map(() => 1), ...a.map(() => 2)] };
}

describe('blocksOrthogonal: each block carries its share of every model column (Box and Hunter 1957)', () => {
  const quadratic = fullQuadraticTerms(2);

  it('the two-block central composite design of Montgomery 8th ed., section 11.4.3 is orthogonally blocked at alpha = sqrt2', () => {
    // Montgomery, Design and Analysis of Experiments, 8th ed., section 11.4.3 (from memory):
    // 7 runs a block; by hand, block 1's share of sum x1^2 is 4 / (4 + 2 alpha^2) = 1/2 only at alpha = sqrt2.
    const { points, blocks } = twoBlocks(Math.SQRT2);
    expect(blocksOrthogonal(points, blocks, quadratic)).toBe(true);
  });

  it('the same blocks with the axial runs elsewhere are not', () => {
    const { points, blocks } = twoBlocks(1.682);
    expect(blocksOrthogonal(points, blocks, quadratic)).toBe(false);
    // For the first-order model only (x1, x2, x1x2) every block sums to 0, so any alpha is orthogonal (by hand).
    expect(blocksOrthogonal(points, blocks, quadratic.slice(0, 3))).toBe(true);
  });

  it('a single block is always orthogonal', () => {
    const { points } = twoBlocks(1.5);
    expect(blocksOrthogonal(points, points.map(() => 1), quadratic)).toBe(true);
  });

  it('degenerate input: no runs, or a block list of the wrong length', () => {
    expect(() => blocksOrthogonal([], [], quadratic)).toThrow(InputError);
    expect(() => blocksOrthogonal([[0, 0], [1, 1]], [1], quadratic)).toThrow('one block per run (2), got 1');
  });
});
