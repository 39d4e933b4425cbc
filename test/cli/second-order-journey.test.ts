/**
 * An invented study from screening to the best setting on the command line (invented process and
 * numbers, not data): a 2^(4-1) fraction with center runs, the path of steepest ascent, a new 2^2
 * with center runs around the path's best point, its augmentation into a central composite design,
 * and the best setting. The invented process has its peak at 190 degC and 33 min, which the last
 * step must find (the check is against the process we made up, so it could fail).
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { augment } from '../../src/cli/commands/augment.ts';
import { design } from '../../src/cli/commands/design.ts';
import { path } from '../../src/cli/commands/path.ts';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { plannedSetting } from '../../src/core/design/planned-settings.ts';
import { studyPlan, type RunRevision, type StudyRecord } from '../../src/core/study/study.ts';
import { readBackupSync, writeBackup } from '../../src/io/backup/backup.ts';
import { selectStudy } from '../../src/io/backup/select-study.ts';

/** The invented process: a peak of 90 at 190 degC and 33 min; Speed and Pressure do nothing; a small fixed wobble stands for noise. */
function process(temp: number, time: number, i: number): number {
  return 90 - 0.02 * (temp - 190) ** 2 - 0.3 * (time - 33) ** 2 - 0.01 * (temp - 190) * (time - 33) + 0.1 * Math.sin(7 * i);
}

const dir = mkdtempSync(join(tmpdir(), 'trialbook-journey-'));

describe('an invented study from a screening fraction to the best setting', () => {
  it('fraction -> path -> new 2^2 around the best point -> augmented central composite -> best setting', async () => {
    // 1. Screening: a 2^(4-1) fraction with 3 center runs.
    const screen = JSON.parse(
      await design.run(['--factor', 'Temperature (degC)=150:170', '--factor', 'Time (min)=20:26', '--factor', 'Speed=2:4', '--factor', 'Pressure=1:2', '--fraction', '1/2', '--center-runs', '3', '--seed', '11', '--json']),
    );
    const rows = screen.runs.map((r: { real: Record<string, number> }, i: number) => [r.real.Temperature, r.real.Time, r.real.Speed, r.real.Pressure, process(r.real.Temperature, r.real.Time, i).toFixed(3)].join(','));
    const first = join(dir, 'screen.csv');
    writeFileSync(first, ['Temperature,Time,Speed,Pressure,Strength', ...rows].join('\n') + '\n');
    const cols = ['--factors', 'Temperature,Time,Speed,Pressure', '--response', 'Strength', '--levels', 'Temperature=150:170,Time=20:26,Speed=2:4,Pressure=1:2'];

    // 2. The path of steepest ascent; "run" each step and keep the best.
    const p = JSON.parse(await path.run([first, ...cols, '--order', '1', '--base', 'Temperature', '--step', '5', '--steps', '10', '--json']));
    const observed = p.steps.map((s: { real: Record<string, number> }, i: number) => process(s.real.Temperature, s.real.Time, 100 + i));
    const best = p.steps[observed.indexOf(Math.max(...observed))].real;
    expect(best.Temperature).toBeGreaterThan(170); // the path left the first region
    expect(p.caution).toHaveLength(3);

    // 3. A new 2^2 with 3 center runs around the path's best point, logged on the "floor".
    const t0 = Math.round(best.Temperature);
    const m0 = Math.round(best.Time);
    const d = buildDesign({ factors: [{ kind: 'numeric', name: 'Temperature', unit: 'degC', low: t0 - 8, high: t0 + 8 }, { kind: 'numeric', name: 'Time', unit: 'min', low: m0 - 3, high: m0 + 3 }], centerRuns: 3, seed: 5 });
    const study: StudyRecord = { ...studyPlan('Invented: cure strength near the path best point', 'invented journey', [{ name: 'Strength', goal: 'maximize', lowerBound: null }], d), id: 'journey-study', device: 'dev-1', createdAt: '2026-01-01T00:00:00Z' };
    const revision = (s: StudyRecord, run: number, coded: readonly number[], i: number): RunRevision => {
      const actual = s.factors.map((f, j) => plannedSetting(f, coded[j]));
      return { id: `rev-${s.id}-${run}`, runId: `run-${s.id}-${run}`, studyId: s.id, plannedRun: run, rev: 1, device: 'dev-1', parents: [], restoredFrom: null, savedAt: '2026-01-02T00:00:00Z', actual, readings: [[Number(process(actual[0] as number, actual[1] as number, i).toFixed(3))]], loggedAt: null, operator: null, notes: '', excluded: false, reason: '' };
    };
    const revisions = d.runs.map((r, i) => revision(study, r.run, r.coded, 200 + i));
    const backupFile = join(dir, 'second.json');
    writeFileSync(backupFile, await writeBackup({ studies: [study], revisions }, { device: 'dev-1', exportedAt: '2026-01-02T00:00:00Z', scope: 'all' }));

    // 4. Augment into a central composite design in the same study; "run" the added block.
    const augmented = readBackupSync(await augment.run([backupFile, '--study', 'journey-study', '--axial', '--seed', '3']));
    expect(augmented.payload.studies).toHaveLength(1); // the same study, not a new one
    const ccd = selectStudy(augmented, 'journey-study');
    const added = ccd.design.runs.filter((r) => r.block === 2);
    expect(added).toHaveLength(7); // 4 axial + 3 center
    const moreRevisions = added.map((r, i) => revision(ccd, r.run, r.coded, 300 + i));
    const finalFile = join(dir, 'final.json');
    writeFileSync(finalFile, await writeBackup({ ...augmented.payload, revisions: [...augmented.payload.revisions, ...moreRevisions] }, { device: 'dev-1', exportedAt: '2026-01-03T00:00:00Z', scope: 'all' }));

    // 5. The quadratic analysis finds the invented peak: 190 degC, 33 min, strength 90.
    const out = JSON.parse(await analyze.run([finalFile, '--study', ccd.id, '--response', 'Strength', '--terms', 'quadratic', '--json']));
    const so = out.secondOrder;
    expect(so.goal).toBe('max'); // the study's own goal
    expect(so.nature).toBe('maximum');
    expect(so.stationary.real.Temperature).toBeCloseTo(190, 0);
    expect(so.stationary.real.Time).toBeCloseTo(33, 0);
    expect(so.stationary.fit).toBeCloseTo(90, 0);
    // Inside the box, the best setting is the stationary point itself.
    expect(so.stationary.inside).toBe(true);
    expect(so.optimum.real.Temperature).toBeCloseTo(so.stationary.real.Temperature, 6);
    expect(so.optimum.real.Time).toBeCloseTo(so.stationary.real.Time, 6);
    expect(readFileSync(finalFile, 'utf8')).toMatch(/trialbook-backup/);
  });
});
