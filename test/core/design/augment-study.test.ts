import { describe, expect, it } from 'vitest';
import { augmentStudy } from '../../../src/core/design/augment-study.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { studyPlan, type LoggedRun, type StudyPlan } from '../../../src/core/study/study.ts';
import { plannedSetting } from '../../../src/core/design/planned-settings.ts';
import type { FactorSpec } from '../../../src/core/factor/factor.ts';

const numeric = (k: number): FactorSpec[] => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 10, high: 20 }));

/** Invented logged runs at the planned settings (values invented for the test). */
function logAll(plan: StudyPlan, skip: number[] = []): LoggedRun[] {
  return plan.design.runs
    .filter((r) => !skip.includes(r.run))
    .map((r) => ({
      id: `run-${r.run}`,
      revisionId: `rev-${r.run}`,
      revisions: 1,
      heads: [`rev-${r.run}`],
      studyId: 's1',
      plannedRun: r.run,
      rev: 1,
      device: 'dev',
      parents: [],
      restoredFrom: null,
      savedAt: '2026-01-01T00:00:00Z',
      actual: plan.factors.map((f, i) => plannedSetting(f, r.coded[i])),
      readings: [[50 + r.run]],
      loggedAt: null,
      operator: null,
      notes: '',
      excluded: false,
      reason: '',
    }));
}

const plan2 = studyPlan('Two factors', 'invented', [{ name: 'Y', goal: 'maximize' }], buildDesign({ factors: numeric(2), centerRuns: 3, seed: 4 }));

describe('augmentStudy', () => {
  it('adds block 2 with 4 axial runs at the orthogonal-blocking alpha and 3 centers; earlier runs unchanged (Montgomery 8th ed., section 11.4.3: alpha 1.414)', () => {
    const a = augmentStudy(plan2, logAll(plan2), { seed: 9 });
    expect(a.block).toBe(2);
    expect(a.alpha).toBeCloseTo(Math.SQRT2, 12); // sqrt(2 (1 + 3/4) / (1 + 3/4)), Box and Hunter 1957
    expect(a.added.map((r) => r.kind).sort()).toEqual(['axial', 'axial', 'axial', 'axial', 'center', 'center', 'center']);
    expect(a.added.map((r) => r.run)).toEqual([8, 9, 10, 11, 12, 13, 14]);
    expect(a.added.every((r) => r.block === 2 && r.originBlock === 2 && r.standardOrder === null)).toBe(true);
    expect(a.plan.design.runs.slice(0, 7)).toEqual(plan2.design.runs);
    expect(a.properties.blocksOrthogonal).toBe(true);
    expect(a.properties.rotatable).toBe(true);
    expect(a.properties.fullQuadratic).toBe(true);
    expect(a.notes.some((n) => /can estimate the full second-order model/.test(n))).toBe(true);
    expect(a.properties.warnings).toHaveLength(2);
  });

  it('says which earlier runs are not logged yet, and what a resolution IV fraction cannot estimate', () => {
    const a = augmentStudy(plan2, logAll(plan2, [2, 5]), { seed: 1 });
    expect(a.notes[0]).toMatch(/2 of them not logged yet: 2, 5\)/);
    // A logged but excluded run is logged: it is named apart from those not logged yet.
    const withExcluded = logAll(plan2, [2]).map((r) => (r.plannedRun === 5 ? { ...r, excluded: true, reason: 'invented: panel dropped' } : r));
    expect(augmentStudy(plan2, withExcluded, { seed: 1 }).notes[0]).toMatch(/\(1 of them not logged yet: 2; 1 of them excluded: 5\)/);
    const frac = studyPlan('Four factors', 'invented', [{ name: 'Y', goal: 'maximize' }], buildDesign({ factors: numeric(4), fraction: '1/2', centerRuns: 2, seed: 4 }));
    const b = augmentStudy(frac, logAll(frac), { seed: 1 });
    expect(b.properties.fullQuadratic).toBe(false);
    expect(b.notes.some((n) => /cannot estimate the full second-order model: its factorial part is resolution IV/.test(n))).toBe(true);
  });

  it('refuses what it cannot augment', () => {
    expect(() => augmentStudy(plan2, [])).toThrow(/no logged runs yet/);
    const once = augmentStudy(plan2, logAll(plan2), { seed: 1 });
    expect(() => augmentStudy(once.plan, logAll(plan2))).toThrow(/already has axial runs/);
    const bad = logAll(plan2).map((r) => ({ ...r, plannedRun: 99 }));
    expect(() => augmentStudy(plan2, bad)).toThrow(/planned run 99, which "Two factors" does not have/);
    const cat = studyPlan('Cat', 'invented', [{ name: 'Y', goal: 'maximize' }], buildDesign({ factors: [...numeric(1), { kind: 'categorical', name: 'Powder', levels: ['a', 'b'] }], seed: 1 }));
    expect(() => augmentStudy(cat, logAll(cat))).toThrow(/Powder is categorical/);
    expect(() => augmentStudy(plan2, logAll(plan2), { centerRuns: 1.5 })).toThrow(/got 1.5/);
  });
});
