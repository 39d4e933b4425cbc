import { describe, expect, it } from 'vitest';
import * as tolerances from '../../src/core/tolerance.ts';
import { sourceFiles, withoutComments } from '../helpers/source-files.ts';

/** Literals like 1e-9 (exponent -5 or below): in this core they are tolerances or switch points. */
const SMALL_LITERAL = /(?<![\w.])\d+(?:\.\d+)?e-(\d+)\b/g;
/** A line of a coefficient table: nothing but numbers, signs and commas. */
const TABLE_LINE = /^[\s\d.eE+\-,]+$/;
/** A constant named like a tolerance, given a number in place. */
const TOLERANCE_CONST = /\bconst\s+\w*(?:TOLERANCE|_EPS|EPSILON)\w*\s*=\s*[-+]?\d/;

function strayTolerances(path: string, text: string): string[] {
  const out: string[] = [];
  withoutComments(text)
    .split('\n')
    .forEach((line, i) => {
      if (TOLERANCE_CONST.test(line)) out.push(`${path}:${i + 1}: ${line.trim()}`);
      if (TABLE_LINE.test(line)) return;
      for (const m of line.matchAll(SMALL_LITERAL)) if (Number(m[1]) >= 5) out.push(`${path}:${i + 1}: ${line.trim()}`);
    });
  return out;
}

describe('tolerances are named once, in src/core/tolerance.ts', () => {
  it('the scan finds a stray tolerance when there is one (a check of the check)', () => {
    expect(strayTolerances('x.ts', 'if (Math.abs(d) < 1e-9) return;')).toHaveLength(1);
    expect(strayTolerances('x.ts', 'const MY_TOLERANCE = 0.1;')).toHaveLength(1);
    expect(strayTolerances('x.ts', '// 1e-12 in a comment\nconst a = [\n  1.5e-7, -2.5e-9,\n];')).toHaveLength(0);
    expect(strayTolerances('x.ts', 'if (p < 1e-4) return;')).toHaveLength(0); // a display threshold, not a tolerance
  });

  it('no file of src/core outside tolerance.ts holds a tolerance-like literal or defines a tolerance', () => {
    const stray = sourceFiles('src/core')
      .filter((f) => f.path !== 'src/core/tolerance.ts')
      .flatMap((f) => strayTolerances(f.path, f.text));
    expect(stray).toEqual([]);
  });

  it('every tolerance is a positive finite number with a doc comment that says where it comes from', () => {
    const text = sourceFiles('src/core').find((f) => f.path === 'src/core/tolerance.ts')!.text;
    const names = Object.keys(tolerances);
    expect(names.length).toBeGreaterThan(10);
    for (const [name, value] of Object.entries(tolerances)) {
      expect(typeof value === 'number' && value > 0 && Number.isFinite(value), name).toBe(true);
      const at = text.indexOf(`export const ${name} =`);
      const comment = text.slice(text.lastIndexOf('/**', at), at);
      expect(comment, name).toMatch(/\*\/\s*$/);
      expect(comment, name).toMatch(/common practice|our own choice|Numerical Recipes|epsilon|R's lm|rounding|underflows/i);
    }
  });
});
