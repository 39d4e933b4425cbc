/** Picking a study by --study: ids, exact titles, then a unique part of a title. Titles are INVENTED. */
import { describe, expect, it } from 'vitest';
import { selectStudy } from '../../../src/io/backup/select-study.ts';
import type { StudyRecord } from '../../../src/core/study/study.ts';

function backupOf(...titles: string[]) {
  const studies = titles.map((title, i) => ({ id: `id-${i + 1}`, title, createdAt: `2024-05-0${i + 1}T10:00:00.000Z` }) as unknown as StudyRecord);
  return { payload: { studies, revisions: [] } };
}

describe('selectStudy', () => {
  const b = backupOf('Oven trial May', 'Oven trial June', 'Oven trial', 'Café line');

  it('an id wins, then an exact title, even when it is also part of other titles', () => {
    expect(selectStudy(b, 'id-2').title).toBe('Oven trial June');
    expect(selectStudy(b, ' Oven trial ').id).toBe('id-3');
    expect(selectStudy(b, 'oven TRIAL').id).toBe('id-3'); // the whole title, ignoring case
  });

  it('otherwise a case-insensitive part of one title', () => {
    expect(selectStudy(b, 'june').id).toBe('id-2');
    expect(selectStudy(b, 'MAY').id).toBe('id-1');
  });

  it('two titles that contain the part are refused with both listed, and nothing is picked', () => {
    expect(() => selectStudy(b, 'trial m')).not.toThrow();
    expect(() => selectStudy(backupOf('Oven trial May', 'Oven trial June'), 'oven')).toThrow(
      'The name "oven" matches 2 studies; give one of their ids instead: id-1 ("Oven trial May", made 2024-05-01T10:00:00.000Z), id-2 ("Oven trial June", made 2024-05-02T10:00:00.000Z) (the name is part of the title of each)',
    );
  });

  it('compares in Unicode form C: a decomposed "é" finds the composed title, and the reverse', () => {
    expect(selectStudy(b, 'Cafe\u0301').id).toBe('id-4');
    expect(selectStudy(backupOf('Cafe\u0301 line'), 'café').id).toBe('id-1');
  });

  it('degenerate input: no match lists the studies; a blank name is no part of every title', () => {
    expect(() => selectStudy(b, 'press')).toThrow('The backup has no study with the id or name "press", or with a title that contains it; it holds "Oven trial May" (id-1)');
    expect(() => selectStudy(b, '  ')).toThrow(/no study with the id or name/);
    expect(() => selectStudy(backupOf(), 'x')).toThrow('it holds no studies');
  });
});
