import { describe, expect, it } from 'vitest';
import { solve } from '../../src/cli/commands/solve.ts';
import { predict } from '../../src/cli/commands/predict.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { glossFile } from '../core/predict/designs.ts';

const yieldFile = fixturePath('montgomery-8e-ex6-6-center-points.csv');
const model = ['--factors', 'Time,Temperature', '--response', 'Yield', '--terms', 'A+B'];

describe('solve command (Montgomery 8th ed., section 6.8 yield data; yhat = 40.44 + 0.775 x1 + 0.325 x2, section 11.2)', () => {
  it('gives every JSON field the issue lists, and predict at the answer gives the target back', async () => {
    const out = JSON.parse(await solve.run([yieldFile, ...model, '--target', '41', '--for', 'A', '--at', 'B=155', '--json']));
    for (const key of ['setting', 'reachable', 'fit', 'pi', 'messages', 'caution']) expect(out).toHaveProperty(key);
    expect(out.reachable).toBe(true);
    expect(out.setting).toBeCloseTo(35 + (5 * (41 - 364 / 9)) / 0.775, 9); // by hand from the printed model
    const back = JSON.parse(await predict.run([yieldFile, ...model, '--at', `A=${out.setting},B=155`, '--json']));
    expect(back.fit).toBeCloseTo(41, 9);
  });

  it('an unreachable target: the nearest setting with its prediction and interval', async () => {
    const out = JSON.parse(await solve.run([yieldFile, ...model, '--target', '45', '--for', 'Time', '--json']));
    expect(out.reachable).toBe(false);
    expect(out.setting).toBe(40);
    expect(out.pi).toHaveLength(2);
    expect(out.messages.join(' ')).toMatch(/outside what the tested range of Time reaches/);
    const text = await solve.run([yieldFile, ...model, '--target', '45', '--for', 'Time']);
    expect(text).toMatch(/Not reachable inside the tested range; nearest setting Time = 40 min/);
  });

  it('readable text for a reachable target', async () => {
    const text = await solve.run([yieldFile, ...model, '--target', '41', '--for', 'A']);
    expect(text).toMatch(/Time = 38.58 min \(coded \+0.7168\) gives the target/);
    expect(text).toMatch(/Caution/);
  });

  it('bad input: categorical factor, missing or unreadable options (categorical data invented)', async () => {
    const file = glossFile();
    await expect(solve.run([file, '--factors', 'Temperature,Powder', '--response', 'Gloss', '--target', '70', '--for', 'Powder', '--at', 'A=180'])).rejects.toThrow(
      /Powder is categorical .* cannot be solved for; at the given settings the model predicts/,
    );
    await expect(solve.run([yieldFile, ...model, '--for', 'A'])).rejects.toThrow(/--target VALUE/);
    await expect(solve.run([yieldFile, ...model, '--target', 'lots', '--for', 'A'])).rejects.toThrow(/--target needs a number, got "lots"/);
    await expect(solve.run([yieldFile, ...model, '--target', '41'])).rejects.toThrow(/--for FACTOR/);
    await expect(solve.run([yieldFile, ...model, '--target', '41', '--for', 'A', '--at', 'A=30'])).rejects.toThrow(/factor to be found/);
  });
});

describe('solve --transform (Montgomery 8th ed., Example 6.1 plasma etch data, fitted on a transformed scale)', () => {
  const etch = fixturePath('montgomery-8e-ex6-1-plasma-etch-2x3.csv');
  const etchModel = ['--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--terms', 'A+C+AC'];
  for (const t of ['log', 'sqrt', 'inverse', 'power=2']) {
    it(`${t}: the JSON gives the setting in real units and the fit in the response units, with a transformed block; predict there gives the target`, async () => {
      const out = JSON.parse(await solve.run([etch, ...etchModel, '--transform', t, '--target', '700', '--for', 'Power', '--at', 'Gap=1.2', '--json']));
      expect(out.reachable).toBe(true);
      expect(out.fit).toBeCloseTo(700, 8);
      expect(out.transformed).toHaveProperty('target');
      for (const key of ['fit', 'se', 'ci', 'pi']) expect(out.transformed).toHaveProperty(key);
      const back = JSON.parse(await predict.run([etch, ...etchModel, '--transform', t, '--at', `Gap=1.2,Power=${out.setting}`, '--json']));
      expect(back.fit).toBeCloseTo(700, 8);
      expect(back.pi[1]).toBeCloseTo(out.pi[1], 8);
    });
  }

  it('the text report says the slope is on the fitted scale and gives the standard error there', async () => {
    const text = await solve.run([etch, ...etchModel, '--transform', 'log', '--target', '700', '--for', 'Power', '--at', 'Gap=1.2']);
    expect(text).toMatch(/per coded unit on the fitted scale/);
    expect(text).toMatch(/standard error of the fit {4}- \([0-9.e-]+ on the fitted scale\)/);
  });
});

describe('open interval ends in the text reports (inverse transform, Example 6.1 data, far outside the range)', () => {
  const etch = fixturePath('montgomery-8e-ex6-1-plasma-etch-2x3.csv');
  const args = [etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--terms', 'A+C+AC', '--transform', 'inverse', '--at', 'Gap=0.8,Power=390'];
  it('print "no upper limit" and "no finite value", never Infinity; JSON keeps null', async () => {
    const text = await predict.run(args);
    expect(text).not.toMatch(/Infinity/);
    expect(text).toMatch(/or more \(no upper limit\)/);
    expect(text).toMatch(/fitted value {17}no finite value/);
    const out = JSON.parse(await predict.run([...args, '--json']));
    expect(out.fit).toBeNull();
    expect(out.ci[1]).toBeNull();
    expect(Number.isFinite(out.ci[0])).toBe(true);
  });
});
