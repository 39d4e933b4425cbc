import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkNewFactor, checkNewFactorUnnamed, namingProblem, RESERVED_NAME_CHARACTERS } from '../../../src/core/factor/new-factor.ts';
import { InputError } from '../../../src/core/errors.ts';

describe('namingProblem', () => {
  it('names each separator found and why the command line needs it', () => {
    const p = namingProblem('Temp, C', 'The factor name "Temp, C"');
    expect(p).toMatch(/^The factor name "Temp, C" contains a comma \(","\), which Trialbook keeps as a separator/);
    expect(p).toMatch(/--factors A,B/);
    expect(p).toMatch(/such as "Temp C"/);
    const both = namingProblem('A=B:1', 'x');
    expect(both).toMatch(/contains a colon \(":"\) and an equals sign \("="\)/);
  });
  it('refuses control characters by code point (ECMA-48 ESC is U+001B)', () => {
    expect(namingProblem('Gloss\u001b[2J', 'The name')).toMatch(/control character U\+001B/);
    expect(namingProblem('x\u202ey', 'The name')).toMatch(/U\+202E/);
  });
  it('accepts ordinary names, units and non-ASCII letters', () => {
    for (const ok of ['Temperature', 'Oven temperature', 'Pre-heat time', 'Öl (°C)', '温度', 'A.B_c', 'x+y']) expect(namingProblem(ok, ok)).toBeNull();
  });
  it('property: a text holds a reserved character exactly when it is refused for one', () => {
    const reserved = RESERVED_NAME_CHARACTERS.map((r) => r.char);
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom('a', 'B', ' ', '-', ',', ':', '=', '7'), maxLength: 12 }), (s) => {
        const p = namingProblem(s, 'n');
        expect(p !== null).toBe(reserved.some((c) => s.includes(c)));
      }),
    );
  });
});

describe('checkNewFactor', () => {
  it('refuses a low setting above the high one, naming both', () => {
    expect(() => checkNewFactor({ kind: 'numeric', name: 'Temperature', low: 200, high: 160 })).toThrow(InputError);
    expect(() => checkNewFactor({ kind: 'numeric', name: 'Temperature', low: 200, high: 160 })).toThrow(
      /Temperature: the low setting \(200\) is above the high setting \(160\); the low is coded -1/,
    );
    expect(() => checkNewFactor({ kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' })).not.toThrow();
  });
  it('refuses a range too narrow to code reliably, at every scale, and accepts one just wide enough', () => {
    // 1000 to 1000.0000001: half range 5e-8; round-off near 1000 is 2.2e-13 (Number.EPSILON * 1000), above 1e-9 * 5e-8.
    expect(() => checkNewFactor({ kind: 'numeric', name: 'Pressure', low: 1000, high: 1000.0000001 })).toThrow(/Pressure: the range 1000 to 1000.0000001 is too narrow to code reliably/);
    expect(() => checkNewFactor({ kind: 'numeric', name: 'Pressure', low: 1000, high: 1000.0000001 })).toThrow(/offset from a reference/);
    for (let e = -300; e <= 300; e += 50) {
      const s = 10 ** e;
      expect(() => checkNewFactor({ kind: 'numeric', name: 'X', low: 160 * s, high: 200 * s }), `1e${e}`).not.toThrow();
      expect(() => checkNewFactor({ kind: 'numeric', name: 'X', low: s, high: s * (1 + 1e-12) }), `1e${e}`).toThrow(/too narrow/);
    }
    // A range about 1e-6 of its size keeps coded settings to about 2.2e-16 / 5e-7 = 4.4e-10, within SETTING_TOLERANCE.
    expect(() => checkNewFactor({ kind: 'numeric', name: 'X', low: 1000, high: 1000.001 })).not.toThrow();
  });

  it('refuses a reserved character in a name or a level, a control character in a unit', () => {
    expect(() => checkNewFactor({ kind: 'numeric', name: 'A,B', low: 1, high: 2 })).toThrow(/The factor name "A,B" contains a comma/);
    expect(() => checkNewFactor({ kind: 'categorical', name: 'A', levels: ['B=1', '2'] })).toThrow(/The level "B=1" of A contains an equals sign/);
    expect(() => checkNewFactor({ kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss:fine'] })).toThrow(/The level "gloss:fine" of Powder contains a colon/);
    expect(() => checkNewFactor({ kind: 'numeric', name: 'T', low: 1, high: 2, unit: 'deg\u0007' })).toThrow(/The unit of T contains the control character U\+0007/);
  });
  it('degenerate input: an equal pair is left to defineFactors (nothing to say here)', () => {
    expect(() => checkNewFactor({ kind: 'numeric', name: 'T', low: 5, high: 5 })).not.toThrow();
  });
});

describe('checkNewFactorUnnamed', () => {
  it('the same rules, in messages that leave the name out for a caller that names the factor itself', () => {
    expect(() => checkNewFactorUnnamed({ kind: 'numeric', name: 'A,B', low: 1, high: 2 })).toThrow(/^its name "A,B" contains a comma/);
    expect(() => checkNewFactorUnnamed({ kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss:fine'] })).toThrow(/^its level "gloss:fine" contains a colon/);
    expect(() => checkNewFactorUnnamed({ kind: 'numeric', name: 'T', low: 2, high: 1 })).toThrow(/^the low setting \(2\) is above the high setting \(1\)/);
    expect(() => checkNewFactorUnnamed({ kind: 'numeric', name: 'T', low: 1, high: 2 })).not.toThrow();
  });
});
