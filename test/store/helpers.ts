/**
 * Test helpers for the store: a fresh database per test (fake-indexeddb), and a small invented
 * study (a made-up powder-coating trial, not real data) whose plan is a full factorial in
 * standard order with center runs, built here by hand so that the store tests do not depend on
 * the design builder.
 */
import { defineFactors, type FactorSpec } from '../../src/core/factor/factor.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { openNewRun, openRun, saveRun } from '../../src/store/runs.ts';
import type { StudyPlan } from '../../src/core/study/study.ts';
import { openStore, type Store, type StoreOptions } from '../../src/store/store.ts';
import { factorialRuns, plainDesign } from '../helpers/plain-design.ts';

let counter = 0;

/** A store on a database of its own. */
export async function freshStore(options: StoreOptions = {}): Promise<Store> {
  counter += 1;
  return openStore({ name: `test-${process.pid}-${counter}-${Math.random().toString(36).slice(2)}`, storage: null, ...options });
}

export { factorialRuns };

const COATING: FactorSpec[] = [
  { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
  { kind: 'numeric', name: 'Line speed', low: 2, high: 4, unit: 'm/min' },
  { kind: 'numeric', name: 'Powder flow', low: 30, high: 50, unit: 'g/min' },
];

/** The invented powder-coating study: three numeric factors, two responses. */
export function coatingPlan(title = 'Invented demo: coating line trial', replicates = 1, centers = 2): StudyPlan {
  const factors = defineFactors(COATING);
  return {
    title,
    purpose: 'INVENTED DEMO DATA. Find oven and line settings that give an even film on the test panels.',
    factors,
    responses: [
      { name: 'Film thickness', unit: 'µm', goal: 'target', target: 70 },
      { name: 'Gloss', unit: 'GU', goal: 'maximize' },
    ],
    design: plainDesign(factorialRuns(3, replicates, centers), 'Full factorial in 3 factors, standard order, with center runs (test plan).'),
  };
}

/** A plan with a categorical factor (two powder brands) for the tests that need one. */
export function brandPlan(): StudyPlan {
  const factors = defineFactors([
    { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
    { kind: 'categorical', name: 'Powder', levels: ['Brand North', 'Brand South'] },
  ]);
  return {
    title: 'Invented demo: powder brands',
    purpose: 'INVENTED DEMO DATA.',
    factors,
    responses: [{ name: 'Gloss', unit: 'GU', goal: 'maximize' }],
    design: { ...coatingPlan().design, runs: factorialRuns(2, 2, 0), summary: 'Full factorial in 2 factors, 2 replicates (test plan).' },
  };
}

/** Logs a planned run of the coating study through the run form, with the film thickness readings typed as `thickness` and no gloss. */
export async function logThickness(store: Store, studyId: string, plannedRun: number, thickness: string) {
  const state = await openNewRun(store, studyId, plannedRun);
  return saveRun(store, { ...state, studyId, values: parseRunForm(state.study, { ...state.form, readings: [thickness, ''] }) });
}

/** Saves a new revision of a logged run of the coating study with the film thickness typed as `thickness`. */
export async function editThickness(store: Store, runId: string, thickness: string) {
  const state = await openRun(store, runId);
  return saveRun(store, { ...state, studyId: state.study.id, values: parseRunForm(state.study, { ...state.form, readings: [thickness, ''] }) });
}
