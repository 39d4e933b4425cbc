import { describe, expect, it } from 'vitest';
import { analysisJson } from '../../../src/cli/report/analysis-json.ts';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

describe('analysisJson', () => {
  it('carries the typed verdicts beside the warnings, as plain data that survives JSON (Montgomery 8th ed., section 6.8 example)', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const out = JSON.parse(JSON.stringify(analysisJson(analyze(d))));
    expect(out.verdicts[0]).toMatchObject({ kind: 'curvature', outcome: 'flat', nCenter: 5, reason: null });
    expect(out.verdicts[0].p).toBeCloseTo(0.8137, 4); // printed P-value of the pure quadratic term (from memory; agrees with jstat, see test/core/fit/analyze.test.ts)
    expect(Array.isArray(out.warnings)).toBe(true);
  });
  it('degenerate input: no verdicts gives an empty list, not a missing key', () => {
    const d = fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration', 'Catalyst'], response: 'Yield' });
    expect(analysisJson(analyze(d)).verdicts).toEqual([]);
  });
});
