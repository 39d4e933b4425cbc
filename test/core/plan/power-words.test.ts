// References: the issue's own example sentence ("with these 20 runs and noise of about 1.5, an
// effect of 2 is found about 2 times in 3"), reproduced by a 2^4 with 4 center runs; the power
// itself is checked against jstat in power.test.ts.
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { planPower, type PlanPower } from '../../../src/core/plan/power.ts';
import { chanceInWords, powerInWords } from '../../../src/core/plan/power-words.ts';

const numeric = (k: number) => Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 0, high: 10 }));

describe('chanceInWords', () => {
  it('says a chance as the nearest simple fraction', () => {
    expect(chanceInWords(0.661)).toBe('about 2 times in 3');
    expect(chanceInWords(0.5)).toBe('about 1 time in 2');
    expect(chanceInWords(0.8)).toBe('about 4 times in 5');
    expect(chanceInWords(0.42)).toBe('about 2 times in 5');
    expect(chanceInWords(0.93)).toBe('about 9 times in 10');
    expect(chanceInWords(0.995)).toBe('almost always, more than 99 times in 100');
    expect(chanceInWords(0.004)).toBe('hardly ever, less than 1 time in 100');
    expect(chanceInWords(0.03)).toBe('less than 1 time in 10');
    expect(chanceInWords(0.966)).toBe('more than 9 times in 10');
  });

  it('refuses a number that is not a probability', () => {
    expect(() => chanceInWords(1.2)).toThrow(/probability from 0 to 1, got 1.2/);
    expect(() => chanceInWords(NaN)).toThrow(InputError);
  });
});

describe('powerInWords', () => {
  it('reads a 2^4 with 4 center runs as the example sentence', () => {
    const d = buildDesign({ factors: numeric(4), centerRuns: 4, seed: 1 });
    const p = planPower(d, { effect: 2, sigma: 1.5 });
    const text = powerInWords(p);
    expect(text).toMatch(/^With these 20 runs and noise of about 1\.5, an effect of 2 is found about 2 times in 3 \(power 0\.66\d? at significance 0\.05\)\./);
    expect(text).toMatch(/An effect of \d\.\d+ or more is found with the target power 0\.8\./);
    expect(text).toMatch(/2 replicates of the plan \(40 runs\) find an effect of 2 with power 0\.8 or more\./);
  });

  it('says no test is possible without residual degrees of freedom, and names Lenth\'s method', () => {
    const d = buildDesign({ factors: numeric(4), fraction: '1/2', seed: 1 });
    const text = powerInWords(planPower(d, { effect: 2, sigma: 1.5 }));
    expect(text).toMatch(/no residual degrees of freedom, so no t test of an effect is possible: add replicates or center runs, or judge the effects by Lenth's method/);
    expect(text).not.toMatch(/is found about|at significance/);
  });

  it('says when the plan already reaches the target, and when the run limit does not', () => {
    const big = buildDesign({ factors: numeric(3), replicates: 4, seed: 1 });
    expect(powerInWords(planPower(big, { effect: 20, sigma: 1 }))).toMatch(/1 replicate \(8 runs\) would already reach the target power/);
    const p: PlanPower = planPower(big, { effect: 0.01, sigma: 5 });
    expect(powerInWords(p)).toMatch(/No number of replicates within the 1024-run limit/);
  });
});
