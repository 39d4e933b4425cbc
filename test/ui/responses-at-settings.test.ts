import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { defaultDesirabilityEntry, readDesirabilityEntry } from '../../src/core/optimum/desirability-entry.ts';
import { desirabilityAt } from '../../src/core/optimum/desirability-search.ts';
import { predict } from '../../src/core/predict/predict.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { importBackup } from '../../src/store/files.ts';
import { QuickCardModel } from '../../src/ui/models/quick-card-model.ts';
import { SeveralResponsesModel } from '../../src/ui/models/several-responses-model.ts';
import { openStudyAnalysis } from '../../src/ui/models/study-analysis-model.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { freshStore } from '../store/helpers.ts';

// The invented demo study (a 2^3 with center runs; Film thickness, target 70 µm; Gloss,
// maximize). The quick card's block is checked two ways at settings away from the center:
// against the core's desirabilityAt with models fitted here from the same backup through the
// command line's path (backupResponseData, then analyze with interactions, the Effects screen's
// default), and against the definitions of Derringer and Suich (1980), Journal of Quality
// Technology 12, 214-219: a target's d = (y - L) / (T - L) below T and (H - y) / (H - T) above,
// a maximum's d = (y - L) / (H - L) between its limits, and D the geometric mean of the d's.
const text = readFileSync(fixturePath('trialbook-demo-backup.json'), 'utf8');
const study = (JSON.parse(text) as { payload: { studies: { id: string; responses: { name: string; goal: 'maximize' | 'minimize' | 'target'; target?: number }[] }[] } }).payload.studies[0];

async function opened() {
  const store = await freshStore();
  await importBackup(store, text);
  const shared = openStudyAnalysis(store, study.id);
  await shared.load();
  return { shared, card: new QuickCardModel(shared) };
}

function block(card: InstanceType<typeof QuickCardModel>) {
  const b = card.allResponses.value;
  if (!b) throw new Error('expected the block of all responses');
  return b;
}

/** d by the paper's definitions, written out here apart from the core's code. */
function dByDefinition(s: { goal: string; low: number; high: number; target?: number }, y: number): number {
  if (s.goal === 'max') return Math.min(1, Math.max(0, (y - s.low) / (s.high - s.low)));
  if (s.goal === 'min') return Math.min(1, Math.max(0, (s.high - y) / (s.high - s.low)));
  const T = s.target!;
  if (y < s.low || y > s.high) return 0;
  return y <= T ? (y - s.low) / (T - s.low) : (s.high - y) / (s.high - T);
}

describe('the quick card: all responses at these settings (model)', () => {
  it("each prediction, d and the overall D are the core's at the card's settings, and follow a change", async () => {
    const { card } = await opened();
    const data = study.responses.map((r) => backupResponseData(text, study.id, r.name));
    const models = data.map((d) => analyze(d, { terms: termsUpToOrder(3, 2) }).model);
    const specs = study.responses.map((r, i) => readDesirabilityEntry(r.name, defaultDesirabilityEntry(r, data[i].y))!);
    let last = Number.NaN;
    for (const [i, x] of [[0, 0.6], [1, -0.8], [2, 0.3]] as const) {
      card.setCoded(i, x);
      const b = block(card);
      const at = desirabilityAt(models, specs, card.coded.value);
      expect(b.rows.map((r) => r.name)).toEqual(['Film thickness', 'Gloss']);
      b.rows.forEach((r, j) => {
        expect(r.fit).toBeCloseTo(at.responses[j].fit, 9);
        expect(r.d).toBeCloseTo(at.responses[j].d, 12);
        expect(r.d).toBeCloseTo(dByDefinition(specs[j], r.fit!), 12);
      });
      expect(b.D).toBeCloseTo(at.D, 12);
      expect(b.D).toBeCloseTo(Math.sqrt(b.rows[0].d! * b.rows[1].d!), 12);
      expect(b.missing).toBeNull();
      expect(b.D).not.toBe(last); // the block follows each change of setting
      last = b.D!;
    }
    // The shown response's row agrees with the card's own prediction at the real settings.
    const p = card.prediction.value;
    expect(p && p.ok && p.prediction.fit).toBeCloseTo(block(card).rows[0].fit!, 9);
  });

  it("the limits are the several-responses screen's starting values", async () => {
    const { shared, card } = await opened();
    const several = new SeveralResponsesModel(shared);
    const specs = several.rows.value.map((row) => readDesirabilityEntry(row.name, row.entry)!);
    const b = block(card);
    b.rows.forEach((r, j) => expect(r.d).toBeCloseTo(dByDefinition(specs[j], r.fit!), 12));
  });

  it('a transformed response shows words instead of numbers and there is no overall D; as measured again, it returns', async () => {
    const { shared, card } = await opened();
    const before = block(card);
    shared.chooseTransform(1, 'log');
    const b = block(card);
    expect(b.rows[1]).toMatchObject({ name: 'Gloss', fit: null, fitWord: 'transformed scale', d: null, dWord: 'transformed scale' });
    expect(b.rows[0].d).toBeCloseTo(before.rows[0].d!, 12);
    expect(b.D).toBeNull();
    expect(b.missing).toMatch(/^No overall D: Gloss has no d here\./);
    shared.chooseTransform(1, 'none');
    expect(block(card).D).toBeCloseTo(before.D!, 12);
  });

  it('a number that cannot be read changes nothing in the block (degenerate input)', async () => {
    const { card } = await opened();
    card.setCoded(0, 0.5);
    const before = block(card);
    card.setText(1, 'fast');
    expect(card.fieldErrors.value[1]).not.toBeNull();
    expect(block(card)).toEqual(before);
  });
});
