import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { studyConfirmations } from '../../../src/core/predict/study-confirmations.ts';
import { readBackupSync } from '../../../src/io/backup/backup.ts';
import { selectStudy, studyRuns } from '../../../src/io/backup/select-study.ts';
import { confirmationsCsv } from '../../../src/io/csv/confirmations-csv.ts';
import { readTable } from '../../../src/io/csv/read-table.ts';
import { DEMO_STUDY, demoWithConfirmation } from '../../helpers/confirmation-backup.ts';

describe('confirmationsCsv: the verdicts as a small CSV beside the runs file (invented demo data)', async () => {
  const backup = readBackupSync(await demoWithConfirmation());
  const study = selectStudy(backup, DEMO_STUDY);
  const results = studyConfirmations(study, studyRuns(backup, study.id));
  const text = confirmationsCsv(study.factors, results);

  it('opens as one rectangular table (papaparse), one row per set and response, the numbers read back exactly', () => {
    const rows = Papa.parse<string[]>(text.trimEnd(), { header: false }).data;
    expect(rows[0]).toEqual(['Response', 'Model', 'Block', 'Runs', 'Oven temperature (°C) setting', 'Line speed (m/min) setting', 'Powder flow (g/min) setting', 'Runs logged', 'Mean', 'Predicted', 'Interval low', 'Interval high', 'Level', 'Outcome', 'Verdict', 'Caution']);
    expect(rows.every((r) => r.length === rows[0].length)).toBe(true);
    expect(rows).toHaveLength(1 + results.length);
    const gloss = rows.find((r) => r[0] === 'Gloss')!;
    const c = results.find((r) => r.response === 'Gloss')!.judged[0].comparison!;
    expect(gloss.slice(2, 8)).toEqual(['2', '12 13 14', '200', '3', '40', '3']);
    expect(Number(gloss[8])).toBe(c.mean);
    expect(Number(gloss[10])).toBe(c.interval![0]);
    expect(gloss[13]).toBe(c.outcome);
    expect(gloss[14]).toMatch(/^(Confirmed|Not confirmed): the mean of the 3 confirmation runs/);
    expect(gloss[15]).toContain("Settings must stay within the machine's rated limits");
    expect(text.endsWith('\r\n')).toBe(true); // RFC 4180 record ends
  });

  it("the project's own reader reads it too, and a byte-order mark is added only when asked", () => {
    const t = readTable(text);
    expect(t.header[0]).toBe('Response');
    expect(confirmationsCsv(study.factors, results, { bom: true }).charCodeAt(0)).toBe(0xfeff);
    expect(text.charCodeAt(0)).not.toBe(0xfeff);
  });

  it('a response name a spreadsheet would run as a formula is neutralised (OWASP CSV injection advice)', () => {
    const risky = results.map((r) => ({ ...r, response: '=HYPERLINK("x")' }));
    const rows = Papa.parse<string[]>(confirmationsCsv(study.factors, risky).trimEnd(), { header: false }).data;
    expect(rows[1][0].startsWith("'=")).toBe(true);
  });

  it('degenerate input: no results give the header alone', () => {
    expect(confirmationsCsv(study.factors, []).split('\r\n').filter((l) => l !== '')).toHaveLength(1);
  });
});
