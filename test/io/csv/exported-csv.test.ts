import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { parseRunForm } from '../../../src/core/study/run-form.ts';
import { responseDataFromRuns } from '../../../src/core/study/run-data.ts';
import type { StudyPlan } from '../../../src/core/study/study.ts';
import { exportedCsvResponseData } from '../../../src/io/csv/exported-csv.ts';
import { studyCsv } from '../../../src/io/csv/study-csv.ts';
import { createStudy } from '../../../src/store/studies.ts';
import { listRuns, openNewRun, saveRun } from '../../../src/store/runs.ts';
import { coatingPlan, freshStore } from '../../store/helpers.ts';
import { halfFractionCorners, laserFactors, laserY } from '../../helpers/half-fraction.ts';

/**
 * The invented laser-cutter half fraction (test/helpers/half-fraction.ts: 2^(4-1), D = ABC, so
 * AB = CD, AC = BD, AD = BC by Montgomery, Design and Analysis of Experiments, 8th ed.,
 * section 8.2), planned in a study, logged with run 2's Power at 89 where the plan said 90.
 */
async function laserStudy() {
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
    const state = await openNewRun(store, study.id, i + 1);
    const actual = i === 1 ? ['89', ...state.form.actual.slice(1)] : state.form.actual;
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, actual, readings: [String(laserY[i])] }) });
  }
  return { study, runs: await listRuns(store, study.id) };
}

const chains = (a: ReturnType<typeof analyze>) => a.terms.map((t) => t.estimates ?? t.letters);

describe('reading back the CSV export: the planned columns are the nominal plan', () => {
  it('a Trialbook CSV with an off-target setting fits the alias chains, as the same runs read from the store do', async () => {
    const { study, runs } = await laserStudy();
    const csv = studyCsv(study, runs);
    const fromCsv = exportedCsvResponseData(csv, 'Roughness');
    const fromStore = responseDataFromRuns(study, runs, 'Roughness');
    expect(fromCsv.planned).toEqual(fromStore.planned);
    expect(fromCsv.coded[1][0]).toBeCloseTo(0.9, 12); // 89 on 70..90: the actual setting is still used
    const a = analyze(fromCsv);
    const b = analyze(fromStore);
    expect(chains(a)).toEqual(['A', 'B', 'C', 'D', 'AB + CD', 'AC + BD', 'AD + BC']);
    expect(chains(a)).toEqual(chains(b));
    a.terms.forEach((t, j) => expect(t.coef).toBeCloseTo(b.terms[j].coef, 10));
  });

  it('an older export without the planned columns still reads, with no plan (levels inferred from -1, 0, +1)', async () => {
    const { study, runs } = await laserStudy();
    const rows = Papa.parse<string[]>(studyCsv(study, runs).trimEnd(), { header: false }).data;
    const keep = rows[0].map((h, c) => (h.endsWith(' planned') ? -1 : c)).filter((c) => c >= 0);
    const older = rows.map((r) => keep.map((c) => r[c]).join(',')).join('\r\n') + '\r\n';
    const d = exportedCsvResponseData(older, 'Roughness');
    expect(d.planned).toBeUndefined();
    expect(d.points).toBeNull();
    expect(d.coded).toHaveLength(11);
    // Within 0.1 coded of +1, so the inferred plan confounds the same pairs (nominal-settings.ts).
    expect(chains(analyze(d))).toEqual(['A', 'B', 'C', 'D', 'AB + CD', 'AC + BD', 'AD + BC']);
  });

  it('bad input: a blank planned setting is refused naming its row and column, and nothing is read', async () => {
    const { study, runs } = await laserStudy();
    const rows = Papa.parse<string[]>(studyCsv(study, runs).trimEnd(), { header: false }).data;
    const c = rows[0].indexOf('Power planned');
    rows[3][c] = '';
    const text = rows.map((r) => r.join(',')).join('\r\n');
    expect(() => exportedCsvResponseData(text, 'Roughness')).toThrow(/Row 4, column \d+ \("Power planned"\): Power has no planned setting/);
  });
});
