import { describe, expect, it } from 'vitest';
import { bareColumnName, columnUnit, readTable, rowNumber } from '../../../src/io/csv/read-table.ts';

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
