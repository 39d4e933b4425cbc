import { describe, expect, it } from 'vitest';
import { exactNominal, nominalSettings } from '../../../src/core/fit/nominal-settings.ts';

describe('nominalSettings', () => {
  it('without a plan, a setting within 0.1 coded of -1, 0 or +1 counts as that level; others stand for themselves', () => {
    // 0.1 coded is the project's center tolerance (tolerance.ts, CENTER_TOLERANCE)
    const n = nominalSettings([[0.98, -1], [0.5, 1], [0.05, -0.93], [1.2, 1]]);
    expect(n.nominal).toEqual([[1, -1], [0.5, 1], [0, -1], [1.2, 1]]);
    expect(n.moved).toBe(3);
    expect(n.away).toBe(1); // 0.5 is off every level; 1.2 lies beyond the range (an axial point)
    expect(n.exact).toBe(false);
  });
  it('with a plan, the planned value when the actual is within 0.1 of it, else the actual (a different point)', () => {
    const n = nominalSettings([[0.8, 1], [0.95, -1], [0.3, 0]], [[1, 1], [1, -1], null]);
    expect(n.nominal).toEqual([[0.8, 1], [1, -1], [0.3, 0]]);
    expect(n.moved).toBe(1);
  });
  it('degenerate input: no runs give an exact empty plan; settings exactly on their levels are exact', () => {
    expect(nominalSettings([])).toEqual({ nominal: [], moved: 0, away: 0, exact: true });
    expect(nominalSettings([[1, -1, 0]]).exact).toBe(true);
  });
});

describe('exactNominal: settings all exactly at -1, 0 or +1 without a plan are their own plan', () => {
  it('equals nominalSettings on such runs, and hands the settings on without a copy', () => {
    const coded = [[1, -1, 0], [-1, -1, 1], [0, 0, 0]];
    expect(exactNominal(coded)).toEqual(nominalSettings(coded));
    expect(nominalSettings(coded).nominal).toBe(coded);
    expect(exactNominal(coded).nominal).toBe(coded);
  });
});
