import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { responseDataFromRuns } from '../../../src/core/study/run-data.ts';
import { exportedCsvResponseData } from '../../../src/io/csv/exported-csv.ts';
import { studyCsv } from '../../../src/io/csv/study-csv.ts';
// The invented laser-cutter half fraction, logged with run 2's Power at 89 where the plan said 90.
import { laserStudy } from '../../helpers/laser-study.ts';


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
