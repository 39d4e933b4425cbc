import { describe, expect, it } from 'vitest';
import { readTable } from '../../../src/io/csv/read-table.ts';
import { inferredLevels, tableResponseData } from '../../../src/io/csv/table-response-data.ts';

// Invented rows, for the column rules only.
describe('tableResponseData', () => {
  it('prefers actual settings, then the bare name, then a run sheet\'s planned column', () => {
    const sheet = readTable('Run,Temperature (degC) planned,Temperature (degC) actual,y\n1,160,161,5\n2,200,199,7\n');
    expect(tableResponseData(sheet, { factors: ['Temperature'], response: 'y' }).factors[0]).toMatchObject({ low: 161, high: 199, unit: 'degC' });
    const planned = readTable('Run,Temperature (degC) planned,y\n1,160,5\n2,200,7\n');
    expect(tableResponseData(planned, { factors: ['Temperature'], response: 'y' }).factors[0]).toMatchObject({ low: 160, high: 200 });
  });
  it('skips runs without a response and excluded runs, and says so', () => {
    const t = readTable('A,y,Excluded\n1,5,no\n2,,no\n1,6,yes\n2,8,no\n');
    const d = tableResponseData(t, { factors: ['A'], response: 'y' });
    expect(d.y).toEqual([5, 8]);
    expect(d.messages).toEqual(['1 excluded run skipped', '1 run without a value for y skipped']);
  });
  it('codes a categorical column by its first label in file order, or by --levels', () => {
    const t = readTable('Powder,y\ngloss,5\nmatte,7\n');
    expect(tableResponseData(t, { factors: ['Powder'], response: 'y' }).coded).toEqual([[-1], [1]]);
    expect(tableResponseData(t, { factors: ['Powder'], response: 'y', levels: { Powder: ['matte', 'gloss'] } }).coded).toEqual([[1], [-1]]);
  });
  it('names row and column for a value it cannot read', () => {
    const t = readTable('A,y\n1,5\n\n2,seven\n');
    expect(() => tableResponseData(t, { factors: ['A'], response: 'y' })).toThrow('Row 4, column "y": y needs a number, got "seven"');
    const three = readTable('Powder,y\na,1\nb,2\nc,3\n');
    expect(() => tableResponseData(three, { factors: ['Powder'], response: 'y' })).toThrow(/exactly two level labels, got 3 labels/);
    expect(() => tableResponseData(t, { factors: ['B'], response: 'y' })).toThrow(/"B" is not in the file/);
  });
});

describe('tableResponseData: hand-edited and foreign files', () => {
  it('refuses a factor name that matches two columns, listing both, and takes the column named in full', () => {
    const t = readTable('Temp (C),Temp (F),y\n160,320,5\n200,392,7\n');
    expect(() => tableResponseData(t, { factors: ['Temp'], response: 'y' })).toThrow(
      'The factor column "Temp" matches 2 columns: "Temp (C)" (column 1) and "Temp (F)" (column 2); name the column in full, unit included',
    );
    expect(tableResponseData(t, { factors: ['Temp (F)'], response: 'y' }).factors[0]).toMatchObject({ low: 320, high: 392, unit: 'F' });
  });
  it('refuses NaN, Infinity and 1e400 at reading, naming row and column and what to do', () => {
    const bad = (cell: string, where: 'A' | 'y') =>
      readTable(where === 'A' ? `A,y\n1,5\n${cell},6\n1,7\n` : `A,y\n1,5\n2,${cell}\n1,7\n`);
    expect(() => tableResponseData(bad('1e400', 'A'), { factors: ['A'], response: 'y' })).toThrow(
      'Row 3, column "A": A needs a number, got "1e400"; 1e400 is beyond the largest number a calculation can carry (about 1.8e308): give it in a larger unit',
    );
    expect(() => tableResponseData(bad('Infinity', 'A'), { factors: ['A'], response: 'y' })).toThrow(/Row 3, column "A": A needs a number, got "Infinity"; "Infinity" is not a measurement/);
    expect(() => tableResponseData(bad('NaN', 'y'), { factors: ['A'], response: 'y' })).toThrow(/Row 3, column "y": y needs a number, got "NaN"; "NaN" is not a measurement \(in a file, leave the cell empty/);
    expect(() => tableResponseData(bad('-1e999', 'y'), { factors: ['A'], response: 'y' })).toThrow(/Row 3, column "y": y needs a number, got "-1e999"; -1e999 is beyond/);
  });
  it('suggests the separator for decimal commas in a comma file, and notes them in a semicolon file', () => {
    const comma = readTable('A,y\n1,"5,5"\n2,6\n');
    expect(() => tableResponseData(comma, { factors: ['A'], response: 'y' })).toThrow(/got "5,5"; a decimal comma is read only in a file separated by semicolons or tabs/);
    const semi = readTable('A;y\n1,5;5,5\n2,5;6\n');
    const d = tableResponseData(semi, { factors: ['A'], response: 'y' });
    expect(d.y).toEqual([5.5, 6]);
    expect(d.factors[0]).toMatchObject({ low: 1.5, high: 2.5 });
    expect(d.messages).toEqual(['Read as a file separated by semicolons with decimal commas in the columns "A", "y"']);
  });
});

describe('tableResponseData: numbers the analysis cannot carry', () => {
  it('refuses a response above MAX_RESPONSE_MAGNITUDE at reading, with row and column (an interval a few times it would overflow binary64, largest 1.8e308)', () => {
    const t = readTable('A,y\n1,5\n2,1e305\n');
    expect(() => tableResponseData(t, { factors: ['A'], response: 'y' })).toThrow(
      'Row 3, column "y": y is 1e+305, beyond what the analysis can carry (magnitudes up to 1e+300, so that effects, intervals and predictions, which reach a few times the largest reading, stay within the range of a number): give the response in a larger unit',
    );
    expect(tableResponseData(readTable('A,y\n1,5\n2,-1e300\n'), { factors: ['A'], response: 'y' }).y).toEqual([5, -1e300]);
    // 1e200 was refused while the fit squared the response as it came; the fit now scales it first (fit/response-scale.ts).
    expect(tableResponseData(readTable('A,y\n1,5e199\n2,1e200\n'), { factors: ['A'], response: 'y' }).y).toEqual([5e199, 1e200]);
  });
});

describe('inferredLevels (most frequent value below and above the mid-range)', () => {
  it('one off-target extreme does not rescale the runs: 89 among 90s keeps 90 as high (common practice)', () => {
    expect(inferredLevels([70, 89, 70, 90, 70, 90, 70, 90, 80, 80])).toEqual([70, 90]);
  });
  it('ties go to the more extreme value', () => {
    expect(inferredLevels([1, 2, 5, 6])).toEqual([1, 6]);
  });
  it('degenerate input: one value gives it twice (defineFactors then refuses the factor)', () => {
    expect(inferredLevels([3, 3])).toEqual([3, 3]);
  });
});
