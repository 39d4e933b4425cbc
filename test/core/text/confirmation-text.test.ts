import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { compareConfirmation } from '../../../src/core/predict/confirm-runs.ts';
import { parseSettings } from '../../../src/core/predict/parse-settings.ts';
import { confirmationProgress, confirmationScale, confirmationSetLine, confirmationSetPlace, confirmationStatement, confirmationToken, confirmationVerdict } from '../../../src/core/text/confirmation-text.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

// Montgomery, Design and Analysis of Experiments, 8th ed., section 6.8 data (2^2 + 5 center runs).
const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const model = analyze(data, { terms: [1, 2] }).model;
const at = parseSettings(model.factors, { Time: 40, Temperature: 160 });

describe('confirmationStatement', () => {
  it('says "Confirmed" with the mean and the interval when the mean lies inside', () => {
    const s = confirmationStatement(compareConfirmation(model, at, [41.2, 41.8, 41.6])); // invented readings
    expect(s).toMatch(/^Confirmed: the mean of the 3 confirmation runs, 41\.53, lies inside the 95% interval for the mean of 3 new runs, 41\.1\d to 41\.9\d \(predicted 41\.54\)\.$/);
  });
  it('says "Not confirmed" and what to do when it lies outside; one run is "one new run"', () => {
    const s = confirmationStatement(compareConfirmation(model, at, [43])); // invented reading
    expect(s).toMatch(/^Not confirmed: the reading of the 1 confirmation run, 43, lies outside the 95% interval for one new run/);
    expect(s).toMatch(/do not rely on its predictions here/);
  });
  it('a saturated model: cannot judge, and says what to do', () => {
    const sat = analyze({ ...data, coded: data.coded.slice(0, 4), y: data.y.slice(0, 4), labels: data.labels.slice(0, 4), points: null }, { terms: [1, 2, 3] }).model;
    expect(confirmationStatement(compareConfirmation(sat, at, [41]))).toMatch(/^Cannot judge: .*Refit with fewer terms first\.$/);
  });
});

describe('confirmation set lines (for reports and files)', () => {
  const factors = [
    { kind: 'numeric', name: 'Time', letter: 'A', low: 30, high: 40, unit: 'min' },
    { kind: 'numeric', name: 'Temperature', letter: 'B', low: 150, high: 160 },
  ] as const;
  const set = { block: 2, runs: [10, 11, 12], coded: [1, 1], values: [] };
  it('say where, and that none is logged yet', () => {
    expect(confirmationSetLine({ set, comparison: null, problem: null }, factors)).toBe(
      'Confirmation runs 10 to 12 (block 2) at Time 40 min, Temperature 160: None logged yet with a value for this response; log them to see the verdict.',
    );
    expect(confirmationToken({ set, comparison: null, problem: null })).toBe('not-logged');
    expect(confirmationToken({ set, comparison: null, problem: 'x' })).toBe('cannot-judge');
    expect(confirmationSetPlace({ set: { ...set, runs: [7] }, comparison: null, problem: null }, factors)).toMatch(/^Confirmation run 7 \(block 2\)/);
  });
  it('the verdict is the line after its place, for a judged set and for a problem', () => {
    const judged = { set: { ...set, values: [41.2, 41.8, 41.6] }, comparison: compareConfirmation(model, at, [41.2, 41.8, 41.6]), problem: null }; // invented readings
    expect(confirmationSetLine(judged, factors)).toBe(`${confirmationSetPlace(judged, factors)}: ${confirmationVerdict(judged)}`);
    expect(confirmationVerdict(judged)).toMatch(/^Confirmed: /);
    expect(confirmationVerdict({ set, comparison: null, problem: 'The log transform needs readings above 0.' })).toBe('Cannot judge: The log transform needs readings above 0.');
  });
  it('progress: how many of the planned runs have a value, null once all have', () => {
    expect(confirmationProgress({ set: { ...set, values: [41.2, 41.8] }, comparison: null, problem: null })).toBe('2 of 3 confirmation runs logged with a value for this response.');
    expect(confirmationProgress({ set: { ...set, runs: [7, 8], values: [5] }, comparison: null, problem: null })).toBe('1 of 2 confirmation runs logged with a value for this response.');
    // None logged: the verdict says so, the count would only repeat it.
    expect(confirmationProgress({ set, comparison: null, problem: null })).toBeNull();
    expect(confirmationProgress({ set: { ...set, values: [1, 2, 3] }, comparison: null, problem: null })).toBeNull();
  });
});

describe('confirmationScale', () => {
  // The scales of core/fit/response-transform.ts: ln(y - L) for lambda 0, ((y - L)^lambda - 1) / lambda otherwise.
  it('names the formula of the scale the figures are on', () => {
    expect(confirmationScale({ token: 'log', lambda: 0, lowerBound: null }, 'Gloss')).toBe('The figures are on the scale the model is fitted on, ln(Gloss), not in Gloss itself.');
    expect(confirmationScale({ token: 'sqrt', lambda: 0.5, lowerBound: 10 }, 'Gloss')).toBe('The figures are on the scale the model is fitted on, ((Gloss − 10)^0.5 − 1) / 0.5, not in Gloss itself.');
  });
  it('says nothing for a model of the response as measured (degenerate: no transform)', () => {
    expect(confirmationScale(undefined, 'Gloss')).toBeNull();
    expect(confirmationScale({ token: 'none', lambda: 1, lowerBound: null }, 'Gloss')).toBeNull();
  });
});
