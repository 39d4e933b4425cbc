import { describe, expect, it } from 'vitest';
import { path } from '../../src/cli/commands/path.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { glossFile } from '../core/predict/designs.ts';

const yieldFile = fixturePath('montgomery-8e-ex6-6-center-points.csv');
const model = ['--factors', 'Time,Temperature', '--response', 'Yield', '--terms', 'A+B'];

describe('path command: the worked example of Montgomery 8th ed., section 11.2 (base time, 5 min per step)', () => {
  it('gives every JSON field the issue lists: Delta x1 = 1, Delta x2 = 0.42, about 2 degF per step', async () => {
    const out = JSON.parse(await path.run([yieldFile, ...model, '--base', 'A', '--step', '5', '--steps', '5', '--json']));
    for (const key of ['direction', 'steps', 'messages', 'caution']) expect(out).toHaveProperty(key);
    expect(out.direction.Time).toBeCloseTo(1, 12);
    expect(out.direction.Temperature).toBeCloseTo(0.325 / 0.775, 12);
    expect(Math.round(out.realStep.Temperature)).toBe(2);
    expect(out.steps).toHaveLength(6);
    for (const key of ['real', 'coded', 'fit', 'outside']) expect(out.steps[1]).toHaveProperty(key);
    expect(out.steps[1].real.Time).toBeCloseTo(40, 12);
    expect(out.steps[1].outside).toBe(false);
    expect(out.steps[2].outside).toBe(true);
    expect(out.steps[0].fit).toBeCloseTo(364 / 9, 10);
  });

  it('--descent reverses the direction; text shows the table', async () => {
    const out = JSON.parse(await path.run([yieldFile, ...model, '--base', 'Time', '--step', '5', '--descent', '--json']));
    expect(out.direction.Time).toBeCloseTo(-1, 12);
    expect(out.steps).toHaveLength(6); // default 5 steps
    const text = await path.run([yieldFile, ...model, '--base', 'Time', '--step', '5', '--steps', '3']);
    expect(text).toMatch(/Path of steepest ascent for Yield, base factor Time, 3 steps/);
    expect(text).toMatch(/0 \(origin\) +35 min +155 degF +40.44/);
    expect(text).toMatch(/outside tested range/);
  });

  it('no interaction warning under the default model when AB is not significant (Montgomery 8th ed., section 6.8 data)', async () => {
    const out = JSON.parse(await path.run([yieldFile, '--factors', 'Time,Temperature', '--response', 'Yield', '--base', 'A', '--step', '5', '--json']));
    // By hand: AB contrast (39.3 + 41.5) - (40.9 + 40.0) = -0.1, SS_AB = 0.1^2 / 4 = 0.0025 (as printed, from memory); far from significant
    expect(out.messages.join(' ')).not.toMatch(/Interactions are significant/);
  });

  it('categorical factors held at the better level by default, or as given (invented data)', async () => {
    const file = glossFile();
    const args = [file, '--factors', 'Temperature,Powder', '--response', 'Gloss', '--base', 'A', '--step', '10', '--steps', '2', '--json'];
    const out = JSON.parse(await path.run(args));
    expect(out.steps[0].real.Powder).toBe('gloss');
    expect(out.direction.Powder).toBe(0);
    const matte = JSON.parse(await path.run([...args, '--at', 'B=matte']));
    expect(matte.steps[2].real.Powder).toBe('matte');
  });

  it('bad input: missing base or step, bad step count', async () => {
    await expect(path.run([yieldFile, ...model, '--step', '5'])).rejects.toThrow(/--base FACTOR/);
    await expect(path.run([yieldFile, ...model, '--base', 'A'])).rejects.toThrow(/--step SIZE/);
    await expect(path.run([yieldFile, ...model, '--base', 'A', '--step', 'five'])).rejects.toThrow(/--step needs a number, got "five"/);
    await expect(path.run([yieldFile, ...model, '--base', 'A', '--step', '5', '--steps', '2.5'])).rejects.toThrow(/--steps needs a whole number/);
    await expect(path.run([yieldFile, ...model, '--base', 'A', '--step=-5'])).rejects.toThrow(/positive number of min, got -5/);
  });
});

describe('path command: a negative value needs no --step=-5 quoting', () => {
  it('reaches the command\'s own check of the step rather than the argument parser', async () => {
    await expect(path.run([yieldFile, ...model, '--base', 'A', '--step', '-5'])).rejects.toThrow(/The base factor's step must be a positive number of min, got -5/);
  });
});
