import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { readFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { parseRunForm } from '../../../src/core/study/run-form.ts';
import { responseDataFromRuns } from '../../../src/core/study/run-data.ts';
import { backupResponseData, selectStudy, studyRuns } from '../../../src/io/backup/select-study.ts';
import { readBackupSync } from '../../../src/io/backup/backup.ts';
import { exportedCsvResponseData } from '../../../src/io/csv/exported-csv.ts';
import { readTable } from '../../../src/io/csv/read-table.ts';
import { runSheetTable } from '../../../src/io/csv/run-sheet.ts';
import { studyCsv } from '../../../src/io/csv/study-csv.ts';
import { tableResponseData } from '../../../src/io/csv/table-response-data.ts';
import { exportStudyCsv } from '../../../src/store/files.ts';
import { createStudy } from '../../../src/store/studies.ts';
import { excludeRun, listRuns, openNewRun, saveRun } from '../../../src/store/runs.ts';
import { brandPlan, coatingPlan, freshStore } from '../../store/helpers.ts';

const root = fileURLToPath(new URL('../../..', import.meta.url));
const demoPath = fileURLToPath(new URL('../../fixtures/trialbook-demo-backup.json', import.meta.url));

async function studyWithNotes(notes: string[], operator = '') {
  const store = await freshStore();
  const study = await createStudy(store, brandPlan());
  for (let i = 0; i < notes.length; i++) {
    const state = await openNewRun(store, study.id, i + 1);
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, readings: [`${80 + i} ${81 + i}`], notes: notes[i], operator }) });
  }
  return { store, study, runs: await listRuns(store, study.id) };
}

describe('study CSV export', () => {
  it('has a header naming units, and the run sheet\'s planned-settings columns and cells', async () => {
    const { study, runs } = await studyWithNotes(['a']);
    const csv = studyCsv(study, runs);
    const rows = Papa.parse<string[]>(csv.trimEnd(), { header: false }).data;
    const sheet = runSheetTable({ factors: study.factors, runs: study.design.runs });
    expect(rows[0].slice(0, sheet.header.length)).toEqual(sheet.header);
    expect(rows[0]).toContain('Oven temperature (°C) actual');
    expect(rows[0]).toContain('Gloss (GU)');
    expect(rows[0]).toContain('Gloss (GU) readings');
    expect(rows[0].slice(-5)).toEqual(['Logged at', 'Operator', 'Notes', 'Excluded', 'Reason']);
    // One row per planned run here (one logged, the others not yet), in run order.
    expect(rows.length - 1).toBe(study.design.runs.length);
    rows.slice(1).forEach((r, i) => expect(r.slice(0, sheet.header.length)).toEqual(sheet.rows[i].map(String)));
    // The logged run: the mean, and the readings.
    const h = rows[0];
    expect(rows[1][h.indexOf('Gloss (GU)')]).toBe('80.5');
    expect(rows[1][h.indexOf('Gloss (GU) readings')]).toBe('80 81');
    expect(rows[1][h.indexOf('Powder coded')]).toBe('-1');
  });

  // RFC 4180, section 2, rules 5 to 7: fields with line breaks, double quotes or commas are
  // enclosed in double quotes, and a double quote inside is written twice; CRLF ends records.
  it('quotes as RFC 4180 says and reads back to the same text', async () => {
    const notes = ['panel 3, left edge', 'the "blue" batch', 'line one\r\nline two', 'plain'];
    const { study, runs } = await studyWithNotes(notes);
    const csv = studyCsv(study, runs);
    expect(csv).toContain(',"panel 3, left edge",');
    expect(csv).toContain(',"the ""blue"" batch",');
    expect(csv).toContain(',"line one\r\nline two",');
    expect(csv.endsWith('\r\n')).toBe(true);
    expect(csv.split('\r\n')[0].includes('"')).toBe(false);
    const t = readTable(csv);
    expect(t.rows.slice(0, 4).map((r) => r[t.header.indexOf('Notes')])).toEqual(notes);
  });

  // OWASP "CSV Injection": cells beginning with =, +, -, @, tab or carriage return are prefixed
  // with a single quote so a spreadsheet shows them as text; numbers stay numbers.
  it('neutralises text a spreadsheet would run as a formula, and leaves numbers alone', async () => {
    const notes = ['=HYPERLINK("http://example.invalid","x")', '+1+2', '-2+3', '@SUM(A1:A2)', '\tTAB', '\rCR'];
    const { study, runs } = await studyWithNotes(notes, '=cmd|calc');
    const csv = studyCsv(study, runs);
    // As a spreadsheet sees the file (papaparse reads cells as they are): guarded.
    const raw = Papa.parse<string[]>(csv.trim(), { newline: '\r\n' }).data;
    const col = raw[0].indexOf('Notes');
    expect(raw.slice(1, 7).map((r) => r[col])).toEqual(notes.map((n) => `'${n}`));
    expect(raw[1][raw[0].indexOf('Operator')]).toBe("'=cmd|calc");
    expect(raw[1][raw[0].indexOf('Oven temperature coded')]).toBe('-1'); // a number, not quoted
    // Read back by Trialbook: the guard removed again, every note as it was.
    const t = readTable(csv);
    expect(t.rows.slice(0, 6).map((r) => r[t.header.indexOf('Notes')])).toEqual(notes);
    expect(t.rows[0][t.header.indexOf('Operator')]).toBe('=cmd|calc');
  });

  it('writes a mean without binary round-off and the readings exactly (IEEE 754: (70.2 + 70.4) / 2 is 70.30000000000001)', async () => {
    const store = await freshStore();
    const study = await createStudy(store, brandPlan());
    const state = await openNewRun(store, study.id, 1);
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, readings: ['70.2 70.4'] }) });
    const rows = Papa.parse<string[]>(studyCsv(study, await listRuns(store, study.id)).trimEnd(), { header: false }).data;
    const h = rows[0];
    expect(rows[1][h.indexOf('Gloss (GU)')]).toBe('70.3');
    expect(rows[1][h.indexOf('Gloss (GU) readings')]).toBe('70.2 70.4');
  });

  it('starts with a byte-order mark only when asked', async () => {
    const { store, study } = await studyWithNotes(['a']);
    expect((await exportStudyCsv(store, study.id, { bom: true })).charCodeAt(0)).toBe(0xfeff);
    expect((await exportStudyCsv(store, study.id)).charCodeAt(0)).not.toBe(0xfeff);
  });

  it('reads back for the analysis like the store\'s own data: actual settings, excluded runs skipped', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan('Invented demo: round trip', 1, 2));
    for (const planned of study.design.runs) {
      const state = await openNewRun(store, study.id, planned.run);
      const actual = state.form.actual.map((a, j) => (j === 0 && planned.run === 2 ? String(Number(a) - 1.5) : a));
      const saved = await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, actual, readings: [`${60 + planned.run} ${61 + planned.run}`, planned.run === 3 ? '' : `${planned.run * 2}`] }) });
      if (planned.run === 5) await excludeRun(store, saved.run.id, 'smudged panel');
    }
    const runs = await listRuns(store, study.id);
    const csv = studyCsv(study, runs);
    for (const response of ['Film thickness', 'Gloss']) {
      const fromStore = responseDataFromRuns(study, runs, response);
      const fromCsv = exportedCsvResponseData(csv, response);
      expect(fromCsv.y).toEqual(fromStore.y);
      expect(fromCsv.labels).toEqual(fromStore.labels);
      fromCsv.coded.forEach((row, i) => row.forEach((c, j) => expect(c).toBeCloseTo(fromStore.coded[i][j], 12)));
      expect(fromCsv.factors.map((f) => f.kind === 'numeric' && [f.name, f.low, f.high, f.unit])).toEqual(study.factors.map((f) => f.kind === 'numeric' && [f.name, f.low, f.high, f.unit]));
      expect(fromCsv.messages.filter((n) => !/several readings/.test(n))).toEqual(fromStore.messages.filter((n) => !/several readings/.test(n)));
      // The command line's general CSV reader finds the actual-settings columns by factor name too.
      const general = tableResponseData(readTable(csv), { factors: ['Oven temperature', 'Line speed', 'Powder flow'], response, levels: { 'Oven temperature': ['160', '200'], 'Line speed': ['2', '4'], 'Powder flow': ['30', '50'] } });
      expect(general.y).toEqual(fromStore.y);
      general.coded.forEach((row, i) => row.forEach((c, j) => expect(c).toBeCloseTo(fromStore.coded[i][j], 12)));
    }
    expect(responseDataFromRuns(study, runs, 'Gloss').messages).toEqual(['1 excluded run skipped', '1 run without a value for Gloss skipped']);
    expect(() => exportedCsvResponseData('a,b\n1,2\n', 'Gloss')).toThrow(/not a Trialbook export/);
  });
});

describe('backups on the command line', () => {
  it('the csv command writes the same CSV as the app, from the demo backup', async () => {
    const text = readFileSync(demoPath, 'utf8');
    const backup = readBackupSync(text);
    const study = selectStudy(backup, 'Invented demo: powder-coating cure trial');
    const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'csv', demoPath, '--study', study.title], { cwd: root, encoding: 'utf8' });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    // The app's path: import the backup into a store, then export the study's CSV.
    const store = await freshStore();
    const { importBackup } = await import('../../../src/store/files.ts');
    await importBackup(store, text);
    expect(r.stdout).toBe(await exportStudyCsv(store, study.id));
  }, 30_000);

  it('backupResponseData: the demo study by name or id, excluded runs skipped, readings averaged', () => {
    const text = readFileSync(demoPath, 'utf8');
    const backup = readBackupSync(text);
    const study = backup.payload.studies[0];
    const d = backupResponseData(text, study.id, 'film thickness');
    expect(backupResponseData(text, ' INVENTED demo: powder-coating cure trial ', 'Film thickness')).toEqual(d);
    const runs = studyRuns(backup, study.id);
    expect(d.y.length).toBe(runs.filter((r) => !r.excluded).length);
    expect(d.messages).toContain('1 excluded run skipped');
    const repeated = runs.filter((r) => !r.excluded && r.readings[0].length > 1).length;
    expect(repeated).toBeGreaterThan(1);
    expect(d.messages).toContain(`${repeated} runs have several readings of Film thickness: each run's mean is used, and repeat readings are not counted as replicates`);
    const center = runs.find((r) => r.readings[0].length === 3)!;
    const i = d.labels.indexOf(String(center.plannedRun));
    expect(d.y[i]).toBeCloseTo(center.readings[0].reduce((a, b) => a + b) / 3, 12);
    expect(() => backupResponseData(text, study.id, 'Hardness')).toThrow(/no response "Hardness"; its responses are "Film thickness", "Gloss"/);
  });

  it('a name that matches two studies is refused with both ids listed', () => {
    const backup = readBackupSync(readFileSync(demoPath, 'utf8'));
    const s = backup.payload.studies[0];
    const twin = { ...s, id: 'second-study-id' };
    expect(() => selectStudy({ payload: { studies: [s, twin], revisions: [] } }, s.title)).toThrow(new RegExp(`matches 2 studies; give one of their ids instead: ${s.id} .*second-study-id`));
    expect(selectStudy({ payload: { studies: [s, twin], revisions: [] } }, 'second-study-id')).toBe(twin);
  });
});

describe('reading an export back: a hand-edited file', () => {
  it('refuses a response name that matches two columns, listing both', () => {
    const csv = [
      'Run,Kind,Excluded,A actual,A coded,Gloss (GU),Gloss (GU) readings,Gloss (%),Gloss (%) readings',
      '1,factorial,no,1,-1,80,80,50,50',
      '2,factorial,no,2,1,90,90,60,60',
    ].join('\r\n');
    expect(() => exportedCsvResponseData(csv, 'Gloss')).toThrow('The response "Gloss" matches 2 columns: "Gloss (GU)" (column 6) and "Gloss (%)" (column 8); name it in full, unit included');
    expect(exportedCsvResponseData(csv, 'Gloss (%)').y).toEqual([50, 60]);
  });
});
