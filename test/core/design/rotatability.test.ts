import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { isRotatable } from '../../../src/core/design/rotatability.ts';

/** A central composite design in coded units: 2^k corners, 2k axial runs at +-alpha, n0 centers. */
function ccd(k: number, alpha: number, n0: number): number[][] {
  const pts: number[][] = [];
  for (let c = 0; c < 2 ** k; c++) pts.push(Array.from({ length: k }, (_, j) => ((c >> j) & 1 ? 1 : -1)));
  for (let i = 0; i < k; i++) for (const s of [-alpha, alpha]) pts.push(Array.from({ length: k }, (_, j) => (j === i ? s : 0)));
  for (let i = 0; i < n0; i++) pts.push(new Array<number>(k).fill(0));
  return pts;
}

describe('isRotatable: the moment conditions of Box and Hunter (1957)', () => {
  it('a central composite design is rotatable at alpha = F^(1/4) and not elsewhere', () => {
    // Montgomery, Design and Analysis of Experiments, 8th ed., section 11.4.1: alpha = F^(1/4)
    // makes the CCD rotatable (1.414 for k = 2, 1.682 for k = 3); the face-centred one is not.
    expect(isRotatable(ccd(2, Math.SQRT2, 5))).toBe(true);
    expect(isRotatable(ccd(3, 8 ** 0.25, 6))).toBe(true);
    expect(isRotatable(ccd(2, 1, 5))).toBe(false);
    expect(isRotatable(ccd(3, 1.5, 6))).toBe(false);
  });

  it('center runs do not change rotatability (they scale every moment alike)', () => {
    // Box and Hunter 1957 (from memory): rotatability depends on the moments' ratios only.
    expect(isRotatable(ccd(2, Math.SQRT2, 0))).toBe(true);
    expect(isRotatable(ccd(2, Math.SQRT2, 12))).toBe(true);
  });

  it('a 2^2 factorial alone is not rotatable for the second-order model: [iiii] = [iijj] = 1, not 3 [iijj]', () => {
    // Worked by hand from the moment conditions in the file comment.
    expect(isRotatable(ccd(2, 0, 0).slice(0, 4))).toBe(false);
  });

  it('an odd moment that is not 0 breaks it: a shifted design', () => {
    expect(isRotatable(ccd(2, Math.SQRT2, 3).map((p) => [p[0] + 0.1, p[1]]))).toBe(false);
  });

  it('degenerate input: no runs, no factors, ragged rows', () => {
    expect(() => isRotatable([])).toThrow(InputError);
    expect(() => isRotatable([[]])).toThrow('at least one factor');
    expect(() => isRotatable([[1, 1], [1]])).toThrow('Every run needs 2 settings');
  });
});
