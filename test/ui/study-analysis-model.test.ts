import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { predict } from '../../src/core/predict/predict.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { importBackup } from '../../src/store/files.ts';
import { excludeRun, listRuns } from '../../src/store/runs.ts';
import { AnalysisModel } from '../../src/ui/models/analysis-model.ts';
import { QuickCardModel } from '../../src/ui/models/quick-card-model.ts';
import { openStudyAnalysis } from '../../src/ui/models/study-analysis-model.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { freshStore } from '../store/helpers.ts';

// The invented demo study (test/fixtures/trialbook-demo-backup.json). The expected numbers come
// from the core's analysis of the same backup, the command line's path (backupResponseData,
// then analyze), so the screens' shared model is checked against it.
const text = readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8');
const studyId = (JSON.parse(text) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

function reference(response: string, order: 1 | 2) {
  const data = backupResponseData(text, studyId, response);
  return analyze(data, { terms: termsUpToOrder(data.factors.length, order) });
}

async function opened() {
  const store = await freshStore();
  await importBackup(store, text);
  const shared = openStudyAnalysis(store, studyId);
  await shared.load();
  return { store, shared };
}

describe('the shared study analysis', () => {
  it('is one model per study: every screen of the study gets the same one', async () => {
    const { store, shared } = await opened();
    expect(openStudyAnalysis(store, studyId)).toBe(shared);
    expect(openStudyAnalysis(await freshStore(), studyId)).not.toBe(shared);
  });

  it('analyzes each response as the command line does, with its own model choice', async () => {
    const { shared } = await opened();
    const [film, gloss] = shared.responses.value;
    const r = film.result.value;
    expect(r.ok && r.analysis.terms.map((t) => t.effect)).toEqual(reference('Film thickness', 2).terms.map((t) => t.effect));
    shared.chooseModel(0, 'main');
    const main = film.result.value;
    expect(main.ok && main.analysis.terms.map((t) => t.effect)).toEqual(reference('Film thickness', 1).terms.map((t) => t.effect));
    // The other response keeps its own choice.
    expect(gloss.settings.value.model).toBe('two-way');
    const g = gloss.result.value;
    expect(g.ok && g.analysis.terms.length).toBe(reference('Gloss', 2).terms.length);
  });

  it('the quick card predicts from the model chosen for the Effects screen', async () => {
    const { shared } = await opened();
    const effects = new AnalysisModel(shared);
    const card = new QuickCardModel(shared);
    const at = { 'Oven temperature': 180, 'Line speed': 3, 'Powder flow': 40 };
    const p2 = card.prediction.value;
    expect(p2?.ok && p2.prediction.fit).toBeCloseTo(predict(reference('Film thickness', 2).model, at).fit, 12);
    shared.chooseModel(shared.shownIndex.value, 'main');
    expect(effects.ranked.value).toHaveLength(3);
    const p1 = card.prediction.value;
    expect(p1?.ok && p1.prediction.contributions).toHaveLength(3);
    expect(p1?.ok && p1.prediction.pi).toEqual(predict(reference('Film thickness', 1).model, at).pi);
    // Showing another response on one screen shows it on the other.
    shared.show(1);
    const pg = card.prediction.value;
    expect(pg?.ok && pg.prediction.fit).toBeCloseTo(predict(reference('Gloss', 2).model, at).fit, 12);
  });

  it('the transform chosen on the Effects screen is the one the quick card predicts from (fit back in the response units)', async () => {
    const { shared } = await opened();
    const card = new QuickCardModel(shared);
    const at = { 'Oven temperature': 180, 'Line speed': 3, 'Powder flow': 40 };
    shared.chooseTransform(shared.shownIndex.value, 'log');
    const data = backupResponseData(text, studyId, 'Film thickness');
    const ref = predict(analyze(data, { terms: termsUpToOrder(data.factors.length, 2), transform: { token: 'log', lambda: 0 } }).model, at);
    const p = card.prediction.value;
    expect(p?.ok && p.prediction.fit).toBeCloseTo(ref.fit, 12);
    expect(p?.ok && p.prediction.transformed?.fit).toBeCloseTo(Math.log(ref.fit - (data.lowerBound ?? 0)), 9); // log of the median
    const r = shared.shown.value!.result.value;
    expect(r.ok && r.analysis.transform.token).toBe('log');
  });

  it('re-reads the runs when a screen opens, and works the analysis out again only when a run changed', async () => {
    const { store, shared } = await opened();
    const before = shared.data.value;
    const n = shared.responses.value[0].result.value;
    await shared.load();
    expect(shared.data.value).toBe(before);
    const run = (await listRuns(store, studyId)).find((r) => !r.excluded)!;
    await excludeRun(store, run.id, 'test: a slip at the oven');
    await shared.load();
    expect(shared.data.value).not.toBe(before);
    const after = shared.responses.value[0].result.value;
    expect(n.ok && after.ok && after.analysis.n).toBe(n.ok ? n.analysis.n - 1 : -1);
  });

  it('a setting typed on the quick card that cannot be read changes nothing but the message', async () => {
    const { shared } = await opened();
    const card = new QuickCardModel(shared);
    const fit = card.prediction.value;
    card.setText(1, '3,5,1');
    expect(card.fieldErrors.value[1]).toBe('Line speed needs a number (digits, with a point or a comma for decimals), got "3,5,1". The prediction still uses 3 m/min.');
    expect(card.settings.value[1]).toBe(3);
    expect(card.prediction.value).toEqual(fit);
    shared.show(99); // degenerate: no such response, nothing changes
    expect(shared.shownIndex.value).toBe(0);
  });
});
