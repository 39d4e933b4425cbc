import { describe, expect, it } from 'vitest';
import { chooseFit } from '../../../src/core/fit/choose-fit.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const yieldData = fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration', 'Catalyst'], response: 'Yield' });

describe('chooseFit', () => {
  it("a complete balanced 2^2 (Montgomery 8th ed., section 6.2) takes Yates' algorithm with the default terms A, B, AB", () => {
    const c = chooseFit(yieldData);
    expect(c.fit.method).toBe('yates');
    expect(c.terms).toEqual([1, 2, 3]);
    expect(c.blocks).toBeNull();
    expect(c.cells).not.toBeNull();
    expect(2 * c.fit.coef[1]).toBeCloseTo(25 / 3, 10); // printed A = 8.33
  });
  it('blocks, off-target settings or forceQr take the QR path; terms are de-duplicated and put in model order', () => {
    expect(chooseFit(yieldData, { forceQr: true }).fit.method).toBe('qr');
    const blocked = chooseFit({ ...yieldData, blocks: yieldData.y.map((_, i) => (i % 3) + 1) });
    expect(blocked.fit.method).toBe('qr');
    expect(blocked.blockLevels).toEqual([1, 2, 3]);
    expect(blocked.fit.columns.filter((c) => c.kind === 'block')).toHaveLength(2);
    const off = chooseFit({ ...yieldData, coded: yieldData.coded.map((r, i) => (i === 0 ? [r[0] * 0.98, r[1]] : r)) });
    expect(off.fit.method).toBe('qr');
    expect(chooseFit(yieldData, { terms: [3, 1, 1, 2] }).terms).toEqual([1, 2, 3]);
  });
  it('degenerate input: one block counts as unblocked; a term naming a missing factor is refused', () => {
    const one = chooseFit({ ...yieldData, blocks: yieldData.y.map(() => 1) });
    expect(one.blocks).toBeNull();
    expect(one.fit.method).toBe('yates');
    expect(() => chooseFit(yieldData, { terms: [4] })).toThrow('Model term 4 refers to a factor the study does not have');
    expect(() => chooseFit(yieldData, { terms: [0] })).toThrow(/must be a product of factors/);
  });
});
