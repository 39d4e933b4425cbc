// Reference: the 12-run design's largest partial-aliasing correlation, 1/3 (Lin and Draper 1992,
// Technometrics 34, 423-428, from memory; recomputed from the columns in plackett-burman.test.ts).
import { describe, expect, it } from 'vitest';
import { correlationText, plackettBurmanSummary } from '../../../src/core/text/screening-text.ts';

describe('plackettBurmanSummary', () => {
  it('says main effects are clear of each other but partly mixed with interactions', () => {
    expect(plackettBurmanSummary({ factorialRuns: 12, factors: 7, totalRuns: 12, centerRuns: 0, replicates: 1, largestCorrelation: 1 / 3, seed: 7 })).toBe(
      '12 runs, a Plackett-Burman screening design for 7 factors: main effects are estimated clear of each other but partly mixed with two-factor interactions (correlations up to 1/3); 4 columns are left unused and help judge the effects. Run order randomized (seed 7).',
    );
    expect(plackettBurmanSummary({ factorialRuns: 12, factors: 2, totalRuns: 15, centerRuns: 3, replicates: 1, largestCorrelation: null, seed: null })).toBe(
      '15 runs (12 factorial + 3 center), a Plackett-Burman screening design for 2 factors: main effects are estimated clear of each other but partly mixed with two-factor interactions; 9 columns are left unused and help judge the effects. Standard order kept.',
    );
  });

  it('refuses more factors than columns, and no runs', () => {
    expect(() => plackettBurmanSummary({ factorialRuns: 12, factors: 12, totalRuns: 12, centerRuns: 0, replicates: 1, largestCorrelation: 0.3, seed: 1 })).toThrow(/takes up to 11 factors, got 12/);
    expect(() => plackettBurmanSummary({ factorialRuns: 12, factors: 3, totalRuns: 0, centerRuns: 0, replicates: 1, largestCorrelation: 0.3, seed: 1 })).toThrow(/at least one run, got 0/);
  });
});

describe('correlationText', () => {
  it('writes simple fractions as fractions', () => {
    expect(correlationText(1 / 3)).toBe('1/3');
    expect(correlationText(-0.2)).toBe('-1/5');
    expect(correlationText(0.6)).toBe('3/5');
    expect(correlationText(-1)).toBe('-1');
    expect(correlationText(0.123)).toBe('0.12');
  });
});
