/**
 * The JSON Schema file and the code agree: backups written by the export validate against
 * trialbook-backup.schema.json (checked with a small validator, below, for the keywords that
 * file uses, following JSON Schema 2020-12 Validation sections 6.1-6.5), files the schema
 * refuses are refused by the reader too, and the schema names every field the writer writes.
 */
import 'fake-indexeddb/auto';
import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseRunForm } from '../../../src/core/study/run-form.ts';
import { RUN_KINDS } from '../../../src/core/design/design.ts';
import { BACKUP_VERSION, readBackup, writeBackup } from '../../../src/io/backup/backup.ts';
import { APP_VERSION } from '../../../src/io/app-version.ts';
import { exportBackup } from '../../../src/store/files.ts';
import { createStudy } from '../../../src/store/studies.ts';
import { excludeRun, openNewRun, restoreRevision, saveRun, openRun } from '../../../src/store/runs.ts';
import { brandPlan, coatingPlan, freshStore } from '../../store/helpers.ts';
import { buildDesign } from '../../../src/core/design/build-design.ts';
import { studyPlan } from '../../../src/core/study/study.ts';

type Schema = Record<string, unknown>;
const schema: Schema = JSON.parse(readFileSync(fileURLToPath(new URL('../../../src/io/backup/trialbook-backup.schema.json', import.meta.url)), 'utf8'));

function typeOk(t: string, v: unknown): boolean {
  if (t === 'null') return v === null;
  if (t === 'array') return Array.isArray(v);
  if (t === 'object') return typeof v === 'object' && v !== null && !Array.isArray(v);
  if (t === 'integer') return Number.isInteger(v);
  return typeof v === t;
}

/** Errors of `v` against `s` (an empty list when valid). */
function validate(s: Schema, v: unknown, at = '$'): string[] {
  if (typeof s.$ref === 'string') {
    const target = (schema.$defs as Record<string, Schema>)[s.$ref.replace('#/$defs/', '')];
    const { $ref: _r, ...rest } = s;
    return [...validate(target, v, at), ...validate(rest, v, at)];
  }
  const errs: string[] = [];
  if (s.type !== undefined) {
    const types = Array.isArray(s.type) ? s.type : [s.type];
    if (!types.some((t) => typeOk(t as string, v))) return [`${at}: type ${types.join('|')}`];
  }
  if ('const' in s && v !== s.const) errs.push(`${at}: const ${String(s.const)}`);
  if (Array.isArray(s.enum) && !s.enum.includes(v)) errs.push(`${at}: enum`);
  if (typeof v === 'number') {
    if (typeof s.minimum === 'number' && v < s.minimum) errs.push(`${at}: minimum`);
  }
  if (typeof v === 'string') {
    if (typeof s.pattern === 'string' && !new RegExp(s.pattern, 'u').test(v)) errs.push(`${at}: pattern`);
    if (typeof s.maxLength === 'number' && [...v].length > s.maxLength) errs.push(`${at}: maxLength`);
    if (typeof s.minLength === 'number' && [...v].length < s.minLength) errs.push(`${at}: minLength`);
  }
  if (Array.isArray(v)) {
    if (typeof s.minItems === 'number' && v.length < s.minItems) errs.push(`${at}: minItems`);
    if (typeof s.maxItems === 'number' && v.length > s.maxItems) errs.push(`${at}: maxItems`);
    if (s.items) v.forEach((x, i) => errs.push(...validate(s.items as Schema, x, `${at}[${i}]`)));
  }
  if (typeOk('object', v)) {
    const o = v as Record<string, unknown>;
    for (const r of (s.required as string[] | undefined) ?? []) if (!(r in o)) errs.push(`${at}: required ${r}`);
    const props = (s.properties as Record<string, Schema> | undefined) ?? {};
    for (const [k, x] of Object.entries(o)) {
      if (props[k]) errs.push(...validate(props[k], x, `${at}.${k}`));
      else if (s.additionalProperties === false) errs.push(`${at}: additional ${k}`);
      else if (typeof s.additionalProperties === 'object') errs.push(...validate(s.additionalProperties as Schema, x, `${at}.${k}`));
    }
  }
  if (Array.isArray(s.oneOf)) {
    const passing = s.oneOf.filter((sub) => validate(sub as Schema, v, at).length === 0).length;
    if (passing !== 1) errs.push(`${at}: oneOf (${passing} match)`);
  }
  return errs;
}

let text = '';

beforeAll(async () => {
  const store = await freshStore();
  for (const plan of [coatingPlan(), brandPlan()]) {
    const study = await createStudy(store, plan);
    const state = await openNewRun(store, study.id, 1);
    const first = await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, readings: state.form.readings.map(() => '70 71'), operator: 'K. Demo', loggedAt: '2024-05-02T09:30:00Z' }) });
    const edit = await openRun(store, first.run.id);
    await saveRun(store, { ...edit, studyId: study.id, values: parseRunForm(study, { ...edit.form, notes: 'edited' }) });
    await excludeRun(store, first.run.id, 'test');
    await restoreRevision(store, first.run.id, first.revision.id);
  }
  text = await exportBackup(store);
});

describe('trialbook-backup.schema.json', () => {
  it('is for the version the code writes', () => {
    expect((schema.properties as Record<string, Schema>).formatVersion.const).toBe(BACKUP_VERSION);
  });

  it('lists the run kinds of the one list in the core (RUN_KINDS), and requires the fields version 2 added', () => {
    const defs = schema.$defs as Record<string, Schema>;
    expect(defs.runKind.enum).toEqual([...RUN_KINDS]);
    expect(defs.plannedRun.required).toContain('originBlock');
    expect(defs.response.required).toContain('lowerBound');
  });

  it('accepts a backup written by the export', () => {
    expect(validate(schema, JSON.parse(text))).toEqual([]);
  });

  it('names every field the writer writes (with additionalProperties false everywhere it matters)', () => {
    const doc = JSON.parse(text);
    doc.payload.revisions[0].extra = 1;
    expect(validate(schema, doc)).toEqual(['$.payload.revisions[0]: additional extra']);
  });

  it('refuses what the reader refuses, for a sample of broken files', async () => {
    const doc = JSON.parse(text);
    const broken: [string, (d: typeof doc) => void][] = [
      ['a reading that is text', (d) => (d.payload.revisions[0].readings[0][0] = '70')],
      ['a missing counter', (d) => delete d.payload.revisions[0].rev],
      ['a bad id', (d) => (d.payload.revisions[0].id = 'has space')],
      ['an unknown goal', (d) => (d.payload.studies[0].responses[0].goal = 'best')],
      ['a letter I', (d) => (d.payload.studies[0].factors[0].letter = 'I')],
      ['an unknown run kind', (d) => (d.payload.studies[0].design.runs[0].kind = 'star')],
      ['a missing block of origin', (d) => delete d.payload.studies[0].design.runs[0].originBlock],
      ['a lower bound that is text', (d) => (d.payload.studies[0].responses[0].lowerBound = '0')],
      ['a third level', (d) => d.payload.studies.flatMap((s: { factors: { levels?: string[] }[] }) => s.factors).find((f: { levels?: string[] }) => f.levels)!.levels!.push('x')],
    ];
    for (const [what, change] of broken) {
      const d = structuredClone(doc);
      change(d);
      expect(validate(schema, d).length, what).toBeGreaterThan(0);
      const resigned = await writeBackup(d.payload, { device: d.device, exportedAt: d.exportedAt, scope: d.scope }).catch((e) => e);
      if (typeof resigned === 'string') await expect(readBackup(resigned), what).rejects.toThrow();
    }
  });

  it('carries the screening entry of a Plackett-Burman study through the export and back', async () => {
    const store = await freshStore();
    // A 12-run Plackett-Burman plan for 4 factors (Plackett and Burman 1946), invented factor names.
    const design = buildDesign({
      factors: ['P', 'Q', 'R', 'S'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 1 })),
      plackettBurman: 12,
      seed: 3,
    });
    const made = await createStudy(store, studyPlan('Invented screening plan', 'INVENTED DEMO DATA.', [{ name: 'Yield', goal: 'maximize' }], design));
    expect(made.design.screening).toEqual(design.screening);
    const written = await exportBackup(store);
    expect(validate(schema, JSON.parse(written))).toEqual([]);
    const back = await readBackup(written);
    expect(back.payload.studies[0].design.screening).toEqual({ kind: 'plackett-burman', runs: 12, source: design.screening!.source });
    const doc = JSON.parse(written);
    doc.payload.studies[0].design.screening.runs = 16;
    expect(validate(schema, doc)).toEqual(['$.payload.studies[0].design.screening.runs: enum']);
    const resigned = await writeBackup(doc.payload, { device: doc.device, exportedAt: doc.exportedAt, scope: doc.scope }).catch((e) => e);
    if (typeof resigned === 'string') await expect(readBackup(resigned)).rejects.toThrow('screening.runs: needs one of 12, 20, 24 runs, got 16');
  });

  it('the app version in backups is package.json\'s', () => {
    const pkg = JSON.parse(readFileSync(fileURLToPath(new URL('../../../package.json', import.meta.url)), 'utf8'));
    expect(APP_VERSION).toBe(pkg.version);
  });
});
