import { describe, expect, it } from 'vitest';
import { bareColumnName, columnUnit, readTable, rowNumber, uniformLineEnds, uniqueColumn } from '../../../src/io/csv/read-table.ts';

describe('readTable', () => {
  it('reads RFC 4180 quoting: commas, quotes and line breaks inside quoted cells (RFC 4180, section 2, rules 5-7)', () => {
    const t = readTable('name,note\n"a, b","say ""hi"""\n"two\nlines",x\n');
    expect(t.rows).toEqual([
      ['a, b', 'say "hi"'],
      ['two\nlines', 'x'],
    ]);
  });
  it('drops a byte-order mark and blank lines, but keeps the file row numbers for messages', () => {
    const t = readTable('\uFEFFa,b\n\n1,2\n\n3,4\n');
    expect(t.header).toEqual(['a', 'b']);
    expect(t.rows).toEqual([
      ['1', '2'],
      ['3', '4'],
    ]);
    expect([rowNumber(t, 0), rowNumber(t, 1)]).toEqual([3, 5]);
    expect(() => readTable('a,b\n\n1,2\n\n3\n')).toThrow(/Row 5 of the CSV file has 1 cells but the header has 2 columns/);
  });
  it('refuses an empty file and duplicate column names', () => {
    expect(() => readTable('')).toThrow(/empty/);
    expect(() => readTable('\n\n')).toThrow(/empty/);
    expect(() => readTable('A,b,a\n1,2,3\n')).toThrow(/names "a" twice \(columns 1 and 3\)/);
  });
  it('column names without their units', () => {
    expect(bareColumnName('Temperature (degC)')).toBe('temperature');
    expect(bareColumnName('Temperature (degC) actual')).toBe('temperature actual');
    expect(columnUnit('Temperature (degC)')).toBe('degC');
    expect(columnUnit('Temperature')).toBeUndefined();
  });
});

describe('readTable: files from other programs and locales', () => {
  it('reads mixed CRLF, LF and CR line ends as one file, keeping line breaks inside quoted cells', () => {
    const t = readTable('a,b\r\n1,2\n3,4\r5,"x\r\ny"\r\n6,"p\nq"\n');
    expect(t.rows).toEqual([
      ['1', '2'],
      ['3', '4'],
      ['5', 'x\r\ny'],
      ['6', 'p\nq'],
    ]);
    expect(t.rowNumbers).toEqual([2, 3, 4, 5]); // rows are records: a quoted line break stays inside its row
    expect(uniformLineEnds('a,"b\r\nc"\r\nd\re', ',')).toBe('a,"b\r\nc"\nd\ne');
    expect(uniformLineEnds('a,b', ',')).toBe('a,b');
  });
  it('finds the separator and says it: comma, semicolon, tab', () => {
    expect(readTable('a,b\n1,2\n').delimiter).toBe(',');
    expect(readTable('a;b\n1;2\n').delimiter).toBe(';');
    expect(readTable('a\tb\n1\t2\n').delimiter).toBe('\t');
  });
  it('reads decimal commas in a ; or tab file, column by column, and notes which columns', () => {
    const t = readTable('Temperatur (°C);Glanz;Messwerte;Notiz\n160;82,5;82,1 82,9;a,b\n200;91;-1,5e2 ,5;3,5\n');
    expect(t.rows).toEqual([
      ['160', '82.5', '82.1 82.9', 'a,b'],
      ['200', '91', '-1.5e2 .5', '3,5'],
    ]);
    expect(t.messages).toEqual(['Read as a file separated by semicolons with decimal commas in the columns "Glanz", "Messwerte"']);
    const tab = readTable('x\ty\n1,5\t2\n');
    expect(tab.rows).toEqual([['1.5', '2']]);
    // A column mixing decimal commas and points (perhaps thousands points) is left as it is.
    expect(readTable('x;y\n1,5;1\n1.234,5;2\n').rows[1][0]).toBe('1.234,5');
    expect(readTable('x,y\n"1,5",2\n').rows[0][0]).toBe('1,5');
    expect(readTable('x,y\n"1,5",2\n').messages).toEqual([]);
  });
  it('suggests a semicolon when decimal commas split a comma-separated row', () => {
    expect(() => readTable('Temp,Gloss\n160,82,5\n')).toThrow(/Row 2 of the CSV file has 3 cells but the header has 2 columns; if its numbers have decimal commas, save the file with ";"/);
  });
  it('removes the formula guard of its own export (OWASP CSV Injection quote), and only that', () => {
    const t = readTable("'=Name,'-x\n'+1,'hello\n'''=x,'\u00a0=y\n");
    expect(t.header).toEqual(['=Name', '-x']);
    expect(t.rows).toEqual([
      ['+1', "'hello"],
      ["''=x", '\u00a0=y'],
    ]);
  });
});

describe('uniqueColumn', () => {
  it('refuses a name that matches two columns, listing both (degenerate: none matches -> -1)', () => {
    const t = readTable('Temp (C),Temp (F),y\n1,2,3\n');
    expect(() => uniqueColumn(t, 'Temp', 'factor column', (h) => bareColumnName(h) === 'temp')).toThrow(
      'The factor column "Temp" matches 2 columns: "Temp (C)" (column 1) and "Temp (F)" (column 2); name the column in full, unit included',
    );
    expect(uniqueColumn(t, 'y', 'response', (h) => h === 'y')).toBe(2);
    expect(uniqueColumn(t, 'z', 'response', (h) => h === 'z')).toBe(-1);
  });
});

describe('bareColumnName and Unicode', () => {
  it('matches a name typed with a combining accent to the composed one (Unicode Standard Annex #15, form C)', () => {
    expect(bareColumnName('Tempe\u0301rature (°C)')).toBe('temp\u00e9rature');
  });
});

describe('readTable: property over mixed line ends', () => {
  it('rows written with CRLF, LF or CR each (papaparse quoting) read back cell for cell', async () => {
    const fc = (await import('fast-check')).default;
    const Papa = (await import('papaparse')).default;
    const cell = fc.string({ unit: fc.constantFrom('a', '1', ' ', ',', '"', '\n', '\r\n', ';', 'é'), maxLength: 5 });
    fc.assert(
      fc.property(fc.array(fc.tuple(cell, cell, fc.constantFrom('\r\n', '\n', '\r')), { minLength: 1, maxLength: 6 }), fc.boolean(), (rows, quotes) => {
        const line = (cells: string[]) => Papa.unparse([cells], { quotes });
        const text = 'h1,h2\r\n' + rows.map(([a, b, end]) => line([a, b]) + end).join('');
        expect(readTable(text).rows).toEqual(rows.map(([a, b]) => [a, b]).filter((r) => !r.every((c) => c.trim() === '')));
      }),
    );
  });
});
