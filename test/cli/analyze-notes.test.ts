import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { quadraticNotSupported } from '../../src/core/text/second-order-text.ts';
import { fixturePath } from '../helpers/fixtures.ts';

// Montgomery, Design and Analysis of Experiments, 8th ed., section 6.2: the 2^2 yield example, n = 3.
const yieldFile = fixturePath('montgomery-8e-ex6-1-yield-2x2.csv');
const YIELD = [yieldFile, '--factors', 'Concentration,Catalyst', '--response', 'Yield'];
// Montgomery 8th ed., section 6.8: a 2^2 with five center runs (cannot estimate two squares).
const centers = fixturePath('montgomery-8e-ex6-6-center-points.csv');
const CENTERS = [centers, '--factors', 'Time,Temperature', '--response', 'Yield'];

/**
 * The Box-Cox profile log-likelihood -(n/2) log(SSE/n) of the geometric-mean-scaled transform of
 * y (Box and Cox 1964, JRSS B 26, 211-252), its SSE from ml-regression-multivariate-linear 2.0.4
 * on the columns A, B, AB, on a grid of step 0.001: the reference lambda-hat.
 */
function gridLambda(x: number[][], y: number[]): number {
  const n = y.length;
  const g = Math.exp(y.reduce((s, v) => s + Math.log(v), 0) / n);
  let best = { lambda: 0, ll: -Infinity };
  for (let i = -3000; i <= 3000; i++) {
    const l = i / 1000;
    const z = y.map((v) => (Math.abs(l) < 1e-12 ? g * Math.log(v) : (v ** l - 1) / (l * g ** (l - 1))));
    const fit = new MLR(x, z.map((v) => [v]), { intercept: true });
    const sse = z.reduce((s, v, k) => s + (v - fit.predict(x[k])[0]) ** 2, 0);
    const ll = (-n / 2) * Math.log(sse / n);
    if (ll > best.ll) best = { lambda: l, ll };
  }
  return best.lambda;
}

describe('analyze --lower-bound', () => {
  it('Box-Cox is of the response minus its bound, matching a direct grid of the profile likelihood; the JSON says the bound', async () => {
    const out = JSON.parse(await analyze.run([...YIELD, '--lower-bound', 'Yield=15', '--json']));
    expect(out.lowerBound).toBe(15);
    const ys = [28, 25, 27, 36, 32, 32, 18, 19, 23, 31, 30, 29]; // the printed yields (section 6.2)
    const x = ys.map((_, i) => {
      const a = i % 6 < 3 ? -1 : 1;
      const b = i < 6 ? -1 : 1;
      return [a, b, a * b];
    });
    expect(out.boxCox.lambda).toBeCloseTo(gridLambda(x, ys.map((v) => v - 15)), 2);
    const plain = JSON.parse(await analyze.run([...YIELD, '--json']));
    expect(plain.lowerBound).toBeNull();
    expect(plain.boxCox.lambda).toBeCloseTo(gridLambda(x, ys), 2);
    expect(out.boxCox.lambda).not.toBeCloseTo(plain.boxCox.lambda, 2);
  }, 60_000);

  it('the report gives the bound note, in the command line\'s words', async () => {
    const text = await analyze.run([...YIELD, '--lower-bound', 'Yield=0']);
    expect(text).toContain('Yield cannot be negative: --transform log, sqrt and inverse keep every prediction above 0');
    expect(await analyze.run(YIELD)).not.toMatch(/cannot be negative/);
  });

  it('bad input: plain messages saying what to give', async () => {
    await expect(analyze.run([...YIELD, '--lower-bound', 'Gloss=0'])).rejects.toThrow('--lower-bound names "Gloss", but the response analyzed is "Yield": give --lower-bound Yield=VALUE');
    await expect(analyze.run([...YIELD, '--lower-bound', 'Yield=low'])).rejects.toThrow('the lowest value of Yield needs a number (0 for "cannot be negative"), got "low"');
    await expect(analyze.run([...YIELD, '--lower-bound', 'Yield'])).rejects.toThrow(/expected NAME=VALUE/);
    await expect(analyze.run([...YIELD, '--lower-bound', 'Yield=0,Yield=1'])).rejects.toThrow(/give one response and its lowest value/);
    // 18 is the smallest printed yield: a bound above it contradicts the data
    await expect(analyze.run([...YIELD, '--lower-bound', 'Yield=20'])).rejects.toThrow(/has Yield 18, below the lower bound 20 given by --lower-bound/);
  });
});

describe('analyze --terms quadratic on runs that cannot estimate it', () => {
  it('is refused with the reason and what to do; a second-order design is not (Montgomery 8th ed., Example 11.2)', async () => {
    await expect(analyze.run([...CENTERS, '--terms', 'quadratic'])).rejects.toThrow(quadraticNotSupported('command'));
    // A single square is estimable from center runs and stays allowed (Montgomery 8th ed., section 6.8).
    await expect(analyze.run([...CENTERS, '--terms', 'A*B + A^2'])).resolves.toMatch(/Analysis of Yield/);
    const ccd = fixturePath('montgomery-8e-ex11-2-ccd-yield.csv');
    const text = await analyze.run([ccd, '--factors', 'Time,Temperature', '--response', 'Yield', '--levels', 'Time=80:90,Temperature=170:180', '--terms', 'quadratic']);
    expect(text).not.toMatch(/Lenth's method has only|missing runs, off-target settings/);
    const json = JSON.parse(await analyze.run([ccd, '--factors', 'Time,Temperature', '--response', 'Yield', '--levels', 'Time=80:90,Temperature=170:180', '--terms', 'quadratic', '--json']));
    expect(json.verdicts.map((v: { kind: string }) => v.kind)).toContain('squares');
    expect(json.warnings.join(' ')).not.toMatch(/Lenth|orthogonal/);
    expect(text).toMatch(/The model's squares test the bend along each factor/);
  });
});
