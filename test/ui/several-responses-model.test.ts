import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { readDesirabilityEntry } from '../../src/core/optimum/desirability-entry.ts';
import { desirabilityAt } from '../../src/core/optimum/desirability-search.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { importBackup } from '../../src/store/files.ts';
import { SeveralResponsesModel } from '../../src/ui/models/several-responses-model.ts';
import { openStudyAnalysis } from '../../src/ui/models/study-analysis-model.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { freshStore } from '../store/helpers.ts';

// The invented demo study (Film thickness, target 70 µm; Gloss, maximize). The result is checked
// against the core's desirability at the point found, from the command line's path to the same
// backup (backupResponseData, then analyze), with the definitions of Derringer and Suich (1980),
// Journal of Quality Technology 12, 214-219.
const text = readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8');
const studyId = (JSON.parse(text) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

async function opened() {
  const store = await freshStore();
  await importBackup(store, text);
  const shared = openStudyAnalysis(store, studyId);
  await shared.load();
  return { shared, m: new SeveralResponsesModel(shared) };
}

function okResult(m: InstanceType<typeof SeveralResponsesModel>) {
  const r = m.result.value;
  if (!r || !r.ok) throw new Error(`expected a result, got ${r ? r.message : 'none'}`);
  return r;
}

describe('several responses on the phone (model)', () => {
  it("the result's D and each d are the core's at the point found, from each response's own model", async () => {
    const { m } = await opened();
    const r = okResult(m);
    const models = ['Film thickness', 'Gloss'].map((n) => analyze(backupResponseData(text, studyId, n), { terms: termsUpToOrder(3, 2) }).model);
    expect(m.rows.value.map((row) => row.entry.goal)).toEqual(['target', 'max']);
    const specs = m.rows.value.map((row) => readDesirabilityEntry(row.name, row.entry)!);
    const at = desirabilityAt(models, specs, r.best.coded);
    expect(r.best.D).toBeCloseTo(at.D, 12);
    r.best.responses.forEach((x, i) => expect(x.d).toBeCloseTo(at.responses[i].d, 12));
  });

  it('a value that cannot be read is named on its field and changes nothing; fixing it applies it', async () => {
    const { m } = await opened();
    const before = okResult(m).best;
    m.setField('Gloss', 'ideal', 'lots');
    const row = m.rows.value[1];
    expect(row.errorField).toBe('ideal');
    expect(row.error).toBe('Gloss: the ideal value needs a number (digits, with a point or a comma for decimals), got "lots".');
    expect(okResult(m).best).toEqual(before);
    m.setField('Gloss', 'ideal', '95');
    expect(m.rows.value[1].error).toBeNull();
    expect(okResult(m).best.D).toBeLessThan(before.D); // a higher ideal is harder to reach
  });

  it('goals: each keeps its own typing; Ignore leaves a response out but predicts it; every one ignored says what to do', async () => {
    const { m } = await opened();
    m.setField('Gloss', 'acceptable', '80');
    m.setGoal('Gloss', 'min');
    expect(m.rows.value[1].entry).toMatchObject({ goal: 'min' });
    m.setGoal('Gloss', 'max');
    expect(m.rows.value[1].entry).toMatchObject({ goal: 'max', acceptable: '80' });
    m.setGoal('Gloss', 'ignore');
    const r = okResult(m);
    expect(r.best.responses.map((x) => x.name)).toEqual(['Film thickness']);
    expect(r.ignored.map((x) => x.name)).toEqual(['Gloss']);
    m.setGoal('Film thickness', 'ignore');
    const none = m.result.value;
    expect(none && !none.ok && none.message).toBe('Every response is set to Ignore: give at least one response a goal to find a best setting.');
  });

  it('limits no setting meets: D = 0, with the words naming the response', async () => {
    const { m } = await opened();
    m.setField('Gloss', 'ideal', '300');
    m.setField('Gloss', 'acceptable', '200');
    const r = okResult(m);
    expect(r.best.D).toBe(0);
    expect(r.noneMeetsAll).toMatch(/Gloss is predicted at [\d.]+ GU, below its acceptable 200 GU/);
  });

  it('a transformed response is refused in words until it is measured as is, or ignored', async () => {
    const { shared, m } = await opened();
    shared.chooseTransform(1, 'log');
    const r = m.result.value;
    expect(r && !r.ok && r.message).toMatch(/^Gloss is analyzed on a transformed scale/);
    m.setGoal('Gloss', 'ignore');
    expect(m.result.value?.ok).toBe(true);
  });
});
