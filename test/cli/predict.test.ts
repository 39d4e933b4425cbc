import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { predict } from '../../src/cli/commands/predict.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { glossFile } from '../core/predict/designs.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const yieldFile = fixturePath('montgomery-8e-ex6-6-center-points.csv');
const model = ['--factors', 'Time,Temperature', '--response', 'Yield', '--terms', 'A+B'];

describe('predict command (Montgomery 8th ed., section 6.8 yield data; yhat = 40.44 + 0.775 x1 + 0.325 x2, section 11.2)', () => {
  it('gives every JSON field the issue lists', async () => {
    const out = JSON.parse(await predict.run([yieldFile, ...model, '--at', 'Time=40,B=150', '--json']));
    for (const key of ['coded', 'fit', 'se', 'ci', 'pi', 'baseline', 'contributions', 'outside', 'messages', 'caution']) expect(out).toHaveProperty(key);
    expect(out.coded).toEqual({ Time: 1, Temperature: -1 });
    expect(out.fit).toBeCloseTo(364 / 9 + 0.775 - 0.325, 10);
    expect(out.baseline).toBeCloseTo(364 / 9, 10);
    expect(out.contributions.map((c: { term: string }) => c.term)).toEqual(['Time', 'Temperature']);
    expect(out.contributions.find((c: { term: string }) => c.term === 'Intercept')).toBeUndefined();
    expect(out.ci).toHaveLength(2);
    expect(out.pi[0]).toBeLessThan(out.ci[0]);
    expect(out.outside).toBe(false);
    expect(out.caution).toHaveLength(3);
  });

  it('flags a setting outside the tested range', async () => {
    const out = JSON.parse(await predict.run([yieldFile, ...model, '--at', 'Time=45', '--json']));
    expect(out.outside).toBe(true);
    expect(out.messages.join(' ')).toMatch(/Time = 45 min is outside the tested range \(30 to 40 min\): 5 min above the high setting \(coded \+2\)/);
    expect(out.messages.join(' ')).toMatch(/Temperature was not given: held at its center, 155 degF/);
  });

  it('a categorical factor by its level; refused between its levels or when missing (invented data)', async () => {
    const file = glossFile();
    const args = [file, '--factors', 'Temperature,Powder', '--response', 'Gloss'];
    const out = JSON.parse(await predict.run([...args, '--at', 'A=185,Powder=gloss', '--json']));
    expect(out.coded).toEqual({ Temperature: 0.25, Powder: 1 });
    await expect(predict.run([...args, '--at', 'A=185,B=0'])).rejects.toThrow(/no setting between them/);
    await expect(predict.run([...args, '--at', 'A=185'])).rejects.toThrow(/Powder is categorical and has no center/);
    await expect(predict.run([...args, '--at', 'A=185,B=silk'])).rejects.toThrow(/got "silk"/);
    await expect(predict.run([...args, '--at', 'A185'])).rejects.toThrow(/expected NAME=VALUE, got "A185"/);
  });

  it('readable text: settings with coded values, intervals, contributions, caution', async () => {
    const text = await predict.run([yieldFile, ...model, '--at', 'Time=38,B=158']);
    expect(text).toMatch(/A {2}Time +38 min +\+0.6 +given/);
    expect(text).toMatch(/95% confidence interval/);
    expect(text).toMatch(/95% prediction interval/);
    expect(text).toMatch(/baseline \(fit at the center\) +40.44/);
    expect(text).toMatch(/Caution\n {2}- A prediction is a statistical estimate/);
  });

  it('degenerate: residual df 0 gives null intervals with the reason (Montgomery 8th ed., Example 6.2 under the full model)', async () => {
    const out = JSON.parse(
      await predict.run([fixturePath('montgomery-8e-ex6-2-filtration-2x4.csv'), '--factors', 'Temperature,Pressure,Concentration,Stirring', '--response', 'Filtration rate', '--order', '4', '--json']),
    );
    expect(out.se).toBeNull();
    expect(out.ci).toBeNull();
    expect(out.pi).toBeNull();
    expect(out.messages.join(' ')).toMatch(/residual df 0/);
  });

  it('the real command line: exit 0 with JSON, exit 2 with a message on stderr', () => {
    const ok = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'predict', yieldFile, ...model, '--at', 'A=35', '--json'], { cwd: root, encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).fit).toBeCloseTo(364 / 9 - 0.325 * 0, 10);
    const bad = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'predict', yieldFile, ...model, '--at', 'Pressure=3'], { cwd: root, encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/trialbook predict: No factor is named or lettered "Pressure"/);
  }, 60_000); // two child processes through npx and tsx: a generous allowance on a loaded machine, not a speed check
});
