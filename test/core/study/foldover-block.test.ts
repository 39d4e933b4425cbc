/**
 * A foldover planned as an added block. The studies are INVENTED (factors X1..Xk); the designs
 * and what a foldover frees are published: the 2^(7-4) resolution III with D = AB, E = AC,
 * F = BC, G = ABC and its mirror image (Montgomery, Design and Analysis of Experiments, 8th ed.,
 * section 8.6.1: the combined runs are resolution IV; folding on one factor frees that factor
 * and its two-factor interactions; from memory), and the 2^(3-1) with I = ABC, whose mirror image
 * is the other half (Box, Hunter and Hunter, Statistics for Experimenters, 2nd ed., section 6.8,
 * from memory; checkable by hand). The relation after a fold is checked against a brute-force
 * search of the combined runs, not against the word algebra the code uses.
 */
import { describe, expect, it } from 'vitest';
import { buildDesign, type DesignSpec } from '../../../src/core/design/build-design.ts';
import { addedRuns, withAddedBlocks, type AddedBlock } from '../../../src/core/study/added-block.ts';
import { planFoldoverBlock, relationOfRuns } from '../../../src/core/study/foldover-block.ts';
import { studyPlan, type StudyRecord } from '../../../src/core/study/study.ts';

function numeric(k: number) {
  return Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 10 * i, high: 10 * i + 5 }));
}

function study(spec: Omit<DesignSpec, 'factors'>, k: number): StudyRecord {
  const d = buildDesign({ factors: numeric(k), seed: 11, ...spec });
  return { ...studyPlan('Invented fold trial', 'INVENTED', [{ name: 'Y', goal: 'maximize', lowerBound: null }], d), id: 's-f', device: 'dev', createdAt: '2026-01-01T00:00:00.000Z' };
}

function withBlock(s: StudyRecord, plan: ReturnType<typeof planFoldoverBlock>): StudyRecord {
  const block: AddedBlock = { id: 'b-f', studyId: s.id, device: 'dev', createdAt: '2026-01-02T00:00:00.000Z', purpose: 'foldover', note: 'invented', runs: addedRuns(s, plan.runs) };
  return withAddedBlocks(s, [block]);
}

/** Every non-empty factor set whose column product is the same on all given points, as letters with the sign (brute force). */
function bruteRelation(points: readonly (readonly number[])[], letters: string): string[] {
  const out: string[] = [];
  const k = letters.length;
  for (let m = 1; m < 2 ** k; m++) {
    const signs = new Set(points.map((p) => p.reduce((acc, x, i) => ((m >> i) & 1 ? acc * x : acc), 1)));
    if (signs.size === 1) out.push(`${[...signs][0] < 0 ? '-' : ''}${[...letters].filter((_, i) => (m >> i) & 1).join('')}`);
  }
  return out.sort();
}

const R3 = { generators: ['D=AB', 'E=AC', 'F=BC', 'G=ABC'] };

describe('planFoldoverBlock: the mirror image of a resolution III fraction', () => {
  const s = study(R3, 7);
  const p = planFoldoverBlock(s, 'all', 5);
  it('switches every sign of each of the 8 runs, numbered 9 to 16 in standard order', () => {
    const own = s.design.runs.map((r) => r.coded.join(','));
    expect(p.runs).toHaveLength(8);
    for (const r of p.runs) expect(own).toContain(r.coded.map((x) => -x).join(','));
    expect(p.runs.map((r) => r.standardOrder).sort((a, b) => a! - b!)).toEqual([9, 10, 11, 12, 13, 14, 15, 16]);
    expect(p.runs.every((r) => r.kind === 'factorial')).toBe(true);
  });
  it('goes from resolution III to IV (Montgomery 8th ed., 8.6.1), and the relation after is what the 16 runs hold', () => {
    expect(p.resolutionBefore).toBe(3);
    expect(p.resolutionAfter).toBe(4);
    const all = [...s.design.runs.map((r) => r.coded), ...p.runs.map((r) => r.coded)];
    expect([...p.relationAfter].sort()).toEqual(bruteRelation(all, 'ABCDEFG'));
    expect([...p.relationBefore].sort()).toEqual(bruteRelation(s.design.runs.map((r) => r.coded), 'ABCDEFG'));
  });
  it('frees every main effect of two-factor interactions', () => {
    for (const c of p.aliasesAfter.filter((c) => c[0].length === 1)) expect(c.slice(1).every((w) => w.replace('-', '').length >= 3)).toBe(true);
    expect(p.note.separated.map(([u, v]) => `${u}-${v}`)).toContain('A-BD');
  });
  it('the same seed gives the same run order; another seed may not', () => {
    expect(planFoldoverBlock(s, 'all', 5).runs).toEqual(p.runs);
    expect([...planFoldoverBlock(s, 'all', 6).runs].map((r) => r.standardOrder).sort()).toEqual([...p.runs].map((r) => r.standardOrder).sort());
  });
});

describe('planFoldoverBlock: folding on one factor', () => {
  it('frees D and every two-factor interaction with D (Montgomery 8th ed., 8.6.1)', () => {
    const p = planFoldoverBlock(study(R3, 7), 3, 1);
    const withD = p.aliasesAfter.filter((c) => c[0].includes('D') && c[0].length <= 2);
    expect(withD.length).toBe(7); // D and its six two-factor interactions, each the first of its own chain
    for (const c of withD) expect(c.slice(1).every((w) => w.replace('-', '').length >= 3)).toBe(true);
  });
  it('a second foldover reads the relation left by the first from the runs', () => {
    const s = study(R3, 7);
    const once = withBlock(s, planFoldoverBlock(s, 'all', 2));
    expect(relationOfRuns(once).every((w) => [...Array(7).keys()].filter((i) => (w.mask >> i) & 1).length % 2 === 0)).toBe(true);
    expect(() => planFoldoverBlock(once, 'all', 2)).toThrow(/even number of letters.*Fold on one factor instead/);
    const twice = planFoldoverBlock(once, 0, 2);
    expect(twice.runs).toHaveLength(16);
    expect(twice.resolutionBefore).toBe(4);
    const all = [...once.design.runs.map((r) => r.coded), ...twice.runs.map((r) => r.coded)];
    expect([...twice.relationAfter].sort()).toEqual(bruteRelation(all, 'ABCDEFG'));
  });
});

describe('planFoldoverBlock: the half fraction of three factors', () => {
  it('its mirror image is the other half, a full 2^3 (Box, Hunter and Hunter 2nd ed., 6.8)', () => {
    const s = study({ generators: ['C=AB'], centerRuns: 2 }, 3);
    const p = planFoldoverBlock(s, 'all', 3);
    expect(p.resolutionAfter).toBeNull();
    expect(p.relationAfter).toEqual([]);
    expect(p.note.separated).toEqual([['A', 'BC'], ['B', 'AC'], ['C', 'AB']]);
    expect(p.summary.totalRuns).toBe(10); // 4 + 2 center + 4 folded
    expect(p.summary.blockWords.length).toBe(1); // ABC, confounded with the two halves
  });
  it('a replicated fraction is folded once', () => {
    expect(planFoldoverBlock(study({ generators: ['C=AB'], replicates: 2 }, 3), 'all', 3).runs).toHaveLength(4);
  });
});

describe('planFoldoverBlock: refusals that say what to do (degenerate input)', () => {
  it('a full factorial, a screening design, an even-word mirror, a factor in no word, a bad factor or seed', () => {
    expect(() => planFoldoverBlock(study({}, 3), 'all')).toThrow(/already separates every effect/);
    expect(() => planFoldoverBlock(study({ plackettBurman: 12 }, 5), 'all')).toThrow(/screening design/);
    expect(() => planFoldoverBlock(study({ fraction: '1/2' }, 4), 'all')).toThrow(/Fold on one factor instead/);
    expect(() => planFoldoverBlock(study({ generators: ['E=ABC'] }, 5), 3)).toThrow(/contains D \(X4\).*A, B, C, E/);
    expect(() => planFoldoverBlock(study({ fraction: '1/2' }, 4), 7)).toThrow(/one of the 4 factors/);
    expect(() => planFoldoverBlock(study({ generators: ['C=AB'] }, 3), 'all', -1)).toThrow(/seed must be a whole number/);
  });
  it('a plan with no factorial runs', () => {
    const s = study({ generators: ['C=AB'], centerRuns: 1 }, 3);
    const bare = { ...s, design: { ...s.design, runs: s.design.runs.filter((r) => r.kind === 'center') } };
    expect(() => planFoldoverBlock(bare, 'all')).toThrow(/no factorial runs/);
  });
});
