/**
 * The invented laser-cutter half fraction (half-fraction.ts: 2^(4-1), D = ABC, so AB = CD,
 * AC = BD, AD = BC by Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2)
 * planned in a study of its own store and logged on the run form, run 2's Power at 89 where
 * the plan said 90 (an honest off-target setting). Invented data, for tests only.
 */
import { parseRunForm } from '../../src/core/study/run-form.ts';
import type { StudyPlan } from '../../src/core/study/study.ts';
import { createStudy } from '../../src/store/studies.ts';
import { listRuns, openNewRun, saveRun } from '../../src/store/runs.ts';
import { coatingPlan, freshStore } from '../store/helpers.ts';
import { halfFractionCorners, laserFactors, laserY } from './half-fraction.ts';

/** The study and its logged runs; `skip` leaves that planned run (1-based) unlogged. */
export async function laserStudy(skip?: number) {
  const planned = [...halfFractionCorners(), [0, 0, 0, -1], [0, 0, 0, 1], [0, 0, 0, 1]];
  const plan: StudyPlan = {
    ...coatingPlan(),
    title: 'Invented demo: laser cutter half fraction',
    factors: laserFactors,
    responses: [{ name: 'Roughness', unit: 'µm', goal: 'minimize' }],
    design: {
      ...coatingPlan().design,
      runs: planned.map((coded, i) => ({ run: i + 1, standardOrder: i < 8 ? i + 1 : null, replicate: 1, block: 1, originBlock: 1, kind: i < 8 ? 'factorial' : 'center', coded })),
      summary: 'Half fraction of four factors with three center runs (invented test plan).',
    },
  };
  const store = await freshStore();
  const study = await createStudy(store, plan);
  for (let i = 0; i < planned.length; i++) {
    if (i + 1 === skip) continue;
    const state = await openNewRun(store, study.id, i + 1);
    const actual = i === 1 ? ['89', ...state.form.actual.slice(1)] : state.form.actual;
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, actual, readings: [String(laserY[i])] }) });
  }
  return { study, runs: await listRuns(store, study.id) };
}
