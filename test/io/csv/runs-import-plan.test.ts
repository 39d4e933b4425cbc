import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyze as analyzeCommand } from '../../../src/cli/commands/analyze.ts';
import { analysisJson } from '../../../src/cli/report/analysis-json.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { responseDataFromRuns } from '../../../src/core/study/run-data.ts';
import { exportedCsvResponseData } from '../../../src/io/csv/exported-csv.ts';
import { inspectRunsCsv, mapRunsCsv } from '../../../src/io/csv/runs-import.ts';
import { studyCsv } from '../../../src/io/csv/study-csv.ts';
import { importRunsCsv } from '../../../src/store/files.ts';
import { listRuns } from '../../../src/store/runs.ts';
import { listStudies } from '../../../src/store/studies.ts';
import { laserStudy } from '../../helpers/laser-study.ts';
import { freshStore } from '../../store/helpers.ts';

// The expected alias chains are those of the half fraction D = ABC (I = ABCD: AB = CD, AC = BD,
// AD = BC; Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2). The estimates
// are checked against the study the file was exported from and against the command line's reading
// of the same file (exported-csv.ts), two independent paths to the same data.
const CHAINS = ['A', 'B', 'C', 'D', 'AB + CD', 'AC + BD', 'AD + BC'];
const chains = (a: ReturnType<typeof analyze>) => a.terms.map((t) => t.estimates ?? t.letters);

function rowsOf(csv: string): string[][] {
  return Papa.parse<string[]>(csv.trimEnd(), { header: false }).data;
}
function csvOf(rows: readonly (readonly string[])[]): string {
  return Papa.unparse(rows as string[][], { newline: '\r\n' }) + '\r\n';
}

async function importText(csv: string) {
  const mapped = mapRunsCsv(csv, { ...inspectRunsCsv(csv).suggestion, title: 'Imported laser runs' });
  const store = await freshStore();
  const { study } = await importRunsCsv(store, mapped);
  return { store, study, runs: await listRuns(store, study.id) };
}

describe('importing a Trialbook CSV export keeps the plan (planned vs actual settings)', () => {
  it('an off-target run keeps its planned setting as the plan and its actual as logged; the analysis equals the original and the command line', async () => {
    const original = await laserStudy();
    const csv = studyCsv(original.study, original.runs);
    const ins = inspectRunsCsv(csv);
    expect(ins.suggestion.factors.map((f) => [f.column, f.planned])).toEqual([
      ['Power actual', 'Power planned'],
      ['Speed actual', 'Speed planned'],
      ['Focus actual', 'Focus planned'],
      ['Gas actual', 'Gas planned'],
    ]);
    expect(ins.columns.filter((c) => c.role === 'planned').length).toBe(4);
    expect(ins.suggestion.responses.map((r) => [r.column, r.name, r.unit])).toEqual([['Roughness (µm) readings', 'Roughness', 'µm']]);

    const imported = await importText(csv);
    expect(imported.study.factors).toEqual(original.study.factors);
    expect(imported.study.design.runs.map((r) => r.coded)).toEqual(original.study.design.runs.map((r) => r.coded));
    expect(imported.study.design.runs.map((r) => [r.kind, r.standardOrder, r.replicate, r.block])).toEqual(original.study.design.runs.map((r) => [r.kind, r.standardOrder, r.replicate, r.block]));
    expect(imported.runs.map((r) => r.actual)).toEqual(original.runs.map((r) => r.actual));
    expect(imported.runs[1].actual[0]).toBe(89); // planned 90, logged 89
    expect(imported.study.design.runs[1].coded[0]).toBe(1);

    const fromImport = responseDataFromRuns(imported.study, imported.runs, 'Roughness');
    const fromOriginal = responseDataFromRuns(original.study, original.runs, 'Roughness');
    const fromCli = exportedCsvResponseData(csv, 'Roughness');
    expect(fromImport.planned).toEqual(fromOriginal.planned);
    expect(fromImport.coded).toEqual(fromOriginal.coded);
    expect(fromImport.y).toEqual(fromOriginal.y);
    const [a, b, c] = [analyze(fromImport), analyze(fromOriginal), analyze(fromCli)];
    expect(chains(a)).toEqual(CHAINS);
    expect(chains(b)).toEqual(CHAINS);
    expect(chains(c)).toEqual(CHAINS);
    expect(a.aliased).toEqual(b.aliased);
    expect(a).toEqual(b); // every figure of the analysis, as for the study it came from
    a.terms.forEach((t, j) => {
      expect(t.coef).toBeCloseTo(b.terms[j].coef, 10);
      expect(t.coef).toBeCloseTo(c.terms[j].coef, 10);
    });
    // `analyze file.csv --json` on the same file prints what the imported study's analysis gives.
    const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'laser.csv');
    writeFileSync(file, csv);
    const printed = JSON.parse(await analyzeCommand.run([file, '--response', 'Roughness', '--json']));
    expect(printed).toEqual(JSON.parse(JSON.stringify(analysisJson(a))));
  });

  it('a planned run not yet logged stays in the plan without a logged run', async () => {
    const original = await laserStudy(5);
    const imported = await importText(studyCsv(original.study, original.runs));
    expect(imported.study.design.runs).toHaveLength(11);
    expect(imported.runs.map((r) => r.plannedRun)).toEqual([1, 2, 3, 4, 6, 7, 8, 9, 10, 11]);
    expect(imported.study.design.notes.some((n) => n.startsWith('1 planned run has no actual settings or readings'))).toBe(true);
  });

  it('an older export without the planned columns imports as before: the plan is the file\'s actual settings', async () => {
    const original = await laserStudy();
    const rows = rowsOf(studyCsv(original.study, original.runs));
    const keep = rows[0].map((h, c) => (h.endsWith(' planned') ? -1 : c)).filter((c) => c >= 0);
    const older = csvOf(rows.map((r) => keep.map((c) => r[c])));
    expect(inspectRunsCsv(older).columns.some((c) => c.role === 'planned')).toBe(false);
    const mapped = mapRunsCsv(older, {
      title: 'Older export',
      factors: ['Power actual', 'Speed actual', 'Focus actual', 'Gas actual'].map((column) => ({ column, name: column.replace(' actual', '') })),
      responses: [{ column: 'Roughness (µm)', goal: 'minimize' }],
    });
    // Low and high are the column's minimum and maximum (70 and 90), as before this change.
    expect(mapped.plan.factors[0]).toMatchObject({ low: 70, high: 90 });
    expect(mapped.plan.design.runs[1].coded[0]).toBeCloseTo(0.9, 12);
    expect(mapped.runs.map((r) => r.values.actual)).toEqual(original.runs.map((r) => r.actual));
  });

  it('a column mapped by hand as planned settings is the plan, and sets low and high from the planned settings', () => {
    // Invented runs: the second logged at 198 where 200 was planned.
    const csv = ['Temperature (°C),Temperature plan,Gloss', '160,160,80', '198,200,91', '160,160,82', '200,200,90'].join('\r\n');
    const mapped = mapRunsCsv(csv, { title: 'Invented trial', factors: [{ column: 'Temperature (°C)', planned: 'Temperature plan' }], responses: [{ column: 'Gloss', goal: 'maximize' }] });
    expect(mapped.plan.factors[0]).toMatchObject({ low: 160, high: 200 });
    expect(mapped.plan.design.runs.map((r) => r.coded)).toEqual([[-1], [1], [-1], [1]]);
    expect(mapped.runs[1].values.actual).toEqual([198]);
    expect(mapped.plan.design.runs.map((r) => r.replicate)).toEqual([1, 1, 2, 2]);
  });

  it('bad input: a planned value that cannot be read names its row and column, and nothing is imported', async () => {
    const original = await laserStudy();
    const rows = rowsOf(studyCsv(original.study, original.runs));
    const power = rows[0].indexOf('Power planned');
    const gas = rows[0].indexOf('Gas planned');
    const mapping = { ...inspectRunsCsv(csvOf(rows)).suggestion, title: 'x' };
    const edited = (r: number, c: number, v: string) => csvOf(rows.map((row, i) => (i === r ? row.map((x, j) => (j === c ? v : x)) : row)));
    expect(() => mapRunsCsv(edited(3, power, 'ninety'), mapping)).toThrow(`Row 4, column ${power + 1} ("Power planned"): the planned setting cannot be read: Power needs a number, got "ninety"`);
    expect(() => mapRunsCsv(edited(3, gas, 'argon'), mapping)).toThrow(`Row 4, column ${gas + 1} ("Gas planned"): the planned setting cannot be read: Gas has the levels "air" and "N2", got "argon"`);
    expect(() => mapRunsCsv(edited(2, power, ''), mapping)).toThrow(`Row 3, column ${power + 1} ("Power planned"): Power has no planned setting`);
    expect(() => mapRunsCsv(csvOf(rows), { ...mapping, factors: mapping.factors.map((f, j) => (j === 2 ? { ...f, planned: undefined } : f)) })).toThrow(
      'Map a planned-settings column for every factor, or for none: Focus has none',
    );
    expect(() => mapRunsCsv(edited(1, rows[0].indexOf('Std order'), '2.5'), mapping)).toThrow('Row 2, column 2 ("Std order"): the standard order needs a whole number from 1 (or an empty cell), got "2.5"');
    expect(() => mapRunsCsv(edited(1, rows[0].indexOf('Kind'), 'corner'), mapping)).toThrow(/^Row 2, column 5 \("Kind"\): the kind of run needs one of factorial, center, axial, path, confirmation, got "corner"$/);
    const store = await freshStore();
    expect(await listStudies(store)).toEqual([]);
  });
});
