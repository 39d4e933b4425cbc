import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { optimize } from '../../src/cli/commands/optimize.ts';
import { parseResponses } from '../../src/cli/responses-option.ts';
import { desirability, overallDesirability } from '../../src/core/optimum/desirability.ts';
import { fixturePath } from '../helpers/fixtures.ts';

// The yield of Montgomery 8th ed., Example 11.2, with an invented second response (Cost, made up
// for this test: not data) added beside it.
const dir = mkdtempSync(join(tmpdir(), 'trialbook-optimize-'));
const lines = readFileSync(fixturePath('montgomery-8e-ex11-2-ccd-yield.csv'), 'utf8').trim().split('\n');
const csv = [`${lines[0]},Cost`, ...lines.slice(1).map((l, i) => {
  const [t, u] = l.split(',').map(Number);
  return `${l},${(10 + 0.2 * (t - 85) + 0.1 * (u - 175) + 0.01 * (t - 85) ** 2 + 0.05 * ((i % 3) - 1)).toFixed(3)}`;
})].join('\n');
const file = join(dir, 'invented-two-responses.csv');
writeFileSync(file, csv + '\n');
const BASE = [file, '--factors', 'Time,Temperature', '--levels', 'Time=80:90,Temperature=170:180', '--terms', 'quadratic'];

describe('optimize', () => {
  it('best: D found, each response with fit, pi and d that follow the definitions (Derringer and Suich 1980)', async () => {
    const specs = 'Yield:max:78:80.5,Cost:min:9:11:w=2';
    const out = JSON.parse(await optimize.run([...BASE, '--responses', specs, '--json']));
    expect(Object.keys(out.best)).toEqual(['coded', 'real', 'D', 'responses']);
    const [y, c] = parseResponses(specs);
    const dy = desirability(y, out.best.responses.Yield.fit);
    const dc = desirability(c, out.best.responses.Cost.fit);
    expect(out.best.responses.Yield.d).toBeCloseTo(dy, 12);
    expect(out.best.responses.Cost.d).toBeCloseTo(dc, 12);
    expect(out.best.D).toBeCloseTo(overallDesirability([dy, dc], [1, 2]), 12);
    expect(out.best.D).toBeGreaterThan(0);
    expect(out.best.responses.Yield.pi).toHaveLength(2);
    for (const v of Object.values(out.best.coded) as number[]) expect(Math.abs(v)).toBeLessThanOrEqual(1);
    expect(out.search.seeds).toBe(13 + 4 + 25);
    expect(out.caution).toHaveLength(3);
    // No setting checked at --at beats the best found
    for (const at of ['Time=85,Temperature=175', 'Time=80,Temperature=170', 'Time=90,Temperature=180', 'Time=88,Temperature=172']) {
      const p = JSON.parse(await optimize.run([...BASE, '--responses', specs, '--at', at, '--json']));
      expect(p.at.D).toBeLessThanOrEqual(out.best.D + 1e-9);
    }
  });

  it('--at: D and each fit and d at the settings, with the outside-range message', async () => {
    const p = JSON.parse(await optimize.run([...BASE, '--responses', 'Yield:target:78:79.5:81', '--at', 'Time=95,Temperature=175', '--json']));
    expect(Object.keys(p.at)).toEqual(['settings', 'D', 'responses']);
    expect(p.at.D).toBeCloseTo(desirability({ name: 'Yield', goal: 'target', low: 78, target: 79.5, high: 81 }, p.at.responses.Yield.fit), 12);
    expect(p.messages[0]).toMatch(/Time = 95 min is outside the tested range/);
    const text = await optimize.run([...BASE, '--responses', 'Yield:max:78:80.5', '--at', 'Time=85']);
    expect(text).toMatch(/^Overall desirability at Time = 85, Temperature = 175: D = /);
    expect(text).toMatch(/rated limits/);
  });

  it('bad --responses are refused with the entry quoted; nothing else is read', async () => {
    await expect(optimize.run([...BASE])).rejects.toThrow(/--responses/);
    await expect(optimize.run([...BASE, '--responses', 'Yield:best:1:2'])).rejects.toThrow('--responses "Yield:best:1:2": the goal is max, min or target, got "best"');
    await expect(optimize.run([...BASE, '--responses', 'Yield:target:78:81'])).rejects.toThrow(/a target needs LOW:T:HIGH/);
    await expect(optimize.run([...BASE, '--responses', 'Yield:max:81:78'])).rejects.toThrow('Yield: needs LOW below HIGH, got 81 and 78');
    await expect(optimize.run([...BASE, '--responses', 'Yield:max:78:81:q=2'])).rejects.toThrow(/w=WEIGHT, r=, s= or t=, got "q=2"/);
    await expect(optimize.run([...BASE, '--responses', 'Yield:max:78:81,yield:min:1:2'])).rejects.toThrow(/names yield twice/);
    await expect(optimize.run([...BASE, '--responses', 'Gloss:max:1:2'])).rejects.toThrow(/Gloss/);
    expect(parseResponses('Y3:target:9:10:11:s=2:t=0.5')).toEqual([{ name: 'Y3', goal: 'target', low: 9, target: 10, high: 11, s: 2, t: 0.5 }]);
  });
});
