import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { analyze as analyzeCore } from '../../src/core/fit/analyze.ts';
import { parseTerms } from '../../src/core/model/formula.ts';
import { secondOrderAnalysis } from '../../src/core/optimum/second-order-analysis.ts';
import { fixtureData, fixturePath } from '../helpers/fixtures.ts';

const ccd = fixturePath('montgomery-8e-ex11-2-ccd-yield.csv');
const ARGS = [ccd, '--factors', 'Time,Temperature', '--response', 'Yield', '--levels', 'Time=80:90,Temperature=170:180', '--terms', 'quadratic'];

describe('analyze --terms quadratic: secondOrder (Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2)', () => {
  it('has the keys the issue names and the printed canonical analysis', async () => {
    const out = JSON.parse(await analyze.run([...ARGS, '--json']));
    const s = out.secondOrder;
    expect(Object.keys(s)).toEqual(expect.arrayContaining(['stationary', 'eigenvalues', 'eigenvectors', 'nature', 'ridge', 'optimum']));
    // Printed (from memory): x_s = (0.389, 0.306); 86.95 min, 176.53 degF; y_s = 80.21; eigenvalues -0.9634, -1.4141
    expect(s.stationary.coded.Time).toBeCloseTo(0.389, 3);
    expect(s.stationary.real.Temperature).toBeCloseTo(176.53, 2);
    expect(s.stationary.fit).toBeCloseTo(80.21, 2);
    expect(s.stationary.inside).toBe(true);
    expect(s.eigenvalues[0]).toBeCloseTo(-0.9634, 3);
    expect(s.eigenvalues[1]).toBeCloseTo(-1.4141, 3);
    expect(s.nature).toBe('maximum');
    expect(Object.keys(s.eigenvectors[0])).toEqual(['Time', 'Temperature']);
    expect(Object.keys(s.ridge[0])).toEqual(['radius', 'coded', 'real', 'fit', 'pi']);
    expect(s.optimum.real.Time).toBeCloseTo(86.95, 2);
    expect(s.optimum.pi).toHaveLength(2);
  });

  it('the JSON equals the core computation, and --goal changes the optimum', async () => {
    const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
    const core = secondOrderAnalysis(analyzeCore(data, { terms: parseTerms('quadratic', data.factors) }).model, data.coded, { kind: 'target', target: 79 });
    const out = JSON.parse(await analyze.run([...ARGS, '--goal', 'target=79', '--json']));
    expect(out.secondOrder.goal).toBe('target=79');
    expect(out.secondOrder.optimum.fit).toBeCloseTo(core.optimum.fit, 12);
    expect(out.secondOrder.optimum.fit).toBeCloseTo(79, 6);
    expect(out.secondOrder.ridgeSense).toBe('min');
  });

  it('the report adds the section with the caution; a first-order model has no secondOrder; --goal without squares is refused', async () => {
    const text = await analyze.run(ARGS);
    expect(text).toMatch(/Nature of the surface: maximum/);
    expect(text).toMatch(/Site procedures and qualified staff decide/);
    const first = JSON.parse(await analyze.run([ccd, '--factors', 'Time,Temperature', '--response', 'Yield', '--json']));
    expect(first.secondOrder).toBeUndefined();
    await expect(analyze.run([ccd, '--factors', 'Time,Temperature', '--response', 'Yield', '--goal', 'max'])).rejects.toThrow(/--goal needs a second-order model/);
    await expect(analyze.run([...ARGS, '--goal', 'best'])).rejects.toThrow('--goal takes max, min or target=T, got "best"');
  });
});
