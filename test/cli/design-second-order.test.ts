import { describe, expect, it } from 'vitest';
import { design } from '../../src/cli/commands/design.ts';
import { InputError } from '../../src/core/errors.ts';

const TWO = ['--factor', 'Time (min)=80:90', '--factor', 'Temperature (degF)=170:180'];
const THREE = [...TWO, '--factor', 'Pressure (bar)=2:4'];

describe('design --central-composite and --box-behnken', () => {
  it('the design of Montgomery 8th ed., Example 11.2: 13 runs, kinds factorial, axial and center, alpha 1.414, properties', async () => {
    const d = JSON.parse(await design.run([...TWO, '--central-composite', '--center-runs', '5', '--seed', '3', '--json']));
    expect(d.runs).toHaveLength(13);
    expect(new Set(d.runs.map((r: { kind: string }) => r.kind))).toEqual(new Set(['factorial', 'axial', 'center']));
    const axial = d.runs.filter((r: { kind: string }) => r.kind === 'axial').map((r: { real: Record<string, number> }) => r.real.Time).filter((t: number) => t !== 85).sort();
    expect(axial[0]).toBeCloseTo(77.93, 2); // printed axial settings (test/fixtures/montgomery-8e-ex11-2-ccd-yield.csv)
    expect(axial[1]).toBeCloseTo(92.07, 2);
    expect(d.secondOrder.alpha).toBeCloseTo(1.414, 3);
    expect(d.secondOrder.rotatable).toBe(true);
    expect(d.secondOrder.spv.center).toBeCloseTo(2.6, 10); // worked by hand, see test/core/design/central-composite.test.ts
    expect(d.secondOrder.warnings).toHaveLength(2);
    expect(d.secondOrder.caution).toHaveLength(3);
  });

  it('--blocks 2 with --center-runs N1,N2 and orthogonal blocking; the text report shows the warning and the caution', async () => {
    const d = JSON.parse(await design.run([...THREE, '--central-composite', '--blocks', '2', '--center-runs', '4,2', '--axial-distance', 'orthogonal', '--seed', '1', '--json']));
    // Box and Hunter (1957): alpha = sqrt(k (1 + ns0/ns) / (1 + nc0/nc)) = sqrt(3 x (1 + 2/6) / (1 + 4/8)) = 1.633
    expect(d.secondOrder.alpha).toBeCloseTo(Math.sqrt((3 * (1 + 2 / 6)) / (1 + 4 / 8)), 12);
    expect(d.secondOrder.blocksOrthogonal).toBe(true);
    expect(d.runs.filter((r: { kind: string; block: number }) => r.kind === 'center' && r.block === 1)).toHaveLength(4);
    expect(d.runs.filter((r: { kind: string; block: number }) => r.kind === 'center' && r.block === 2)).toHaveLength(2);
    const text = await design.run([...THREE, '--central-composite', '--seed', '1']);
    expect(text).toMatch(/^Plan: central composite design, 19 runs/);
    expect(text).toMatch(/outside the factorial range 80 to 90 min/);
    expect(text).toMatch(/within the machine's rated limits, whatever the model suggests/);
    const face = await design.run([...THREE, '--central-composite', '--axial-distance', 'face', '--seed', '1']);
    expect(face).not.toMatch(/Warning/);
  });

  it('--box-behnken: 12 + 3 runs for three factors, settings at low, center and high only', async () => {
    const d = JSON.parse(await design.run([...THREE, '--box-behnken', '--seed', '2', '--json']));
    expect(d.runs).toHaveLength(15); // Box and Behnken (1960): 12 runs before the center runs
    for (const r of d.runs) {
      expect([80, 85, 90]).toContain(r.real.Time);
      expect([170, 175, 180]).toContain(r.real.Temperature);
      expect([2, 3, 4]).toContain(r.real.Pressure);
    }
    const csv = await design.run([...THREE, '--box-behnken', '--seed', '2', '--csv']);
    expect(csv.trim().split('\n')).toHaveLength(16);
  });

  it('bad requests are refused and the two-level design keeps working', async () => {
    await expect(design.run([...THREE, '--central-composite', '--box-behnken'])).rejects.toThrow('Choose one design: --central-composite or --box-behnken, not both');
    await expect(design.run([...THREE, '--box-behnken', '--axial-distance', 'face'])).rejects.toThrow('--axial-distance does not apply to a Box-Behnken design');
    await expect(design.run([...TWO, '--central-composite', '--center-runs', '2,2'])).rejects.toThrow(/needs --blocks 2/);
    await expect(design.run([...TWO, '--central-composite', '--axial-distance', 'orthogonal'])).rejects.toThrow(/needs two blocks/);
    await expect(design.run([...TWO, '--central-composite', '--axial-distance', 'wide'])).rejects.toThrow(InputError);
    await expect(design.run([...TWO, '--factor', 'Powder=matte:gloss', '--central-composite'])).rejects.toThrow(/Powder is categorical/);
    const d = JSON.parse(await design.run([...TWO, '--center-runs', '3', '--seed', '1', '--json']));
    expect(d.runs).toHaveLength(7);
    expect(d.secondOrder).toBeUndefined();
  });
});
