import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { InputError } from '../../../src/core/errors.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { RUN_COLUMNS, neutraliseCell, plannedColumn, runCells, runSheetCsv, runSheetTable, toCsv } from '../../../src/io/csv/run-sheet.ts';

const design = buildDesign({
  factors: [
    { kind: 'numeric', name: 'Temperature', unit: 'degC', low: 160, high: 200 },
    { kind: 'categorical', name: 'Powder', levels: ['=matte', 'gloss, fine'] },
    { kind: 'numeric', name: 'Time', low: -5, high: 5 },
  ],
  centerRuns: 1,
  randomize: false,
});

describe('plannedColumn', () => {
  it('puts the unit in parentheses, or leaves it out', () => {
    const [t, p] = defineFactors([
      { kind: 'numeric', name: 'Temperature', unit: 'degC', low: 1, high: 2 },
      { kind: 'categorical', name: 'Powder', levels: ['a', 'b'] },
    ]);
    expect(plannedColumn(t)).toBe('Temperature (degC) planned');
    expect(plannedColumn(p)).toBe('Powder planned');
  });
});

describe('runSheetTable and runCells', () => {
  it('has Run, Std order, Replicate, Block, Kind, then one planned column per factor', () => {
    const t = runSheetTable(design);
    expect(t.header).toEqual([...RUN_COLUMNS, 'Temperature (degC) planned', 'Powder planned', 'Time planned']);
    expect(t.rows[0]).toEqual([1, 1, 1, 1, 'factorial', 160, '=matte', -5]);
    expect(t.rows.at(-1)).toEqual([10, '', 1, 1, 'center', 180, 'gloss, fine', 0]);
  });
  it('refuses a plan without runs, and a run whose settings do not match the factors (degenerate input)', () => {
    expect(() => runSheetTable({ factors: design.factors, runs: [] })).toThrow(InputError);
    expect(() => runCells({ ...design.runs[0], coded: [1] }, design.factors)).toThrow(/1 settings for 3 factors/);
  });
});

describe('neutraliseCell', () => {
  it('prefixes text a spreadsheet would run as a formula with a single quote (OWASP, CSV Injection)', () => {
    for (const t of ['=SUM(A1)', '+1', '-2+3', '@cmd', '\tx', '\rx']) expect(neutraliseCell(t)).toBe(`'${t}`);
    expect(neutraliseCell('matte')).toBe('matte');
  });
  it('leaves numbers as numbers, negative ones too, and refuses non-finite numbers', () => {
    expect(neutraliseCell(-1.5)).toBe(-1.5);
    expect(neutraliseCell('')).toBe('');
    expect(() => neutraliseCell(Number.NaN)).toThrow(InputError);
  });
});

describe('toCsv and runSheetCsv', () => {
  it('writes RFC 4180 CSV (Shafranovich 2005): CRLF, quoted fields with commas, a final CRLF', () => {
    expect(toCsv({ header: ['Run', 'Note'], rows: [[1, 'a, b'], [2, 'say "hi"']] })).toBe('Run,Note\r\n1,"a, b"\r\n2,"say ""hi"""\r\n');
  });
  it('neutralises formula text but not negative numbers, and reads back with papaparse', () => {
    const csv = runSheetCsv(design);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe('Run,Std order,Replicate,Block,Kind,Temperature (degC) planned,Powder planned,Time planned');
    expect(lines[1]).toBe("1,1,1,1,factorial,160,'=matte,-5");
    expect(lines[2]).toBe('2,2,1,1,factorial,200,\'=matte,-5');
    const parsed = Papa.parse<string[]>(csv.trim(), { skipEmptyLines: true }).data;
    expect(parsed.length).toBe(design.runs.length + 1);
    expect(parsed.find((r) => r[1] === '4')![6]).toBe('gloss, fine');
  });
  it('refuses ragged rows and writes a header alone for no rows (degenerate input)', () => {
    expect(() => toCsv({ header: ['a', 'b'], rows: [[1]] })).toThrow(/row 1 has 1 cells for 2 columns/);
    expect(toCsv({ header: ['a'], rows: [] })).toBe('a\r\n');
  });
});

describe('toCsv numbers', () => {
  it('property: every finite number is written in the shortest form that reads back to the same value (ECMA-262 Number::toString)', async () => {
    const fc = (await import('fast-check')).default;
    const { readTable } = await import('../../../src/io/csv/read-table.ts');
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: 1, maxLength: 8 }), (xs) => {
        const text = toCsv({ header: xs.map((_, i) => `x${i}`), rows: [xs] });
        const cells = readTable(text).rows[0];
        cells.forEach((c, i) => {
          expect(Number(c) === xs[i]).toBe(true);
          expect(c).toBe(String(xs[i]));
        });
      }),
    );
    expect(toCsv({ header: ['a', 'b', 'c'], rows: [[0.1 + 0.2, 1e21, 5e-324]] })).toBe('a,b,c\r\n0.30000000000000004,1e+21,5e-324\r\n');
  });
});

describe('toCsv against papaparse', () => {
  // Reference: papaparse 5.7.1's unparse (a general-purpose CSV library, the writer toCsv replaced)
  // with the options the export used, over the same neutralised cells.
  function papaCsv(header: string[], rows: (string | number)[][]): string {
    const text = Papa.unparse(
      { fields: header.map((h) => String(neutraliseCell(h))), data: rows.map((r) => r.map(neutraliseCell)) },
      { newline: '\r\n', quotes: false, escapeFormulae: false },
    );
    return text.endsWith('\r\n') ? text : text + '\r\n';
  }
  it('property: writes the same text as papaparse, which reads it back to the same cells (fast-check)', async () => {
    const fc = (await import('fast-check')).default;
    const text = fc.string({ unit: fc.constantFrom('a', 'Z', '7', ' ', ',', '"', '\r', '\n', '\ufeff', '=', '-', "'", '\t', 'µ', '\u00a0'), maxLength: 6 });
    // Column names are never empty (an all-empty file reads back as no rows at all).
    const name = fc.string({ unit: fc.constantFrom('a', ' ', ',', '"', '\n', '='), minLength: 1, maxLength: 4 });
    const cell = fc.oneof(text, fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer());
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6 }), fc.nat(4), (width, height) =>
        fc.assert(
          fc.property(fc.array(name, { minLength: width, maxLength: width }), fc.array(fc.array(cell, { minLength: width, maxLength: width }), { minLength: height, maxLength: height }), (header, rows) => {
            const csv = toCsv({ header, rows });
            expect(csv.endsWith('\r\n') && csv.split('\r\n').length >= rows.length + 2).toBe(true);
            // A one-column row holding '' is a blank line, which readers take as no row (RFC 4180
            // leaves it open; the papaparse-based writer let a last one merge into the closing line
            // end), so the comparison and the reading back are checked from two columns on.
            if (width === 1) return;
            expect(csv).toBe(papaCsv(header, rows));
            const back = Papa.parse<string[]>(csv.slice(0, -2), { newline: '\r\n' }).data;
            expect(back).toEqual([header, ...rows].map((r) => r.map((c) => String(neutraliseCell(c)))));
          }),
          { numRuns: 20 },
        ),
      ),
      { numRuns: 25 },
    );
  });
});
