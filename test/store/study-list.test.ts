import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { listRuns, openNewRun, saveRun } from '../../src/store/runs.ts';
import { addPlannedRuns, planOf } from '../../src/store/added-blocks.ts';
import { addedPlannedRuns, listStudies, loggedPlannedRuns } from '../../src/store/study-list.ts';
import { createStudy, listStudies as listStudiesFromStudies } from '../../src/store/studies.ts';
import { coatingPlan, freshStore } from './helpers.ts';

async function logRun(store: Awaited<ReturnType<typeof freshStore>>, studyId: string, plannedRun: number) {
  const state = await openNewRun(store, studyId, plannedRun);
  await saveRun(store, { ...state, studyId, values: parseRunForm(state.study, { ...state.form, readings: ['70', '90'] }) });
}

describe('the studies list reads', () => {
  it('lists no study and counts nothing on an empty device (degenerate input)', async () => {
    const store = await freshStore();
    expect(await listStudies(store)).toEqual([]);
    expect(await loggedPlannedRuns(store)).toEqual(new Map());
  });

  it('lists studies newest first, the same list studies.ts gives', async () => {
    let t = Date.parse('2024-05-02T08:00:00.000Z');
    const store = await freshStore({ now: () => new Date((t += 60_000)) });
    const first = await createStudy(store, coatingPlan('Invented demo: first trial'));
    const second = await createStudy(store, coatingPlan('Invented demo: second trial'));
    expect((await listStudies(store)).map((s) => s.id)).toEqual([second.id, first.id]);
    expect(await listStudiesFromStudies(store)).toEqual(await listStudies(store));
  });

  it('counts each study\'s planned runs with a logged run, a planned run logged twice once', async () => {
    const store = await freshStore();
    const a = await createStudy(store, coatingPlan('Invented demo: a'));
    const b = await createStudy(store, coatingPlan('Invented demo: b'));
    await logRun(store, a.id, 1);
    await logRun(store, a.id, 1);
    await logRun(store, a.id, 3);
    await logRun(store, b.id, 2);
    const counts = await loggedPlannedRuns(store);
    // The same numbers as counting each study's runs by planned run.
    for (const s of [a, b]) expect(counts.get(s.id)).toBe(new Set((await listRuns(store, s.id)).map((r) => r.plannedRun)).size);
    expect(counts).toEqual(new Map([[a.id, 2], [b.id, 1]]));
  });

  it('counts the planned runs added after the plan, per study, as planOf gives them to the run sheet', async () => {
    const store = await freshStore();
    const a = await createStudy(store, coatingPlan('Invented demo: a'));
    const b = await createStudy(store, coatingPlan('Invented demo: b'));
    expect(await addedPlannedRuns(store)).toEqual(new Map());
    await addPlannedRuns(store, a.id, 'path', [{ kind: 'path', coded: [1.5, -0.5, 0.25] }, { kind: 'path', coded: [3, -1, 0.5] }], 'invented path');
    await addPlannedRuns(store, a.id, 'confirmation', [{ kind: 'confirmation', coded: [1, 1, 1] }], 'invented');
    const added = await addedPlannedRuns(store);
    expect(added).toEqual(new Map([[a.id, 3]]));
    // The plan with its blocks has exactly that many runs more than the study's own plan.
    const plan = await planOf(store, a);
    expect(plan.design.runs.length - a.design.runs.length).toBe(added.get(a.id));
    expect(added.has(b.id)).toBe(false);
  });
});
