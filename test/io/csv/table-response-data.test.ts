import { describe, expect, it } from 'vitest';
import { readTable } from '../../../src/io/csv/read-table.ts';
import { tableResponseData } from '../../../src/io/csv/table-response-data.ts';

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
    expect(d.notes).toEqual(['1 excluded run skipped', '1 run without a value for y skipped']);
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
