import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { StorageError, isQuotaError, toStorageError } from '../../src/store/errors.ts';
import { getDraft, saveDraft } from '../../src/store/drafts.ts';
import { listRuns, openNewRun, saveRun } from '../../src/store/runs.ts';
import { createStudy } from '../../src/store/studies.ts';
import { newId, uuidFromBytes } from '../../src/store/ids.ts';
import { coatingPlan, freshStore } from './helpers.ts';

describe('storage failures', () => {
  it('a full storage, also when it comes inside an AbortError, is told as such', () => {
    const quota = new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    expect(isQuotaError(quota)).toBe(true);
    const wrapped = Object.assign(new Error('Transaction aborted'), { name: 'AbortError', inner: quota });
    expect(toStorageError(wrapped)).toMatchObject({ problem: 'quota', offerExport: true });
    expect(toStorageError(Object.assign(new Error('x'), { name: 'AbortError' }))).toMatchObject({ problem: 'aborted', offerExport: true });
    expect(toStorageError(Object.assign(new Error('x'), { name: 'DatabaseClosedError' }))).toMatchObject({ problem: 'closed' });
    expect((toStorageError(quota) as StorageError).message).toMatch(/full.*kept as a draft.*Export a backup/);
  });

  it('a save that fails for a full storage keeps the draft and writes nothing of the run', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 1);
    const form = { ...state.form, readings: ['70', '90'] };
    await saveDraft(store, { ...state, studyId: study.id }, form);
    // The second write of the save's transaction fails as a full disk would make it fail.
    const failing = () => {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    };
    store.db.runs.hook('creating', failing);
    const err = await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, form) }).catch((e) => e);
    store.db.runs.hook('creating').unsubscribe(failing);
    expect(err).toBeInstanceOf(StorageError);
    expect(err.problem).toBe('quota');
    expect(await store.db.revisions.count()).toBe(0); // the revision written first was rolled back
    expect(await listRuns(store, study.id)).toEqual([]);
    expect((await getDraft(store, state.formId))?.form).toEqual(form);
    // Once there is room again, the same form saves once.
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, form) });
    expect(await listRuns(store, study.id)).toHaveLength(1);
  });
});

describe('ids', () => {
  // RFC 9562, section 5.4: version 4 has the version bits 0100 and the variant bits 10.
  it('a fallback id is an RFC 9562 version 4 UUID', () => {
    const id = uuidFromBytes(new Uint8Array(16).fill(0xff));
    expect(id).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
    expect(uuidFromBytes(new Uint8Array(16))).toBe('00000000-0000-4000-8000-000000000000');
    expect(newId()).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });
  it('without randomUUID (plain-http pages), ids come from getRandomValues', () => {
    const real = globalThis.crypto;
    const bytes = new Uint8Array(16).map((_, i) => i * 17);
    Object.defineProperty(globalThis, 'crypto', { value: { getRandomValues: (b: Uint8Array) => (b.set(bytes), b) }, configurable: true });
    try {
      expect(newId()).toBe('00112233-4455-4677-8899-aabbccddeeff');
    } finally {
      Object.defineProperty(globalThis, 'crypto', { value: real, configurable: true });
    }
  });
});
