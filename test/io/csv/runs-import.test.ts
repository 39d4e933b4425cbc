import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { inspectRunsCsv, mapRunsCsv } from '../../../src/io/csv/runs-import.ts';
import { importRunsCsv } from '../../../src/store/files.ts';
import { listRuns } from '../../../src/store/runs.ts';
import { listStudies } from '../../../src/store/studies.ts';
import { freshStore } from '../../store/helpers.ts';

// Invented runs of a made-up molding trial.
const CSV = [
  'Run,Melt temperature (°C),Mold,Hold time (s),Shrinkage (%),Notes',
  '1,220,steel,4,1.82,',
  '2,250,steel,4,1.61,"flash on edge, trimmed"',
  '3,220,aluminum,8,1.75 1.77,',
  '4,250,aluminum,8,1.50,',
  '5,235,steel,6,1.69,center',
].join('\r\n');

describe('CSV of runs made elsewhere', () => {
  it('proposes a mapping from the columns', () => {
    const ins = inspectRunsCsv(CSV, 'Invented molding trial');
    expect(ins.rows).toBe(5);
    expect(ins.suggestion.factors.map((f) => f.column)).toEqual(['Melt temperature (°C)', 'Mold', 'Hold time (s)']);
    expect(ins.suggestion.responses.map((r) => r.column)).toEqual(['Shrinkage (%)']);
    expect(ins.suggestion.notes).toBe('Notes');
    expect(ins.columns.find((c) => c.header === 'Run')!.role).toBe('ignore');
  });

  it('becomes a study after the mapping, one planned and one logged run per row', async () => {
    const mapped = mapRunsCsv(CSV, { ...inspectRunsCsv(CSV).suggestion, title: 'Invented molding trial', responses: [{ column: 'Shrinkage (%)', goal: 'minimize' }] });
    expect(mapped.plan.factors.map((f) => [f.letter, f.name, f.kind])).toEqual([
      ['A', 'Melt temperature', 'numeric'],
      ['B', 'Mold', 'categorical'],
      ['C', 'Hold time', 'numeric'],
    ]);
    expect(mapped.plan.factors[0]).toMatchObject({ low: 220, high: 250, unit: '°C' });
    expect(mapped.plan.responses).toEqual([{ name: 'Shrinkage', goal: 'minimize', unit: '%' }]);
    expect(mapped.plan.design.runs.map((r) => r.coded)).toEqual([[-1, -1, -1], [1, -1, -1], [-1, 1, 1], [1, 1, 1], [0, -1, 0]]);
    expect(mapped.runs[2].values.readings).toEqual([[1.75, 1.77]]);
    expect(mapped.runs[1].values.notes).toBe('flash on edge, trimmed');
    const store = await freshStore();
    const { study, runs } = await importRunsCsv(store, mapped);
    expect(runs).toBe(5);
    expect((await listRuns(store, study.id)).map((r) => r.actual)).toEqual([[220, 'steel', 4], [250, 'steel', 4], [220, 'aluminum', 8], [250, 'aluminum', 8], [235, 'steel', 6]]);
  });

  it('names row and column of a bad cell, and makes nothing', async () => {
    const bad = CSV.replace('1.50', '"1,50"');
    const mapping = { ...inspectRunsCsv(CSV).suggestion, title: 'x' };
    expect(() => mapRunsCsv(bad, mapping)).toThrow(/Row 5, column 5 \("Shrinkage \(%\)"\): Shrinkage: reading 1 needs a number, got "1,50"/);
    expect(() => mapRunsCsv(CSV.replace('aluminum,8,1.50', 'brass,8,1.50'), mapping)).toThrow(/Row \d, column 3 \("Mold"\): Mold needs numbers in every row, or exactly two level labels, got 3 labels/);
    expect(() => mapRunsCsv(CSV.replace('250,aluminum', 'hot,aluminum'), mapping)).toThrow(/Row 5, column 2 \("Melt temperature \(°C\)"\)/);
    expect(() => mapRunsCsv(CSV, { ...mapping, factors: [...mapping.factors, { column: 'Notes' }] })).toThrow(/mapped twice/);
    expect(() => mapRunsCsv(CSV, { ...mapping, factors: [{ column: 'Pressure' }] })).toThrow(/The factor column "Pressure" is not in the file/);
    expect(() => mapRunsCsv('a,b\r\n1,2,3\r\n', mapping)).toThrow(/Row 2 of the CSV file has 3 cells but the header has 2 columns/);
    const store = await freshStore();
    expect(await listStudies(store)).toEqual([]);
  });

  it('refuses a time that the backup file could not carry, naming its row and column', async () => {
    // Date.parse reads what Date.prototype.toString writes (ECMA-262), but a backup's times hold at
    // most 40 characters (trialbook-backup.schema.json), so the study could not be read back.
    const long = new Date(Date.UTC(2024, 4, 2, 12)).toString();
    const csv = ['Temperature (°C),Gloss,Time', `160,80,${long}`, '200,91,2024-05-02T14:30'].join('\r\n');
    expect(() => mapRunsCsv(csv, { title: 'Invented trial', factors: [{ column: 'Temperature (°C)' }], responses: [{ column: 'Gloss', goal: 'maximize' }], time: 'Time' })).toThrow(
      /^Row 2, column 3 \("Time"\): the time needs a date and time/,
    );
  });
  it('carries a response\'s lower bound from the mapping into the stored study, and refuses one that is not finite', async () => {
    // Shrinkage in % cannot be negative: lower bound 0 (invented trial).
    const mapped = mapRunsCsv(CSV, { ...inspectRunsCsv(CSV).suggestion, title: 'Invented molding trial', responses: [{ column: 'Shrinkage (%)', goal: 'minimize', lowerBound: 0 }] });
    expect(mapped.plan.responses).toEqual([{ name: 'Shrinkage', goal: 'minimize', unit: '%', lowerBound: 0 }]);
    expect(mapped.plan.design.runs.every((r) => r.originBlock === r.block)).toBe(true);
    const store = await freshStore();
    const { study } = await importRunsCsv(store, mapped);
    expect(study.responses[0].lowerBound).toBe(0);
    const bad = mapRunsCsv(CSV, { ...inspectRunsCsv(CSV).suggestion, title: 'Invented molding trial', responses: [{ column: 'Shrinkage (%)', goal: 'minimize', lowerBound: Number.NaN }] });
    await expect(importRunsCsv(store, bad)).rejects.toThrow(/^study\.responses\[0\]\.lowerBound: needs a finite number, got NaN$/);
    expect((await listStudies(store)).length).toBe(1);
  });
  it('the store refuses a mapped import whose runs the backup file could not carry, and writes nothing', async () => {
    const mapped = mapRunsCsv(CSV, { ...inspectRunsCsv(CSV).suggestion, title: 'Invented molding trial' });
    const long = new Date(Date.UTC(2024, 4, 2, 12)).toString(); // over the 40 characters of a backup time
    const bad = { ...mapped, runs: mapped.runs.map((r, i) => (i === 3 ? { ...r, values: { ...r.values, loggedAt: long } } : r)) };
    const store = await freshStore();
    await expect(importRunsCsv(store, bad)).rejects.toThrow(/^runs\[3\]\.loggedAt: needs a date and time/);
    expect(await listStudies(store)).toEqual([]);
    expect(await store.db.revisions.count()).toBe(0);
  });
});

describe('CSV of runs made elsewhere: names and numbers the other commands can use', () => {
  it('refuses a factor name or level with a separator at creation (checkNewFactor), naming the character', () => {
    const named = 'Temp, C;Gloss\n160;80\n200;91\n';
    const m = inspectRunsCsv(named).suggestion;
    expect(() => mapRunsCsv(named, { ...m, title: 't', factors: [{ column: 'Temp, C' }], responses: [{ column: 'Gloss', goal: 'maximize' }] })).toThrow(
      /Factor columns: The factor name "Temp, C" contains a comma/,
    );
    expect(mapRunsCsv(named, { ...m, title: 't', factors: [{ column: 'Temp, C', name: 'Temp' }], responses: [{ column: 'Gloss', goal: 'maximize' }] }).plan.factors[0].name).toBe('Temp');
    const levels = 'Mold,Gloss\nsteel:hard,80\nalu,91\n';
    expect(() => mapRunsCsv(levels, { title: 't', factors: [{ column: 'Mold' }], responses: [{ column: 'Gloss', goal: 'maximize' }] })).toThrow(/The level "steel:hard" of Mold contains a colon/);
  });
  it('reads a European export (semicolons, decimal commas) and records that it did', () => {
    const eu = CSV.replaceAll(',', ';').replace(/(\d)\.(\d)/g, '$1,$2').replace('"flash on edge; trimmed"', '"flash on edge, trimmed"');
    const ins = inspectRunsCsv(eu);
    expect(ins.messages).toEqual(['Read as a file separated by semicolons with decimal commas in the column "Shrinkage (%)"']);
    const mapped = mapRunsCsv(eu, { ...ins.suggestion, title: 'x', responses: [{ column: 'Shrinkage (%)', goal: 'minimize' }] });
    const ref = mapRunsCsv(CSV, { ...inspectRunsCsv(CSV).suggestion, title: 'x', responses: [{ column: 'Shrinkage (%)', goal: 'minimize' }] });
    expect(mapped.runs).toEqual(ref.runs);
    expect(mapped.plan.design.notes).toContain('Read as a file separated by semicolons with decimal commas in the column "Shrinkage (%)"');
  });
  it('refuses 1e400 and NaN readings with row and column', () => {
    const mapping = { ...inspectRunsCsv(CSV).suggestion, title: 'x', responses: [{ column: 'Shrinkage (%)', goal: 'minimize' as const }] };
    expect(() => mapRunsCsv(CSV.replace('1.50', '1e400'), mapping)).toThrow(/Row 5, column 5 \("Shrinkage \(%\)"\): Shrinkage: reading 1 needs a number, got "1e400"; 1e400 is beyond the largest number/);
    expect(() => mapRunsCsv(CSV.replace('1.50', 'NaN'), mapping)).toThrow(/Row 5, column 5 \("Shrinkage \(%\)"\): Shrinkage: reading 1 needs a number, got "NaN"; "NaN" is not a measurement/);
    expect(() => mapRunsCsv(CSV.replace('2,250,steel', '2,1e400,steel'), mapping)).toThrow(/Row 3, column 2 \("Melt temperature \(°C\)"\): Melt temperature needs a number, got "1e400"/);
  });
});
