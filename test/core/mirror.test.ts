import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { root, sourceFiles, withoutComments } from '../helpers/source-files.ts';

/** Every module of the core with code has its unit test at the mirrored path (house style, habit 3). */
const FOLDER = 'src/core';
/**
 * The few exceptions, each with its reason. Modules with types only (no exported function,
 * constant or class) need none and are not listed.
 */
const EXCEPTIONS: Record<string, string> = {
};

const hasCode = (text: string) => /\bexport\s+(?:function|const|class)\b/.test(withoutComments(text));

describe('tests mirror the sources', () => {
  it('the check sees code and type-only modules apart (a check of the check)', () => {
    expect(hasCode('export interface A { x: number }')).toBe(false);
    expect(hasCode('/** export function a() */\nexport type B = 1;')).toBe(false);
    expect(hasCode('export function a() {}')).toBe(true);
  });

  it('every module of src/core with code has test/core/<path>/<name>.test.ts', () => {
    const missing = sourceFiles(FOLDER)
      .filter((f) => hasCode(f.text) && !(f.path in EXCEPTIONS))
      .map((f) => `test/${f.path.slice(4).replace(/\.tsx?$/, '.test.ts')}`)
      .filter((t) => !existsSync(join(root, t)));
    expect(missing).toEqual([]);
  });

  it('every exception names a module that exists, has code and still has no test of its own', () => {
    for (const [path, reason] of Object.entries(EXCEPTIONS)) {
      expect(reason.length, path).toBeGreaterThan(0);
      const file = sourceFiles(FOLDER).find((f) => f.path === path);
      expect(file, path).toBeDefined();
      expect(hasCode(file!.text), path).toBe(true);
      expect(existsSync(join(root, `test/${path.slice(4).replace(/\.ts$/, '.test.ts')}`)), `${path} has a test now: drop the exception`).toBe(false);
    }
  });
});
