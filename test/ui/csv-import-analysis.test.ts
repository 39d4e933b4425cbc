import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { exportedCsvResponseData } from '../../src/io/csv/exported-csv.ts';
import { inspectRunsCsv, mapRunsCsv } from '../../src/io/csv/runs-import.ts';
import { exportStudyCsv, importBackup, importRunsCsv } from '../../src/store/files.ts';
import { listRuns, openRun, saveRun } from '../../src/store/runs.ts';
import { getStudy } from '../../src/store/studies.ts';
import { openStudyAnalysis } from '../../src/ui/models/study-analysis-model.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { freshStore } from '../store/helpers.ts';

// The invented demo study (test/fixtures/trialbook-demo-backup.json) with one setting logged off
// target, exported as CSV and imported back as a new study: the Effects screen's shared model
// must show the same effects for both studies, and the same as the command line's reading of the
// same file (exported-csv.ts, then analyze with the same terms). Three paths, one answer. The demo
// is a full factorial, so its analysis alone cannot tell the plan from the actual settings; the
// planned settings the analysis stands on are therefore compared as well.
const text = readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8');
const studyId = (JSON.parse(text) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

describe('a CSV export of the demo study imported back gives the same Effects', () => {
  it('with one off-target setting, as the study it came from and as the command line', async () => {
    const store = await freshStore();
    await importBackup(store, text);
    const original = await getStudy(store, studyId);
    const run = (await listRuns(store, studyId)).find((r) => !r.excluded && original.design.runs[r.plannedRun - 1].kind === 'factorial')!;
    const state = await openRun(store, run.id);
    // One honest slip: the first factor logged 0.05 coded off its planned setting (a twentieth of its range).
    const f = original.factors[0];
    if (f.kind !== 'numeric') throw new Error('the demo study starts with a numeric factor');
    const off = Number(state.form.actual[0]) + (f.high - f.low) / 40;
    const actual = [String(off), ...state.form.actual.slice(1)];
    await saveRun(store, { ...state, studyId, values: parseRunForm(original, { ...state.form, actual }) });

    const csv = await exportStudyCsv(store, studyId);
    const suggestion = inspectRunsCsv(csv).suggestion;
    // The file carries neither goals nor lower bounds: the person gives them on mapping, as here.
    const responses = suggestion.responses.map((r, j) => ({ ...r, goal: original.responses[j].goal, target: original.responses[j].target, lowerBound: original.responses[j].lowerBound ?? null }));
    const { study: copy } = await importRunsCsv(store, mapRunsCsv(csv, { ...suggestion, responses, title: 'Imported copy' }));
    const copied = (await listRuns(store, copy.id)).find((r) => r.plannedRun === run.plannedRun)!;
    expect(copied.actual[0]).toBe(off);
    expect(copy.design.runs[run.plannedRun - 1].coded).toEqual(original.design.runs[run.plannedRun - 1].coded);
    expect(copy.design.runs).toEqual(original.design.runs); // the same plan, run for run

    const a = openStudyAnalysis(store, studyId);
    const b = openStudyAnalysis(store, copy.id);
    await Promise.all([a.load(), b.load()]);
    expect(a.responses.value).toHaveLength(2);
    expect(b.responses.value.map((r) => r.response)).toEqual(a.responses.value.map((r) => r.response));
    a.responses.value.forEach((ra, j) => {
      const x = ra.result.value;
      const y = b.responses.value[j].result.value;
      if (!x.ok || !y.ok) throw new Error(`response ${j} did not analyse`);
      expect(y.analysis.terms.map((t) => t.estimates ?? t.letters)).toEqual(x.analysis.terms.map((t) => t.estimates ?? t.letters));
      expect(y.analysis.aliased).toEqual(x.analysis.aliased);
      // The nominal plan the analysis stands on (planned vs actual), as if logged on the phone.
      expect(y.data.planned).toEqual(x.data.planned);
      expect(y.data.coded).toEqual(x.data.coded);
      expect(y.analysis).toEqual(x.analysis); // every figure of the Effects screen's analysis
      // The command line's default model is the screen's default: main effects and two-factor interactions.
      const data = exportedCsvResponseData(csv, ra.response.name);
      const cli = analyze(data, { terms: termsUpToOrder(data.factors.length, 2) });
      expect(cli.terms.map((t) => t.estimates ?? t.letters)).toEqual(x.analysis.terms.map((t) => t.estimates ?? t.letters));
      cli.terms.forEach((t, k) => expect(t.effect).toBeCloseTo(x.analysis.terms[k].effect, 10));
    });
  });
});
