import { describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { design, parseFactorOption } from '../../src/cli/commands/design.ts';
import { InputError } from '../../src/core/errors.ts';

const SEVEN = ['Temperature (degC)=160:200', 'Powder=matte:gloss', 'Time (min)=10:20', 'Pressure (bar)=2:4', 'Speed (rpm)=100:400', 'Humidity (%)=30:60', 'Line=north:south'].flatMap((f) => [
  '--factor',
  f,
]);

async function json(args: string[]): Promise<any> {
  return JSON.parse(await design.run([...args, '--json']));
}

describe('design command: JSON', () => {
  it('plans the 2^(7-3) with the keys the issue names', async () => {
    const d = await json([...SEVEN, '--fraction', '1/8', '--seed', '7']);
    expect(Object.keys(d)).toEqual(expect.arrayContaining(['factors', 'runs', 'generators', 'definingRelation', 'resolution', 'wordLengths', 'aliases', 'blockWords', 'seed']));
    expect(d.factors[0]).toEqual({ letter: 'A', name: 'Temperature', kind: 'numeric', low: 160, high: 200, unit: 'degC' });
    expect(d.factors[1]).toEqual({ letter: 'B', name: 'Powder', kind: 'categorical', low: 'matte', high: 'gloss' });
    expect(d.generators).toEqual(['E=ABC', 'F=ABD', 'G=ACD']);
    expect(d.resolution).toBe(4);
    expect(d.wordLengths).toEqual({ 4: 7 });
    expect(d.aliases).toContainEqual(['AB', 'CE', 'DF']);
    expect(d.seed).toBe(7);
    expect(d.runs).toHaveLength(16);
    const r = d.runs[0];
    expect(Object.keys(r)).toEqual(['run', 'yates', 'replicate', 'block', 'kind', 'coded', 'real']);
    expect(r.run).toBe(1);
    expect(Object.keys(r.coded)).toEqual(['Temperature', 'Powder', 'Time', 'Pressure', 'Speed', 'Humidity', 'Line']);
    expect(r.real.Powder === 'matte' || r.real.Powder === 'gloss').toBe(true);
  });

  it('gives the same order for the same seed, and a recorded seed when none is given', async () => {
    const a = await json([...SEVEN, '--fraction', '1/8', '--seed', '123']);
    const b = await json([...SEVEN, '--fraction', '1/8', '--seed', '123']);
    expect(a.runs).toEqual(b.runs);
    const c = await json([...SEVEN, '--fraction', '1/8']);
    expect(Number.isInteger(c.seed)).toBe(true);
  });

  it('takes typed generators with signs, blocks with words, center runs, replicates, foldover, standard order', async () => {
    const d = await json([
      '--factor', 'A=1:2', '--factor', 'B=1:2', '--factor', 'C=1:2', '--factor', 'D=1:2', '--factor', 'E=1:2', '--factor', 'F=1:2',
      '--generators', 'E=ABC,F=-BCD', '--blocks', '2', '--block-words', 'ABD', '--center-runs', '2', '--replicates', '2', '--standard-order',
    ]);
    expect(d.definingRelation).toEqual(['ABCE', '-ADEF', '-BCDF']);
    expect(d.blockWords).toEqual(['ABD']);
    expect(d.seed).toBeNull();
    expect(d.runs).toHaveLength(2 * (16 + 2));
    expect(d.runs.filter((r: any) => r.kind === 'center').every((r: any) => r.yates === null && r.real.A === 1.5)).toBe(true);
    expect(new Set(d.runs.map((r: any) => r.block))).toEqual(new Set([1, 2, 3, 4]));
    const f = await json(['--factor', 'A=1:2', '--factor', 'B=1:2', '--factor', 'C=1:2', '--fraction', '1/2', '--foldover', '--seed', '1']).catch((e) => e);
    expect(f).toBeInstanceOf(InputError); // a 4-run fraction is outside the catalog
    const g = await json(['--factor', 'A=1:2', '--factor', 'B=1:2', '--factor', 'C=1:2', '--factor', 'D=1:2', '--factor', 'E=1:2', '--fraction', '1/4', '--foldover', 'A', '--seed', '1']);
    expect(g.runs).toHaveLength(16);
    expect(g.definingRelation.every((w: string) => !w.includes('A'))).toBe(true);
  });
});

describe('design command: CSV and text', () => {
  it('writes the run sheet with the planned-settings columns', async () => {
    const csv = await design.run([...SEVEN, '--fraction', '1/8', '--seed', '7', '--csv']);
    expect(csv.split('\r\n')[0]).toBe(
      'Run,Std order,Replicate,Block,Kind,Temperature (degC) planned,Powder planned,Time (min) planned,Pressure (bar) planned,Speed (rpm) planned,Humidity (%) planned,Line planned',
    );
    expect(csv.split('\r\n')).toHaveLength(18);
  });

  it('prints the plan in plain words with the summary first', async () => {
    const text = await design.run(['--factor', 'Temperature (degC)=160:200', '--factor', 'Time=10:20', '--factor', 'Speed=1:2', '--factor', 'Feed=3:4', '--blocks', '2', '--seed', '7']);
    expect(text).toMatch(/^Plan: 2\^4 full factorial, 16 runs\n\n16 runs \(2 blocks\), a full factorial: every main effect and interaction is estimated on its own except ABCD, confounded with blocks\./);
    expect(text).toMatch(/Blocks +2; confounded with blocks: ABCD/);
    expect(text).toMatch(/seed 7 \(PCG32 and a Fisher-Yates shuffle\)/);
  });

  it('names run kinds in words in the text, with the tokens kept in the CSV and JSON', async () => {
    const args = ['--factor', 'Temperature=160:200', '--factor', 'Time=10:20', '--center-runs', '2', '--standard-order'];
    const text = await design.run(args);
    const runs = text.split('\n').slice(text.split('\n').indexOf('Runs') + 2);
    expect(runs.filter((l) => /factorial point/.test(l))).toHaveLength(4);
    expect(runs.filter((l) => /center point/.test(l))).toHaveLength(2);
    expect(text).not.toMatch(/\bcorner\b/);
    const csv = await design.run([...args, '--csv']);
    expect(csv.split('\r\n').filter((l) => /,center,/.test(l))).toHaveLength(2);
    expect(csv).not.toMatch(/center point/);
    const d = JSON.parse(await design.run([...args, '--json']));
    expect(d.runs.map((r: { kind: string }) => r.kind).sort()).toEqual(['center', 'center', 'factorial', 'factorial', 'factorial', 'factorial']);
  });

  it('warns when a hard-to-change factor is kept sorted', async () => {
    const text = await design.run(['--factor', 'Oven=160:200', '--factor', 'Time=10:20', '--factor', 'Speed=1:2', '--sort-by', 'Oven', '--seed', '2']);
    expect(text).toMatch(/Oven is kept sorted .* split-plot/);
  });
});

describe('design command: bad input', () => {
  const bad = async (args: string[], message: RegExp) => {
    await expect(design.run(args)).rejects.toThrow(message);
    await expect(design.run(args)).rejects.toBeInstanceOf(InputError);
  };
  it('refuses with clear messages', async () => {
    await bad([], /at least two --factor/);
    await bad(['--factor', 'T=5:5', '--factor', 'U=1:2'], /T needs two different levels, got 5 and 5/);
    await bad(['--factor', 'T=1:2', '--factor', 't=1:2'], /got "t" twice/);
    await bad([...SEVEN, '--generators', 'D=AB,E=AC,F=BC,G=ABC,H=AB'], /unknown factor "H"|generators for 7 factors/);
    await bad([...SEVEN, '--generators', 'E=ABC,F=ABC'], /dependent/);
    await bad([...SEVEN, '--replicates', '100'], /over the limit of 1024 runs/);
    await bad([...SEVEN, '--fraction', '1/8', '--generators', 'E=ABC'], /not both/);
    await bad([...SEVEN, '--json', '--csv'], /--json or --csv/);
    await bad([...SEVEN, '--seed', '1', '--standard-order'], /only applies to a randomized order/);
    await bad([...SEVEN, '--block-words', 'ABC'], /--block-words needs --blocks/);
    await bad([...SEVEN, '--seed', 'seven'], /--seed needs a whole number/);
    await bad([...SEVEN, '--bogus'], /Unknown option/);
    await bad([...SEVEN, 'extra'], /options only/);
  });
});

describe('design command: power of the plan', () => {
  // The power itself is checked against jstat and Cohen (1988) in test/core/plan/power.test.ts;
  // here the command's keys, defaults and wording. A 2^4 with 4 center runs is the example plan.
  const FOUR = ['Temperature (degC)=160:200', 'Time (min)=10:20', 'Speed=2:4', 'Feed=1:3'].flatMap((f) => ['--factor', f]);

  it('prints the power block with the keys the issue names', async () => {
    const d = await json([...FOUR, '--center-runs', '4', '--seed', '7', '--effect', '2', '--sigma', '1.5']);
    expect(Object.keys(d.power).slice(0, 8)).toEqual(['effect', 'sigma', 'significance', 'residualDf', 'power', 'target', 'smallestEffect', 'replicatesNeeded']);
    expect(d.power.effect).toBe(2);
    expect(d.power.sigma).toBe(1.5);
    expect(d.power.significance).toBe(0.05); // default
    expect(d.power.target).toBe(0.8); // default
    // Default model: 4 main effects + 6 two-factor interactions; 20 runs - 11 parameters.
    expect(d.power.model).toEqual(['A', 'B', 'C', 'D', 'AB', 'AC', 'AD', 'BC', 'BD', 'CD']);
    expect(d.power.residualDf).toBe(9);
    expect(d.power.standardError).toBeCloseTo((2 * 1.5) / Math.sqrt(16), 12); // 2 sigma / sqrt(Nf)
    expect(d.power.power).toBeGreaterThan(0.6);
    expect(d.power.power).toBeLessThan(0.7);
    expect(d.power.smallestEffect).toBeGreaterThan(2);
    expect(d.power.replicatesNeeded).toBe(2);
    expect(d.power.summary).toMatch(/^With these 20 runs and noise of about 1\.5, an effect of 2 is found about 2 times in 3/);
    // No power block unless asked for.
    expect((await json([...FOUR, '--seed', '7'])).power).toBeUndefined();
  });

  it('takes a model, a significance level and a target power; text shows the block', async () => {
    const d = await json([...FOUR, '--seed', '7', '--effect', '2', '--sigma', '1.5', '--terms', 'A+B+C+D', '--significance', '0.1', '--power', '0.9']);
    expect(d.power.model).toEqual(['A', 'B', 'C', 'D']);
    expect(d.power.residualDf).toBe(11);
    expect(d.power.significance).toBe(0.1);
    expect(d.power.target).toBe(0.9);
    const text = await design.run([...FOUR, '--center-runs', '4', '--seed', '7', '--effect', '2', '--sigma', '1.5']);
    expect(text).toMatch(/\n\nPower \(two-sided t test of one main effect; model A \+ B \+ C \+ D \+ AB/);
    expect(text).toMatch(/ {2}Residual df +9\n/);
    expect(text).toMatch(/ {2}Standard error +0\.75 \(of each main effect\)/);
  });

  it('says no test is possible when the model leaves no residual df', async () => {
    const d = await json([...FOUR, '--fraction', '1/2', '--seed', '7', '--effect', '2', '--sigma', '1.5']);
    expect(d.power.residualDf).toBe(0);
    expect(d.power.power).toBeNull();
    expect(d.power.smallestEffect).toBeNull();
    expect(d.power.summary).toMatch(/no t test of an effect is possible: add replicates or center runs, or judge the effects by Lenth's method/);
    const text = await design.run([...FOUR, '--fraction', '1/2', '--seed', '7', '--effect', '2', '--sigma', '1.5']);
    expect(text).toMatch(/Power +- \(no residual df: no t test possible\)/);
  });

  it('refuses bad power input with clear messages', async () => {
    const bad = async (args: string[], message: RegExp) => {
      await expect(design.run(args)).rejects.toThrow(message);
      await expect(design.run(args)).rejects.toBeInstanceOf(InputError);
    };
    await bad([...FOUR, '--effect', '2', '--sigma', '-1'], /sigma\) must be a number greater than 0, got -1/);
    await bad([...FOUR, '--effect', '0', '--sigma', '1'], /The effect to detect must be a number greater than 0, got 0/);
    await bad([...FOUR, '--effect', '2'], /needs both --effect .* and --sigma .*; got only --effect/);
    await bad([...FOUR, '--sigma', '2'], /got only --sigma/);
    await bad([...FOUR, '--terms', 'A*B'], /--terms belongs to the power of the plan: give --effect and --sigma/);
    await bad([...FOUR, '--effect', 'big', '--sigma', '1'], /--effect needs a number, got "big"/);
    await bad([...FOUR, '--effect', '2', '--sigma', '1', '--csv'], /--csv prints the run sheet only/);
    await bad([...FOUR, '--effect', '2', '--sigma', '1', '--power', '1.5'], /target power must be a probability between 0 and 1/);
    await bad([...FOUR, '--effect', '2', '--sigma', '1', '--terms', 'A+Q'], /Q/);
  });
});

describe('design command: Plackett-Burman screening designs', () => {
  const factors = (k: number) => Array.from({ length: k }, (_, i) => ['--factor', `X${i + 1}=0:10`]).flat();

  it('plans 12, 20 and 24 runs; runs are factorial; JSON carries the partial aliasing', async () => {
    const d = await json([...factors(7), '--plackett-burman', '12', '--seed', '3']);
    expect(d.runs).toHaveLength(12);
    expect(d.runs.every((r: any) => r.kind === 'factorial')).toBe(true);
    expect(d.screening).toMatchObject({ kind: 'plackett-burman', runs: 12 });
    expect(d.generators).toEqual([]);
    expect(d.definingRelation).toEqual([]);
    expect(d.resolution).toBeNull();
    expect(d.partialAliasing).toHaveLength(7 * 15);
    // 12 runs: every correlation of a main effect with an interaction of two others is +-1/3 (Lin and Draper 1992, from memory).
    for (const a of d.partialAliasing) expect(Math.abs(a.correlation)).toBeCloseTo(1 / 3, 12);
    expect(d.summary).toMatch(/main effects are estimated clear of each other but partly mixed with two-factor interactions/);
    expect((await json([...factors(19), '--plackett-burman', '20', '--seed', '3'])).runs).toHaveLength(20);
    const s = await json([...factors(3), '--plackett-burman', '24', '--center-runs', '2', '--replicates', '2', '--standard-order']);
    expect(s.runs).toHaveLength(2 * 26);
    expect(s.runs.slice(0, 24).map((r: any) => r.yates)).toEqual(Array.from({ length: 24 }, (_, i) => i + 1));
  });

  it('prints text with the partial aliasing and a CSV run sheet', async () => {
    const text = await design.run([...factors(5), '--plackett-burman', '12', '--seed', '3']);
    expect(text).toMatch(/^Plan: 12-run Plackett-Burman screening design for 5 factors, 12 runs\n/);
    expect(text).toMatch(/Partial aliasing \(correlation of each main effect with the two-factor interactions of other factors\)\n {2}A: /);
    expect(text).toMatch(/Defining relation +none \(a Plackett-Burman design/);
    const csv = await design.run([...factors(5), '--plackett-burman', '12', '--seed', '3', '--csv']);
    expect(csv.split('\r\n')).toHaveLength(14); // header, 12 runs, the closing line break
    expect(csv.split('\r\n')[1]).toMatch(/,factorial,/);
  });

  it('gives the power of a screening plan for main effects', async () => {
    const d = await json([...factors(7), '--plackett-burman', '12', '--seed', '3', '--effect', '3', '--sigma', '1']);
    expect(d.power.model).toEqual(['A', 'B', 'C', 'D', 'E', 'F', 'G']);
    expect(d.power.residualDf).toBe(4);
    expect(d.power.standardError).toBeCloseTo(2 / Math.sqrt(12), 12);
  });

  it('refuses more factors than the design allows and run counts it does not offer', async () => {
    await expect(design.run([...factors(12), '--plackett-burman', '12'])).rejects.toThrow(/A 12-run Plackett-Burman design takes up to 11 factors, got 12/);
    await expect(design.run([...factors(5), '--plackett-burman', '16'])).rejects.toThrow(/--plackett-burman takes 12, 20 or 24 runs, got "16"/);
    await expect(design.run([...factors(5), '--plackett-burman', '12', '--fraction', '1/2'])).rejects.toThrow(/does not take a fraction/);
  });
});

describe('parseFactorOption', () => {
  it('reads numeric factors with units and log scales, and categorical factors', () => {
    expect(parseFactorOption('Temperature (degC)=160:200')).toEqual({ kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' });
    expect(parseFactorOption('Speed (rpm)=100:1000:log')).toEqual({ kind: 'numeric', name: 'Speed', low: 100, high: 1000, unit: 'rpm', scale: 'log' });
    expect(parseFactorOption('Powder=matte:gloss')).toEqual({ kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] });
  });
  it('refuses malformed factors (degenerate input)', () => {
    expect(() => parseFactorOption('')).toThrow(/expected NAME=LOW:HIGH/);
    expect(() => parseFactorOption('T=1')).toThrow(/two levels separated by ":"/);
    expect(() => parseFactorOption('T (degC)=a:b')).toThrow(/a unit needs numeric levels/);
    expect(() => parseFactorOption('T=a:b:log')).toThrow(/log scale needs numeric levels/);
    expect(() => parseFactorOption(' (degC)=1:2')).toThrow(/needs a name/);
  });
});

describe('the registered command', () => {
  it('runs through the command line with exit code 0, and 2 with a message on stderr', () => {
    const out = execFileSync('npx', ['tsx', 'src/cli/main.ts', 'design', '--factor', 'A=1:2', '--factor', 'B=1:2', '--seed', '1'], { encoding: 'utf8' });
    expect(out).toMatch(/^Plan: 2\^2 full factorial, 4 runs/);
    const bad = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'design', '--factor', 'A=1:2'], { encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/trialbook design: A factorial design needs at least 2 factors, got 1/);
  }, 30_000);
});

describe('design command: the plan title reads the foldover from the plan, not from its notes', () => {
  it('says "with its foldover" for a folded fraction only', async () => {
    const folded = await design.run([...SEVEN, '--fraction', '1/16', '--foldover', '--seed', '2']);
    expect(folded.split('\n')[0]).toBe('Plan: 2^(7-4) fractional factorial with its foldover, 16 runs');
    const plain = await design.run([...SEVEN, '--fraction', '1/16', '--seed', '2']);
    expect(plain.split('\n')[0]).toBe('Plan: 2^(7-4) fractional factorial, 8 runs');
  });
});

describe('design command: factor names and levels the other commands can use', () => {
  it('"A=B=1:2" is refused, not made a categorical factor with a level "B=1"', () => {
    expect(() => parseFactorOption('A=B=1:2')).toThrow(InputError);
    expect(() => parseFactorOption('A=B=1:2')).toThrow(/--factor "A=B=1:2": expected one "=" between the name and the levels \(NAME=LOW:HIGH\), got 2/);
  });
  it('a comma or colon in a name or level is refused, saying which and why', () => {
    expect(() => parseFactorOption('Temp, C=160:200')).toThrow(/--factor "Temp, C=160:200": The factor name "Temp, C" contains a comma \(","\), which Trialbook keeps as a separator/);
    expect(() => parseFactorOption('Powder=matte,fine:gloss')).toThrow(/The level "matte,fine" of Powder contains a comma/);
    expect(() => parseFactorOption('A:B (s)=1:2')).toThrow(/The factor name "A:B" contains a colon/);
  });
  it('a low above the high is refused with both settings', async () => {
    expect(() => parseFactorOption('Temperature (degC)=200:160')).toThrow(/Temperature: the low setting \(200\) is above the high setting \(160\)/);
    await expect(design.run(['--factor', 'T=2:1', '--factor', 'B=1:2'])).rejects.toThrow(/low setting \(2\) is above the high setting \(1\)/);
    // Negative settings read without --opt= quoting; -20 is below -10 (a valid pair).
    expect(parseFactorOption('Offset (mm)=-20:-10')).toEqual({ kind: 'numeric', name: 'Offset', low: -20, high: -10, unit: 'mm' });
  });
});

describe('design command: settings beyond what a calculation carries', () => {
  it('refuses 1e400 and NaN as a setting instead of making them level names', () => {
    expect(() => parseFactorOption('A=1:1e400')).toThrow(/--factor "A=1:1e400": needs finite settings or two level names, got "1e400"; 1e400 is beyond the largest number/);
    expect(() => parseFactorOption('A=NaN:2')).toThrow(/got "NaN"; "NaN" is not a measurement/);
  });
});
