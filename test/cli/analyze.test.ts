import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { fixturePath } from '../helpers/fixtures.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const etch = fixturePath('montgomery-8e-ex6-1-plasma-etch-2x3.csv');
const filtration = fixturePath('montgomery-8e-ex6-2-filtration-2x4.csv');

describe('analyze command', () => {
  it('prints every JSON field the README lists (Montgomery 8th ed., Example 6.1 data)', async () => {
    const out = JSON.parse(await analyze.run([etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--terms', 'A*B*C', '--json']));
    for (const key of ['coding', 'intercept', 'terms', 'df', 'sigma', 'r2', 'r2adj', 'r2pred', 'anova', 'runs', 'warnings']) expect(out).toHaveProperty(key);
    expect(out.coding.Gap).toMatchObject({ letter: 'A', low: 0.8, high: 1.2 });
    expect(out.anova.type).toBe('sequential');
    const a = out.terms.find((t: { letters: string }) => t.letters === 'A');
    expect(a.effect).toBeCloseTo(-101.625, 10); // Montgomery 8th ed., Table 6.5
    expect(a.effect).toBeCloseTo(2 * a.coef, 12);
    expect(out.df).toMatchObject({ residual: 8, pureError: 8, lackOfFit: 0 });
    expect(out.runs[0]).toHaveProperty('studentized');
    expect(out.lenth).toBeUndefined();
  });

  it('reports Lenth and lenthT when the residual df is 0 (Montgomery 8th ed., Example 6.2 data)', async () => {
    const out = JSON.parse(
      await analyze.run([filtration, '--factors', 'Temperature,Pressure,Concentration,Stirring', '--response', 'Filtration rate', '--order', '4', '--json']),
    );
    expect(out.lenth.pse).toBeCloseTo(2.625, 10); // recomputed by hand from the printed effects
    expect(out.sigma).toBeNull();
    expect(out.terms[0].lenthT).toBeCloseTo(21.625 / 2.625, 10);
    expect(out.terms[0].se).toBeNull();
  });

  it('readable report in plain words', async () => {
    const text = await analyze.run([etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate']);
    expect(text).toMatch(/noise \(residual SD\)/);
    expect(text).toMatch(/explained \(R\^2\)/);
    expect(text).toMatch(/cross-validated \(predicted R\^2\)/);
    expect(text).toMatch(/Gap: 0.8 cm -> -1, 1.2 cm -> \+1/);
    expect(text).toMatch(/ANOVA, sequential/);
  });

  it('categorical levels from --levels', async () => {
    const out = JSON.parse(await analyze.run([etch, '--factors', 'Gap,Flow', '--response', 'Etch rate', '--levels', 'Gap=1.2:0.8', '--json']));
    expect(out.coding.Gap).toMatchObject({ low: 1.2, high: 0.8 });
  });

  it('reads a Trialbook backup and the CSV the app exports, skipping excluded runs (invented demo data)', async () => {
    const backup = fixturePath('trialbook-demo-backup.json');
    const study = 'Invented demo: powder-coating cure trial';
    const fromBackup = JSON.parse(await analyze.run([backup, '--study', study, '--response', 'Gloss', '--json']));
    expect(fromBackup.warnings.join(' ')).toMatch(/1 excluded run skipped/);
    const { csv } = await import('../../src/cli/commands/csv.ts');
    const { writeFileSync, mkdtempSync } = await import('node:fs');
    const { join } = await import('node:path');
    const { tmpdir } = await import('node:os');
    const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'export.csv');
    writeFileSync(file, await csv.run([backup, '--study', study]));
    const fromCsv = JSON.parse(await analyze.run([file, '--response', 'Gloss', '--json']));
    // the same runs, the same coding, so the same fit
    expect(fromCsv.n).toBe(fromBackup.n);
    expect(fromCsv.coding).toEqual(fromBackup.coding);
    fromCsv.terms.forEach((t: { coef: number }, i: number) => expect(t.coef).toBeCloseTo(fromBackup.terms[i].coef, 10));
    await expect(analyze.run([backup, '--response', 'Gloss'])).rejects.toThrow(/--study/);
  });

  it('--study takes a unique part of a title, ignoring case (invented demo backup)', async () => {
    const backup = fixturePath('trialbook-demo-backup.json');
    const whole = JSON.parse(await analyze.run([backup, '--study', 'Invented demo: powder-coating cure trial', '--response', 'Gloss', '--json']));
    const part = JSON.parse(await analyze.run([backup, '--study', 'CURE TRIAL', '--response', 'Gloss', '--json']));
    expect(part).toEqual(whole);
    await expect(analyze.run([backup, '--study', 'no such words', '--response', 'Gloss'])).rejects.toThrow(/or with a title that contains it/);
  });

  it('the report says which label is -1 when a categorical coding comes from the file order, not with --levels (invented data)', async () => {
    const { writeFileSync, mkdtempSync } = await import('node:fs');
    const { join } = await import('node:path');
    const { tmpdir } = await import('node:os');
    const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'brands.csv');
    // INVENTED: a 2^2 in two factors, one of them a powder brand, gloss in GU.
    writeFileSync(file, 'Temperature,Powder,Gloss\n160,north,60\n200,north,70\n160,south,65\n200,south,78\n160,north,61\n200,south,77\n');
    const fromOrder = await analyze.run([file, '--factors', 'Temperature,Powder', '--response', 'Gloss', '--terms', 'A+B']);
    expect(fromOrder).toContain('Powder: north -> -1, south -> +1 (two named levels; "north" is -1 as the first label in the file: give --levels to choose)');
    const given = await analyze.run([file, '--factors', 'Temperature,Powder', '--response', 'Gloss', '--terms', 'A+B', '--levels', 'Powder=south:north']);
    expect(given).toContain('Powder: south -> -1, north -> +1 (two named levels)');
    expect(given).toMatch(/Fitted equation in coded units/);
  });

  it('bad input: clear messages', async () => {
    await expect(analyze.run([etch, '--factors', 'Gap,Pressure', '--response', 'Etch rate'])).rejects.toThrow(/"Pressure" is not in the file/);
    await expect(analyze.run([etch, '--factors', 'Gap', '--response', 'Etch rate', '--terms', 'A', '--order', '2'])).rejects.toThrow(/either --terms or --order/);
    await expect(analyze.run(['missing.csv', '--factors', 'A', '--response', 'y'])).rejects.toThrow(/does not exist/);
    await expect(analyze.run([etch, '--factors', 'Gap', '--response', 'Etch rate', '--bogus'])).rejects.toThrow(/bogus/);
  });

  it('the real command line: exit 0 with a report, exit 2 with a message on stderr', () => {
    const ok = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'analyze', etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--json'], { cwd: root, encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).n).toBe(16);
    const bad = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'analyze', etch, '--factors', 'Gap', '--response', 'Nope'], { cwd: root, encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/trialbook analyze: The response column "Nope" is not in the file/);
    expect(bad.stdout).toBe('');
  }, 60_000);
});

describe('analyze command: floor data keys (vif, boxCox, transform)', () => {
  it('every term carries vif (1 in the orthogonal Example 6.1 design; Montgomery, Peck and Vining, 5th ed., section 9.4), boxCox and transform are given', async () => {
    const out = JSON.parse(await analyze.run([etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--json']));
    expect(out.intercept.vif).toBeNull();
    for (const t of out.terms) expect(t.vif).toBeCloseTo(1, 10);
    expect(out.transform).toBe('none');
    expect(out.boxCox).toMatchObject({ suggestion: expect.any(String) });
    expect(out.boxCox.ci).toHaveLength(2);
    const logged = JSON.parse(await analyze.run([etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--transform', 'log', '--json']));
    expect(logged.transform).toBe('log');
    // Box-Cox is always about the untransformed response: the same figures under any transform
    expect(logged.boxCox.lambda).toBeCloseTo(out.boxCox.lambda, 9);
  });
  it('a transform token it does not know is refused, saying what it needs', async () => {
    await expect(analyze.run([etch, '--factors', 'Gap,Flow,Power', '--response', 'Etch rate', '--transform', 'cube'])).rejects.toThrow('A transform needs none, log, sqrt, inverse or power=L');
  });
});
