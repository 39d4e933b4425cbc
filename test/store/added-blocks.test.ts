/**
 * Planned runs added to a study later, in the store: a block of its own, written once; the plan
 * as read carries it; its runs are logged like any other; backups carry it and merge it by id;
 * two devices that add runs to the same plan offline are refused on merge, naming both blocks,
 * with nothing changed. The study is INVENTED (test/store/helpers.ts).
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.ts';
import { readBackup } from '../../src/io/backup/backup.ts';
import { addPlannedRuns, listBlocks } from '../../src/store/added-blocks.ts';
import { exportBackup, exportStudyCsv, importBackup, payloadOf } from '../../src/store/files.ts';
import { listRuns, openNewRun } from '../../src/store/runs.ts';
import { createStudy, getStudy } from '../../src/store/studies.ts';
import { coatingPlan, freshStore, logThickness as log } from './helpers.ts';

const PATH = [
  { kind: 'path' as const, coded: [1.5, -0.5, 0.25] },
  { kind: 'path' as const, coded: [3, -1, 0.5] },
];

describe('added blocks in the store', () => {
  it('adds runs as a new block after the plan; the study record itself is unchanged', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan()); // 8 corners + 2 center runs
    const block = await addPlannedRuns(store, study.id, 'path', PATH, 'invented path');
    expect(block.runs.map((r) => [r.run, r.block, r.originBlock, r.kind])).toEqual([
      [11, 2, 2, 'path'],
      [12, 2, 2, 'path'],
    ]);
    expect(await store.db.studies.get(study.id)).toEqual(study);
    const plan = await getStudy(store, study.id);
    expect(plan.design.runs.map((r) => r.run)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    const next = await addPlannedRuns(store, study.id, 'confirmation', [{ kind: 'confirmation', coded: [1, 1, 1] }], 'invented');
    expect(next.runs[0]).toMatchObject({ run: 13, block: 3 });
    expect((await listBlocks(store, study.id)).map((b) => b.purpose)).toEqual(['path', 'confirmation']);
  });

  it('an added run is logged like any other, with its planned setting outside the tested range', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const block = await addPlannedRuns(store, study.id, 'path', PATH, 'invented path');
    const state = await openNewRun(store, study.id, block.runs[1].run);
    expect(state.form.actual[0]).toBe('240'); // center 180 + 3 x half-range 20: coded 3 on 160..200 °C
    await log(store, study.id, block.runs[1].run, '75.5');
    expect((await listRuns(store, study.id)).map((r) => r.plannedRun)).toEqual([12]);
    // The records export lists the added runs in run order, with their block and kind token.
    const rows = (await exportStudyCsv(store, study.id)).split('\r\n');
    expect(rows[0].startsWith('Run,Std order,Replicate,Block,Kind,')).toBe(true);
    expect(rows.slice(11, 13).map((r) => r.split(',').slice(0, 5).join(','))).toEqual(['11,,1,2,path', '12,,1,2,path']);
  });

  it('bad input changes nothing: no runs, wrong settings, unknown study', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    await expect(addPlannedRuns(store, study.id, 'path', [], 'x')).rejects.toThrow(/at least one run, got none/);
    await expect(addPlannedRuns(store, study.id, 'path', [{ kind: 'path', coded: [1, 2] }], 'x')).rejects.toThrow(/one coded setting per factor \(3\), got 2/);
    await expect(addPlannedRuns(store, 'nope', 'path', PATH, 'x')).rejects.toThrow(InputError);
    expect(await store.db.blocks.count()).toBe(0);
  });

  it('a backup carries the block; another phone imports it, logs its runs, and the merge back is the union', async () => {
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    await addPlannedRuns(a, study.id, 'path', PATH, 'invented path');
    const file = await exportBackup(a);
    expect((await readBackup(file)).payload.blocks).toHaveLength(1);
    const b = await freshStore();
    expect((await importBackup(b, file)).blocksAdded).toBe(1);
    expect((await importBackup(b, file)).summary).toBe('Nothing new: everything in the file was already here.');
    await log(b, study.id, 11, '74.0');
    const back = await importBackup(a, await exportBackup(b));
    expect(back.blocksAdded).toBe(0);
    expect(back.runsAdded).toBe(1);
    expect(await payloadOf(a)).toEqual(await payloadOf(b));
  });

  it('two phones that add runs to the same plan offline: the merge is refused naming both blocks, and nothing changes', async () => {
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    const b = await freshStore();
    await importBackup(b, await exportBackup(a));
    const onA = await addPlannedRuns(a, study.id, 'path', PATH, 'path on phone A');
    const onB = await addPlannedRuns(b, study.id, 'confirmation', [{ kind: 'confirmation', coded: [1, 1, 1] }], 'confirmation on phone B');
    const before = await payloadOf(a);
    const err = await importBackup(a, await exportBackup(b)).catch((e) => e);
    expect(err).toBeInstanceOf(InputError);
    expect(err.message).toContain('Run 11');
    expect(err.message).toContain(onA.id);
    expect(err.message).toContain(onB.id);
    expect(await payloadOf(a)).toEqual(before);
  });

  it('an altered block in a file is refused whole', async () => {
    const a = await freshStore();
    const study = await createStudy(a, coatingPlan());
    await addPlannedRuns(a, study.id, 'path', PATH, 'invented path');
    const b = await freshStore();
    await importBackup(b, await exportBackup(a));
    const payload = await payloadOf(a);
    const changed = { ...payload, blocks: payload.blocks!.map((blk) => ({ ...blk, note: 'changed' })) };
    const { writeBackup } = await import('../../src/io/backup/backup.ts');
    const text = await writeBackup(changed, { device: a.device, exportedAt: '2024-05-03T00:00:00Z', scope: 'all' });
    await expect(importBackup(b, text)).rejects.toThrow(/block of planned runs .* differs from the block with the same id/);
  });
});
