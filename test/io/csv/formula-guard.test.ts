import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import Papa from 'papaparse';
import { guardCell, needsFormulaGuard, unguardCell } from '../../../src/io/csv/formula-guard.ts';
import { toCsv } from '../../../src/io/csv/run-sheet.ts';
import { readTable } from '../../../src/io/csv/read-table.ts';

// OWASP "CSV Injection": =, +, -, @, tab and carriage return start a formula; spreadsheets trim
// spaces (Unicode Zs, e.g. U+00A0, U+3000) and zero-width characters (U+200B, U+FEFF) first, and
// read the full-width signs U+FF1D and U+FF0B as = and +.
const FORMULAS = ['=1+1', '+1', '-2+3', '@SUM(A1)', '\tx', '\rx', ' =1+1', '   +cmd', '\u00a0=1', '\u200b=1', '\ufeff@x', '\u3000-1', '\uff1d1+1', '\uff0bcmd', ' \u200b \uff20x', '\n=1'];
const PLAIN = ['matte', '1 + 1', 'a=b', "'hello", '', ' ', 'x-1', '\u00a0plain', '∑ total'];

describe('needsFormulaGuard and guardCell', () => {
  it('guards every formula start, also after trimmed characters and in full width', () => {
    for (const t of FORMULAS) {
      expect(needsFormulaGuard(t)).toBe(true);
      expect(guardCell(t)).toBe(`'${t}`);
    }
    for (const t of PLAIN) expect(guardCell(t)).toBe(t);
  });
  it('guards a text that already starts with a quote before a formula, so reading back is exact', () => {
    expect(guardCell("'=x")).toBe("''=x");
    expect(unguardCell("''=x")).toBe("'=x");
    expect(unguardCell("'hello")).toBe("'hello");
    expect(unguardCell("'")).toBe("'");
  });
  it('property: unguardCell(guardCell(t)) === t for any text', () => {
    const unit = fc.constantFrom("'", '=', '+', '-', '@', ' ', '\t', '\u00a0', '\u200b', '\uff1d', 'a', '1');
    fc.assert(fc.property(fc.string({ unit, maxLength: 8 }), (t) => unguardCell(guardCell(t)) === t));
    fc.assert(fc.property(fc.string({ unit: 'binary' }), (t) => unguardCell(guardCell(t)) === t));
  });
  it('property: the export never holds a cell a spreadsheet would run, and Trialbook reads every cell back as it was', () => {
    const unit = fc.constantFrom("'", '=', '+', '-', '@', ' ', '\t', '\u00a0', '\u200b', '\uff1d', 'a', '1', ',', '"', '\n');
    fc.assert(
      fc.property(fc.array(fc.string({ unit, maxLength: 6 }), { minLength: 1, maxLength: 4 }), (cells) => {
        const text = toCsv({ header: cells.map((_, i) => `c${i}`), rows: [cells] });
        const raw = Papa.parse<string[]>(text, { newline: '\r\n', delimiter: ',' }).data[1];
        for (const cell of raw) expect(needsFormulaGuard(cell) && !cell.startsWith("'")).toBe(false);
        if (cells.every((c) => c.trim() === '')) return; // a blank row is skipped on reading
        expect(readTable(text).rows[0]).toEqual(cells);
      }),
    );
  });
});
