import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { backTransform, parseTransform, transformResponses, transformValue } from '../../../src/core/fit/response-transform.ts';

describe('response transforms (Box and Cox 1964 power family)', () => {
  it('tokens: none, log, sqrt, inverse and power=L; anything else is refused with what was needed', () => {
    expect(parseTransform(undefined)).toEqual({ token: 'none', lambda: 1 });
    expect(parseTransform('log').lambda).toBe(0);
    expect(parseTransform('sqrt').lambda).toBe(0.5);
    expect(parseTransform('inverse').lambda).toBe(-1);
    expect(parseTransform('power=0.3')).toEqual({ token: 'power=0.3', lambda: 0.3 });
    expect(parseTransform('power=0')).toEqual({ token: 'log', lambda: 0 });
    expect(() => parseTransform('cube')).toThrow('A transform needs none, log, sqrt, inverse or power=L with L from -3 to 3, got "cube"');
    expect(() => parseTransform('power=5')).toThrow(/from -3 to 3/);
  });
  it('(y^lambda - 1) / lambda: sqrt of 9 gives 2 (3 - 1) / 1 = 4, log of e gives 1, inverse of 2 gives 0.5 (arithmetic)', () => {
    expect(transformValue(9, 0.5)).toBeCloseTo(4, 12);
    expect(transformValue(Math.E, 0)).toBeCloseTo(1, 12);
    expect(transformValue(2, -1)).toBeCloseTo(0.5, 12);
  });
  it('property: back-transform inverts the transform and keeps order (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-2, max: 1e2, noNaN: true }), fc.double({ min: 1e-2, max: 1e2, noNaN: true }), fc.constantFrom(0, 0.5, -1, 0.3, 2, -2.5), (a, b, l) => {
        expect(Math.abs(backTransform(transformValue(a, l), l)! / a - 1)).toBeLessThan(1e-8);
        if (b > a * (1 + 1e-6)) expect(transformValue(a, l)).toBeLessThan(transformValue(b, l));
      }),
    );
  });
  it('beyond the domain: a positive power clips to the bound (0), a negative one has no value (null)', () => {
    expect(backTransform(-3, 0.5)).toBe(0); // 1 + 0.5 (-3) < 0
    expect(backTransform(1.5, -1)).toBeNull(); // 1 - 1.5 < 0
  });
  it('degenerate input: a value at or below the bound is refused for log, naming it', () => {
    expect(() => transformResponses([1, 0, 2], 0, 0, 'Roughness')).toThrow('The log transform needs every Roughness above 0, got 0');
    expect(() => transformResponses([1, 0.5], 0.5, 1, 'Roughness')).toThrow('The sqrt transform needs every Roughness at or above its lower bound 1, got 0.5');
    expect(transformResponses([1, 2], 1, 0, 'R')).toEqual([1, 2]);
  });
});
