/**
 * Fuzzed imports: a real backup (written by the store's export) is cut short, has fields
 * replaced by values of the wrong type, a wrong format version, duplicated records, huge
 * numbers, markup or control characters in its text, lists and objects nested from 2 to 200,000
 * levels deep, and is re-signed with a correct checksum half of the time so that the field
 * checks are reached; files just under and over the size limit are read too. Every case must end in a clean import or an InputError
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
  | { kind: 'huge'; path: number; text: string }
  | { kind: 'nest'; path: number; depth: number; object: boolean; resign: boolean }
  | { kind: 'control'; path: number; text: string; resign: boolean };

/** Control characters and terminal escapes (C0, DEL, C1, bidirectional overrides). */
const controlText = fc
  .array(fc.oneof(fc.integer({ min: 0, max: 0x1f }), fc.constantFrom(0x7f, 0x85, 0x9b, 0x202e, 0x2028, 0xfeff), fc.integer({ min: 0x20, max: 0x7e })), { minLength: 1, maxLength: 20 })
  .map((codes) => String.fromCharCode(...codes));

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant('truncate' as const), at: fc.double({ min: 0, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constant('replace' as const), path: fc.nat(), value: hostile, resign: fc.boolean() }),
  fc.record({ kind: fc.constant('remove' as const), path: fc.nat(), resign: fc.boolean() }),
  fc.record({ kind: fc.constant('version' as const), value: fc.oneof(fc.integer({ min: -5, max: 1000 }) as fc.Arbitrary<Json>, fc.string() as fc.Arbitrary<Json>, fc.constant<Json>(null)) }),
  fc.record({ kind: fc.constant('duplicate' as const), list: fc.constantFrom('studies' as const, 'revisions' as const), index: fc.nat(), resign: fc.boolean() }),
  fc.record({ kind: fc.constant('huge' as const), path: fc.nat(), text: fc.constantFrom('1e400', '-1e400', '123456789012345678901234567890', '1e-400') }),
  fc.record({
    kind: fc.constant('nest' as const),
    path: fc.nat(),
    depth: fc.oneof(fc.integer({ min: 2, max: 70 }), fc.constantFrom(63, 64, 65, 3000, 12_000, 200_000)),
    object: fc.boolean(),
    resign: fc.boolean(),
  }),
  fc.record({ kind: fc.constant('control' as const), path: fc.nat(), text: fc.oneof(controlText, fc.constantFrom('\u001b]0;owned\u0007', '\u001b[2J\u001b[31mred', 'a\u0000b', '\r\n\t')), resign: fc.boolean() }),
);

/** A list (or object) nested `depth` deep around 1, built without recursion. */
function nested(depth: number, object: boolean): Json {
  let v: Json = 1;
  for (let i = 0; i < depth; i++) v = object ? { a: v } : [v];
  return v;
}

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
    case 'nest': {
      const p = all[m.path % all.length];
      if (m.depth <= 64) {
        // Shallow enough to build and sign as a value: the field checks are reached.
        const d = setAt(doc, p, nested(m.depth, m.object));
        return JSON.stringify(m.resign ? resign(d) : d);
      }
      // Deeper: written as text (building it as a value would need a recursive writer).
      const marker = '"__NEST__"';
      const open = m.object ? '{"a":' : '[';
      const close = m.object ? '}' : ']';
      return JSON.stringify(setAt(doc, p, '__NEST__')).replace(marker, open.repeat(m.depth) + '1' + close.repeat(m.depth));
    }
    case 'control': {
      // Every text field but the checksum's (which re-signing writes again) and a reason (which
      // a run that is not excluded drops by the record checks).
      const strings = all.filter((p) => {
        if (p[0] === 'checksum' || p[p.length - 1] === 'reason') return false;
        let v: Json = doc;
        for (const k of p) v = (v as Record<string | number, Json>)[k];
        return typeof v === 'string';
      });
      const d = setAt(doc, strings[m.path % strings.length], m.text);
      return JSON.stringify(m.resign ? resign(d) : d);
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

  it('nesting: deeper than 64 levels is refused with its line and column, whatever the depth, before any walk', () => {
    fc.assert(
      fc.property(fc.nat(), fc.integer({ min: 65, max: 300_000 }), fc.boolean(), (path, depth, object) => {
        const text = apply({ kind: 'nest', path, depth, object, resign: false });
        expect(() => readBackupSync(text)).toThrow(/nests lists and objects deeper than 64 levels at line 1, column \d+; .*Nothing was imported/);
      }),
      { numRuns: 60 },
    );
  }, 120_000);

  it('control characters in any text field are refused clearly or kept as written', () => {
    fc.assert(
      fc.property(fc.nat(), controlText, (path, text) => {
        const file = apply({ kind: 'control', path, text, resign: true });
        let b;
        try {
          b = readBackupSync(file);
        } catch (err) {
          expectClearError(err);
          return;
        }
        // Kept as written, but for the surrounding white space that operator and reason drop.
        const kept = text.trim();
        if (kept !== '') expect(JSON.stringify(b)).toContain(JSON.stringify(kept).slice(1, -1));
      }),
      { numRuns: 300 },
    );
  });

  it('size: a file of exactly the limit imports; one byte more is refused, naming the size, and changes nothing', async () => {
    const { MAX_BACKUP_BYTES } = await import('../../../src/io/backup/backup-size.ts');
    const store = await freshStore();
    // Trailing whitespace is allowed after a JSON text (RFC 8259 section 2), so padding keeps the file valid.
    const extraBytes = Buffer.byteLength(original, 'utf8') - original.length; // '°C', 'µm' take two bytes
    const atLimit = original.padEnd(MAX_BACKUP_BYTES - extraBytes, ' ');
    expect(Buffer.byteLength(atLimit, 'utf8')).toBe(MAX_BACKUP_BYTES);
    expect((await importBackup(store, atLimit)).revisionsAdded).toBe(doc.counts && (doc.counts as { revisions: number }).revisions);
    const before = canonicalJson(await payloadOf(store));
    let err: unknown;
    try {
      await importBackup(store, atLimit + ' ');
    } catch (e) {
      err = e;
    }
    expectClearError(err);
    expect((err as Error).message).toMatch(/^This backup file is 128\.0 MB; Trialbook reads backups of up to 128 MB \(134,217,728 bytes\)/);
    expect(canonicalJson(await payloadOf(store))).toBe(before);
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
