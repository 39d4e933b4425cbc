import { describe, expect, it } from 'vitest';
import { RUN_KINDS, RUN_KIND_NAMES, isRunKind } from '../../../src/core/design/design.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';

describe('run kinds', () => {
  it('are one open list, each with the words a screen shows', () => {
    expect([...RUN_KINDS]).toEqual(['factorial', 'center', 'axial', 'path', 'confirmation']);
    expect(Object.keys(RUN_KIND_NAMES).sort()).toEqual([...RUN_KINDS].sort());
    expect(RUN_KINDS.every(isRunKind)).toBe(true);
    for (const v of ['star', '', 'Center', null, undefined, 1]) expect(isRunKind(v)).toBe(false);
  });

  it('are shown in one set of words, distinct from the file tokens where they differ', () => {
    // The words every screen and report uses (the project's own wording, common practice terms).
    expect(RUN_KIND_NAMES).toEqual({
      factorial: 'factorial point',
      center: 'center point',
      axial: 'axial point',
      path: 'path run',
      confirmation: 'confirmation run',
    });
  });
});

describe('block of origin', () => {
  it('equals the block for every run of a plan made in one go', () => {
    // 2^4 in 4 blocks with 2 center runs per block, 2 replicates (an INVENTED plan).
    const d = buildDesign({
      factors: ['A', 'B', 'C', 'D'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 1 })),
      blocks: 4,
      centerRuns: 2,
      replicates: 2,
      seed: 3,
    });
    expect(new Set(d.runs.map((r) => r.block)).size).toBe(8);
    expect(d.runs.every((r) => r.originBlock === r.block)).toBe(true);
  });
});
