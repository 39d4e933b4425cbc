import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseReadings } from '../../../src/core/study/run-form.ts';
import { joinReadings, splitReadings } from '../../../src/core/study/reading-text.ts';

describe('splitReadings and joinReadings', () => {
  it('splits on semicolons and runs of spaces, keeping empty boxes', () => {
    expect(splitReadings('10.2;10.4')).toEqual(['10.2', '10.4']);
    expect(splitReadings('10.2  10.4')).toEqual(['10.2', '10.4']);
    expect(splitReadings('10.2;')).toEqual(['10.2', '']);
    expect(splitReadings('')).toEqual(['']);
  });
  it('join is the inverse of split for parts without separators (fast-check)', () => {
    const part = fc.array(fc.constantFrom('1', '7', '.', ',', '-'), { maxLength: 6 }).map((cs) => cs.join(''));
    fc.assert(
      fc.property(fc.array(part, { minLength: 1, maxLength: 6 }), (parts) => {
          expect(splitReadings(joinReadings(parts))).toEqual(parts);
        }),
    );
  });
  it('the boxes and the saved readings agree: parseReadings reads the non-empty parts (fast-check)', () => {
    const num = fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((x) => String(Number(x.toPrecision(6))));
    const sep = fc.constantFrom(';', ' ', '  ', ';;', '\t');
    fc.assert(
      fc.property(fc.array(fc.tuple(num, sep), { maxLength: 5 }), (items) => {
        const text = items.map(([n, s]) => n + s).join('');
        const boxes = splitReadings(text).filter((b) => b !== '');
        expect(parseReadings(text, 'y')).toEqual(boxes.map(Number));
      }),
    );
  });
});
