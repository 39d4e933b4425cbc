/**
 * Fuzzed imports: a real backup (written by the store's export) is cut short, has fields
 * replaced by values of the wrong type, a wrong format version, duplicated records, huge
 * numbers or markup in its text, and is re-signed with a correct checksum half of the time so
 * that the field checks are reached. Every case must end in a clean import or an InputError
 * with a readable message (never another exception), and a failed import must change nothing.
 */
import 'fake-indexeddb/auto';
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError } from '../../../src/core/errors.ts';
import { parseRunForm } from '../../../src/core/study/run-form.ts';
import { readBackupSync } from '../../../src/io/backup/backup.ts';
import { canonicalJson } from '../../../src/core/records/canonical-json.ts';
import { sha256, toHex, utf8Encode } from '../../../src/core/records/sha256.ts';
import { exportBackup, importBackup, payloadOf } from '../../../src/store/files.ts';
import { createStudy } from '../../../src/store/studies.ts';
import { excludeRun, openNewRun, saveRun } from '../../../src/store/runs.ts';
import type { Store } from '../../../src/store/store.ts';
import { brandPlan, coatingPlan, freshStore } from '../../store/helpers.ts';

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

let original = '';
let doc: { [k: string]: Json };

async function makeBackup(): Promise<string> {
  const store = await freshStore({ now: () => new Date('2024-05-02T10:00:00Z') });
  for (const plan of [coatingPlan(), brandPlan()]) {
    const study = await createStudy(store, plan);
    for (const planned of [1, 2, 3]) {
      const state = await openNewRun(store, study.id, planned);
      const res = await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, readings: state.form.readings.map((_, i) => `${60 + planned + i} ${61 + planned}`), notes: 'panel ok' }) });
      if (planned === 2) await excludeRun(store, res.run.id, 'belt stopped');
    }
  }
  return exportBackup(store);
}

function paths(v: Json, at: (string | number)[] = []): (string | number)[][] {
  const out = [at];
  if (Array.isArray(v)) v.forEach((x, i) => out.push(...paths(x, [...at, i])));
  else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) out.push(...paths(x, [...at, k]));
  return out;
}

function setAt(root: Json, path: (string | number)[], value: Json | undefined): Json {
  if (path.length === 0) return value as Json;
  const copy: Json = Array.isArray(root) ? [...root] : { ...(root as object) };
  const [k, ...rest] = path;
  const child = (copy as Record<string | number, Json>)[k];
  if (rest.length === 0 && value === undefined) {
    if (Array.isArray(copy)) copy.splice(k as number, 1);
    else delete (copy as Record<string, Json>)[k as string];
  } else (copy as Record<string | number, Json>)[k] = setAt(child, rest, value);
  return copy;
}

/** Re-signs a document so its checksum and counts match its (mutated) payload. */
function resign(d: Json): Json {
  if (!d || typeof d !== 'object' || Array.isArray(d) || d.payload === undefined) return d;
  try {
    return { ...d, checksum: { algorithm: 'SHA-256', value: toHex(sha256(utf8Encode(canonicalJson(d.payload)))) } };
  } catch {
    return d;
  }
}

const hostile: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(null, true, false, 0, -1, 1e308, -1e308, 2 ** 53 + 1, 5e-324, '', ' ', [], {}, [[]], { id: 'x' }),
  fc.constantFrom<Json>('<script>alert(1)</script>', '<img src=x onerror=alert(1)>', '=HYPERLINK("http://x")', '"; DROP TABLE runs; --', '\u0000\u202e', 'A'.repeat(200_001)),
  fc.string(),
  fc.double(),
  fc.integer(),
  fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>,
);

type Mutation =
  | { kind: 'truncate'; at: number }
  | { kind: 'replace'; path: number; value: Json; resign: boolean }
  | { kind: 'remove'; path: number; resign: boolean }
  | { kind: 'version'; value: Json }
  | { kind: 'duplicate'; list: 'studies' | 'revisions'; index: number; resign: boolean }
  | { kind: 'huge'; path: number; text: string };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant('truncate' as const), at: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant('replace' as const), path: fc.nat(), value: hostile, resign: fc.boolean() }),
  fc.record({ kind: fc.constant('remove' as const), path: fc.nat(), resign: fc.boolean() }),
  fc.record({ kind: fc.constant('version' as const), value: fc.oneof(fc.integer({ min: -5, max: 1000 }) as fc.Arbitrary<Json>, fc.string() as fc.Arbitrary<Json>, fc.constant<Json>(null)) }),
  fc.record({ kind: fc.constant('duplicate' as const), list: fc.constantFrom('studies' as const, 'revisions' as const), index: fc.nat(), resign: fc.boolean() }),
  fc.record({ kind: fc.constant('huge' as const), path: fc.nat(), text: fc.constantFrom('1e400', '-1e400', '123456789012345678901234567890', '1e-400') }),
);

function apply(m: Mutation): string {
  const all = paths(doc);
  switch (m.kind) {
    case 'truncate':
      return original.slice(0, Math.floor(m.at * (original.length - 1)));
    case 'replace': {
      const d = setAt(doc, all[m.path % all.length], m.value);
      return JSON.stringify(m.resign ? resign(d) : d);
    }
    case 'remove': {
      const p = all[1 + (m.path % (all.length - 1))];
      const d = setAt(doc, p, undefined);
      return JSON.stringify(m.resign ? resign(d) : d);
    }
    case 'version':
      return JSON.stringify({ ...doc, formatVersion: m.value });
    case 'duplicate': {
      const payload = doc.payload as { [k: string]: Json[] };
      const items = payload[m.list];
      const d = { ...doc, payload: { ...payload, [m.list]: [...items, items[m.index % items.length]] } };
      return JSON.stringify(m.resign ? resign(d) : d);
    }
    case 'huge': {
      const numeric = all.filter((p) => {
        let v: Json = doc;
        for (const k of p) v = (v as Record<string | number, Json>)[k];
        return typeof v === 'number';
      });
      const p = numeric[m.path % numeric.length];
      const marker = '"__HUGE__"';
      const d = resign(setAt(doc, p, '__HUGE__'));
      return JSON.stringify(d).replace(marker, m.text);
    }
  }
}

function expectClearError(err: unknown) {
  expect(err).toBeInstanceOf(InputError);
  const msg = (err as Error).message;
  expect(msg.length).toBeGreaterThan(10);
  expect(msg).not.toMatch(/undefined|\[object Object\]|Cannot read prop|is not a function|NaN/);
}

beforeAll(async () => {
  original = await makeBackup();
  doc = JSON.parse(original);
});

describe('fuzzed backup files', () => {
  it('reading: a clean result or a clear InputError, never another exception (3000 cases)', () => {
    let refused = 0;
    fc.assert(
      fc.property(mutation, (m) => {
        const text = apply(m);
        try {
          const b = readBackupSync(text);
          expect(b.counts.revisions).toBe(b.payload.revisions.length);
        } catch (err) {
          refused++;
          expectClearError(err);
        }
      }),
      { numRuns: 3000 },
    );
    expect(refused).toBeGreaterThan(1000); // most mutations break something
  }, 120_000);

  it('importing into a store that holds records: all or nothing (300 cases)', async () => {
    const store: Store = await freshStore();
    await importBackup(store, original);
    const snapshot = async () => canonicalJson({ ...(await payloadOf(store)), runs: await store.db.runs.toArray() });
    let before = await snapshot();
    await fc.assert(
      fc.asyncProperty(mutation, async (m) => {
        const text = apply(m);
        try {
          await importBackup(store, text);
        } catch (err) {
          expectClearError(err);
          expect(await snapshot()).toBe(before);
          return;
        }
        before = await snapshot(); // a clean import (the file was still valid): the new state
      }),
      { numRuns: 300 },
    );
  }, 120_000);

  it('markup in text is kept as text, byte for byte', async () => {
    const store = await freshStore();
    const plan = { ...coatingPlan(), title: '<b onmouseover="alert(1)">Trial</b> & "quotes"' };
    const study = await createStudy(store, plan);
    const state = await openNewRun(store, study.id, 1);
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, notes: '<script>alert("x")</script>\n=1+2' }) });
    const other = await freshStore();
    await importBackup(other, await exportBackup(store));
    const [s] = await other.db.studies.toArray();
    const [r] = await other.db.runs.toArray();
    expect(s.title).toBe(plan.title);
    expect(r.notes).toBe('<script>alert("x")</script>\n=1+2');
  });
});
