/**
 * The whole path of a Plackett-Burman study: planned by the core, stored, logged, exported as a
 * backup and analyzed by the command line, which fits main effects by default, applies Lenth's
 * method over the design's 11 orthogonal columns and warns of partial aliasing. The responses
 * are INVENTED; the expected contrasts are x_j . y / 6 for the 12-run table (Plackett and Burman 1946).
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { plackettBurmanTable } from '../../src/core/design/plackett-burman.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { studyPlan } from '../../src/core/study/study.ts';
import { exportBackup } from '../../src/store/files.ts';
import { createStudy } from '../../src/store/studies.ts';
import { openNewRun, saveRun } from '../../src/store/runs.ts';
import { freshStore } from '../store/helpers.ts';

describe('analyze: a Plackett-Burman study from a backup', () => {
  it('main effects by default, Lenth over all 11 columns, the partial-aliasing verdict; --terms still wins', async () => {
    const store = await freshStore();
    const design = buildDesign({
      factors: ['Heat', 'Dwell', 'Feed', 'Gap', 'Coolant'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 10 })),
      plackettBurman: 12,
      seed: 11,
    });
    const study = await createStudy(store, studyPlan('Invented press screen', 'INVENTED DEMO DATA.', [{ name: 'Strength', goal: 'maximize' }], design));
    const table = plackettBurmanTable(12);
    const yOf = (row: number[], i: number) => 40 + 3 * row[0] - 2 * row[3] + 0.3 * Math.sin(i + 1); // INVENTED
    for (const r of design.runs) {
      const state = await openNewRun(store, study.id, r.run);
      const row = table[r.standardOrder! - 1];
      const form = { ...state.form, actual: r.coded.map((c) => String(5 + 5 * c)), readings: [String(yOf(row, r.standardOrder! - 1))], loggedAt: '2024-05-02T09:30:00Z' };
      await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, form) });
    }
    const file = join(mkdtempSync(join(tmpdir(), 'trialbook-')), 'screen.json');
    writeFileSync(file, await exportBackup(store));

    const out = JSON.parse(await analyze.run([file, '--study', 'press screen', '--response', 'Strength', '--json']));
    expect(out.terms.map((t: { letters: string }) => t.letters)).toEqual(['A', 'B', 'C', 'D', 'E']);
    expect(out.lenth.m).toBe(11);
    const y = table.map((row, i) => yOf(row, i));
    const col7 = out.lenth.effects.find((e: { letters: string }) => e.letters === 'col7');
    expect(col7.effect).toBeCloseTo(table.reduce((s, row, i) => s + row[6] * y[i], 0) / 6, 8);
    expect(out.verdicts.some((v: { kind: string }) => v.kind === 'partial-aliasing')).toBe(true);

    const text = await analyze.run([file, '--study', 'press screen', '--response', 'Strength']);
    expect(text).toContain('This is a 12-run Plackett-Burman screening design');
    expect(text).toContain("Lenth's method over 11 effects");

    const withTerms = JSON.parse(await analyze.run([file, '--study', 'press screen', '--response', 'Strength', '--terms', 'A+B+A:B', '--json']));
    expect(withTerms.terms.map((t: { letters: string }) => t.letters)).toEqual(['A', 'B', 'AB']);
  });
});
