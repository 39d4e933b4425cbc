/**
 * Model-based property test: random sequences of create, log, edit, exclude, export, import and
 * reload on two devices, run against the real store and against a plain in-memory model written
 * here from the rules alone (a revision is never changed; an edit's counter is one above the
 * run's highest; the current revision is the greatest by counter, then device id, then id;
 * a merge is the union by id). After every step each store must equal its model.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { exportBackup, importBackup } from '../../src/store/files.ts';
import { createStudy } from '../../src/store/studies.ts';
import { excludeRun, openNewRun, openRun, saveRun } from '../../src/store/runs.ts';
import { closeStore, openStore, type Store } from '../../src/store/store.ts';
import { coatingPlan, freshStore } from './helpers.ts';

interface ModelRevision {
  id: string;
  runId: string;
  studyId: string;
  plannedRun: number;
  rev: number;
  device: string;
  parents: string[];
  readings: number[][];
  excluded: boolean;
  reason: string;
}

interface Device {
  store: Store;
  name: string;
  studies: Map<string, string>; // id -> title
  revisions: Map<string, ModelRevision>;
}

function modelRuns(d: Device) {
  const byRun = new Map<string, ModelRevision[]>();
  for (const r of d.revisions.values()) byRun.set(r.runId, [...(byRun.get(r.runId) ?? []), r]);
  const out = new Map<string, { revisionId: string; heads: string[]; readings: number[][]; excluded: boolean; count: number }>();
  for (const [runId, revs] of byRun) {
    let best = revs[0];
    for (const r of revs) {
      const later = r.rev > best.rev || (r.rev === best.rev && (r.device > best.device || (r.device === best.device && r.id > best.id)));
      if (later) best = r;
    }
    const referenced = new Set(revs.flatMap((r) => r.parents));
    const heads = revs.filter((r) => !referenced.has(r.id)).map((r) => r.id).sort();
    out.set(runId, { revisionId: best.id, heads, readings: best.readings, excluded: best.excluded, count: revs.length });
  }
  return out;
}

async function check(d: Device) {
  const studies = await d.store.db.studies.toArray();
  expect(studies.map((s) => s.id).sort()).toEqual([...d.studies.keys()].sort());
  const revs = await d.store.db.revisions.toArray();
  expect(revs.length).toBe(d.revisions.size);
  for (const r of revs) {
    const m = d.revisions.get(r.id);
    expect(m, `revision ${r.id}`).toBeDefined();
    expect({ runId: r.runId, rev: r.rev, device: r.device, parents: [...r.parents].sort(), readings: r.readings, excluded: r.excluded }).toEqual({
      runId: m!.runId,
      rev: m!.rev,
      device: m!.device,
      parents: [...m!.parents].sort(),
      readings: m!.readings,
      excluded: m!.excluded,
    });
  }
  const runs = await d.store.db.runs.toArray();
  const model = modelRuns(d);
  expect(runs.length).toBe(model.size);
  for (const run of runs) {
    const m = model.get(run.id)!;
    expect({ revisionId: run.revisionId, heads: [...run.heads].sort(), readings: run.readings, excluded: run.excluded, count: run.revisions }).toEqual(m);
  }
}

type Op =
  | { kind: 'create'; d: number }
  | { kind: 'log'; d: number; study: number; planned: number; value: number }
  | { kind: 'edit'; d: number; run: number; value: number }
  | { kind: 'exclude'; d: number; run: number }
  | { kind: 'sync'; from: number; to: number }
  | { kind: 'reimport'; d: number }
  | { kind: 'reload'; d: number }
  | { kind: 'diverge'; run: number; values: [number, number] };

const dev = fc.integer({ min: 0, max: 1 });
const value = fc.integer({ min: 500, max: 900 }).map((x) => x / 10);
const opArb: fc.Arbitrary<Op> = fc.oneof(
  { arbitrary: fc.record({ kind: fc.constant('create' as const), d: dev }), weight: 1 },
  { arbitrary: fc.record({ kind: fc.constant('log' as const), d: dev, study: fc.nat(3), planned: fc.integer({ min: 1, max: 10 }), value }), weight: 2 },
  { arbitrary: fc.record({ kind: fc.constant('edit' as const), d: dev, run: fc.nat(3), value }), weight: 4 },
  { arbitrary: fc.record({ kind: fc.constant('exclude' as const), d: dev, run: fc.nat(3) }), weight: 1 },
  { arbitrary: fc.record({ kind: fc.constant('sync' as const), from: dev, to: dev }).filter((o) => o.from !== o.to), weight: 3 },
  { arbitrary: fc.record({ kind: fc.constant('reimport' as const), d: dev }), weight: 1 },
  { arbitrary: fc.record({ kind: fc.constant('reload' as const), d: dev }), weight: 1 },
  // Both devices edit the same run before they next sync (the case that makes conflicts).
  { arbitrary: fc.record({ kind: fc.constant('diverge' as const), run: fc.nat(3), values: fc.tuple(value, value) }), weight: 2 },
);

const NOW = () => new Date('2024-05-02T10:00:00Z');

async function runOps(ops: Op[]) {
  const devices: Device[] = [];
  for (let i = 0; i < 2; i++) {
    const store = await freshStore({ now: NOW });
    devices.push({ store, name: store.db.name, studies: new Map(), revisions: new Map() });
  }
  try {
    const steps: Op[] = ops.flatMap((op): Op[] =>
      op.kind === 'diverge'
        ? [
            { kind: 'sync', from: 0, to: 1 },
            { kind: 'edit', d: 0, run: op.run, value: op.values[0] },
            { kind: 'edit', d: 1, run: op.run, value: op.values[1] },
            { kind: 'sync', from: 0, to: 1 },
          ]
        : [op],
    );
    for (const op of steps) {
      if (op.kind === 'diverge') continue;
      if (op.kind === 'create') {
        const d = devices[op.d];
        const s = await createStudy(d.store, coatingPlan(`Study ${d.studies.size + 1}`));
        d.studies.set(s.id, s.title);
      } else if (op.kind === 'log') {
        const d = devices[op.d];
        const ids = [...d.studies.keys()].sort();
        if (ids.length === 0) continue;
        const studyId = ids[op.study % ids.length];
        const state = await openNewRun(d.store, studyId, op.planned);
        const values = { ...state.form, actual: state.form.actual.map(Number), readings: [[op.value], []], loggedAt: null, operator: null };
        const res = await saveRun(d.store, { ...state, studyId, values: values as never });
        d.revisions.set(res.revision.id, { id: res.revision.id, runId: state.runId, studyId, plannedRun: op.planned, rev: 1, device: d.store.device, parents: [], readings: [[op.value], []], excluded: false, reason: '' });
      } else if (op.kind === 'edit' || op.kind === 'exclude') {
        const d = devices[op.d];
        const runs = [...modelRuns(d).keys()].sort();
        if (runs.length === 0) continue;
        const runId = runs[op.run % runs.length];
        const model = modelRuns(d).get(runId)!;
        const cur = d.revisions.get(model.revisionId)!;
        const maxRev = Math.max(...[...d.revisions.values()].filter((r) => r.runId === runId).map((r) => r.rev));
        let res;
        let next: Pick<ModelRevision, 'readings' | 'excluded' | 'reason'>;
        if (op.kind === 'edit') {
          const state = await openRun(d.store, runId);
          next = { readings: [[op.value], []], excluded: cur.excluded, reason: cur.reason };
          const v = await d.store.db.runs.get(runId);
          res = await saveRun(d.store, { ...state, studyId: cur.studyId, values: { ...v!, readings: next.readings } });
        } else {
          next = { readings: cur.readings, excluded: true, reason: 'model test' };
          res = await excludeRun(d.store, runId, 'model test');
        }
        d.revisions.set(res.revision.id, { ...cur, ...next, id: res.revision.id, rev: maxRev + 1, device: d.store.device, parents: model.heads });
      } else if (op.kind === 'sync') {
        const from = devices[op.from];
        const to = devices[op.to];
        await importBackup(to.store, await exportBackup(from.store));
        for (const [k, v] of from.studies) to.studies.set(k, v);
        for (const [k, v] of from.revisions) to.revisions.set(k, v);
      } else if (op.kind === 'reimport') {
        const d = devices[op.d];
        await importBackup(d.store, await exportBackup(d.store));
      } else {
        const d = devices[op.d];
        closeStore(d.store);
        d.store = await openStore({ name: d.name, storage: null, now: NOW });
      }
      for (const d of devices) await check(d);
    }
  } finally {
    for (const d of devices) closeStore(d.store);
  }
}

describe('the store against a plain model', () => {
  it('random sequences of create, log, edit, exclude, export, import and reload on two devices', async () => {
    const seq = fc.array(opArb, { minLength: 1, maxLength: 30 }).map((ops) => [{ kind: 'create', d: 0 } as Op, ...ops]);
    await fc.assert(fc.asyncProperty(seq, runOps), { numRuns: 150 });
  }, 120_000);
});
