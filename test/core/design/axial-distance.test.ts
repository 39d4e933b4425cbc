import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { axialDistance, parseAxialDistance } from '../../../src/core/design/axial-distance.ts';

describe('axialDistance: face, rotatable alpha = F^(1/4), orthogonal blocking (Box and Hunter 1957)', () => {
  it('rotatable alpha against the handbook table', () => {
    // NIST/SEMATECH e-Handbook, section 5.3.3.6.1, table "Determining alpha for rotatability"
    // (from memory): 2^2 -> 1.414, 2^3 -> 1.682, 2^4 -> 2.000, 2^(5-1) -> 2.000, 2^5 -> 2.378.
    expect(axialDistance('rotatable', 2, 4)).toBeCloseTo(1.414, 3);
    expect(axialDistance('rotatable', 3, 8)).toBeCloseTo(1.682, 3);
    expect(axialDistance('rotatable', 4, 16)).toBeCloseTo(2.0, 3);
    expect(axialDistance('rotatable', 5, 16)).toBeCloseTo(2.0, 3);
    expect(axialDistance('rotatable', 5, 32)).toBeCloseTo(2.378, 3);
  });

  it('face-centred is 1 and a number is kept', () => {
    // Montgomery, Design and Analysis of Experiments, 8th ed., section 11.4.1: the face-centred design has alpha = 1.
    expect(axialDistance('face', 3, 8)).toBe(1);
    expect(axialDistance(1.25, 3, 8)).toBe(1.25);
  });

  it('orthogonal blocking: sqrt(k (1 + ns0/ns) / (1 + nc0/nc))', () => {
    // Montgomery 8th ed., section 11.4.3: k = 2, 4 factorial runs and 3 centers, 4 axial runs and 3 centers -> 1.414.
    expect(axialDistance('orthogonal', 2, 4, { nc: 4, nc0: 3, ns: 4, ns0: 3 })).toBeCloseTo(Math.SQRT2, 12);
    // Worked by hand: k = 3, nc = 8, nc0 = 2, ns = 6, ns0 = 2 -> sqrt(3 (4/3) / (5/4)) = sqrt(3.2) = 1.78885.
    expect(axialDistance('orthogonal', 3, 8, { nc: 8, nc0: 2, ns: 6, ns0: 2 })).toBeCloseTo(1.78885, 5);
  });

  it('degenerate input is refused with what was needed and what came', () => {
    expect(() => axialDistance('rotatable', 0, 4)).toThrow(InputError);
    expect(() => axialDistance('rotatable', 2, 0)).toThrow('needs factorial runs, got 0');
    expect(() => axialDistance(0, 2, 4)).toThrow('must be a number above 0, got 0');
    expect(() => axialDistance('orthogonal', 2, 4)).toThrow('needs two blocks');
    expect(() => axialDistance('orthogonal', 2, 4, { nc: 4, nc0: -1, ns: 4, ns0: 3 })).toThrow('nc0 a whole number, 0 or more, got -1');
  });
});

describe('parseAxialDistance', () => {
  it('reads the words in any case and positive numbers', () => {
    expect(parseAxialDistance(' Face ')).toBe('face');
    expect(parseAxialDistance('ROTATABLE')).toBe('rotatable');
    expect(parseAxialDistance('orthogonal')).toBe('orthogonal');
    expect(parseAxialDistance('1.5')).toBe(1.5);
    expect(parseAxialDistance('.5')).toBe(0.5);
  });
  it('refuses anything else, quoting what came', () => {
    for (const bad of ['', '0', '-1', 'spherical', '1,5', 'Infinity', '1e400']) {
      expect(() => parseAxialDistance(bad)).toThrow(InputError);
    }
    expect(() => parseAxialDistance('spherical')).toThrow('got "spherical"');
  });
});
