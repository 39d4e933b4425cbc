import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { createStudy, getStudy, listStudies } from '../../src/store/studies.ts';
import { excludeRun, getRun, listRuns, openNewRun, openPlannedRun, openRun, readmitRun, restoreRevision, runHistory, saveRun, takeOtherDraft } from '../../src/store/runs.ts';
import { discardDraft, getDraft, listDrafts, saveDraft } from '../../src/store/drafts.ts';
import { closeStore, openStore } from '../../src/store/store.ts';
import { SCHEMA_VERSION } from '../../src/store/db.ts';
import { brandPlan, coatingPlan, freshStore } from './helpers.ts';

async function logRun(store: Awaited<ReturnType<typeof freshStore>>, studyId: string, plannedRun: number, readings: string[]) {
  const state = await openNewRun(store, studyId, plannedRun);
  const values = parseRunForm(state.study, { ...state.form, readings });
  return { state, result: await saveRun(store, { ...state, studyId, values }) };
}

describe('studies', () => {
  it('are kept with their plan, a random id and this device', async () => {
    const store = await freshStore();
    const plan = coatingPlan();
    const study = await createStudy(store, plan);
    expect(study.id).toMatch(/^[0-9a-f-]{36}$/);
    expect(study.device).toBe(store.device);
    const back = await getStudy(store, study.id);
    expect(back.factors).toEqual(plan.factors);
    expect(back.design.runs).toEqual(plan.design.runs);
    expect(await listStudies(store)).toHaveLength(1);
  });

  it('refuses a plan that does not hold together, and stores nothing', async () => {
    const store = await freshStore();
    const plan = coatingPlan();
    const bad = { ...plan, design: { ...plan.design, runs: [{ ...plan.design.runs[0], coded: [1, 1] }] } };
    await expect(createStudy(store, bad)).rejects.toThrow(/coded setting per factor/);
    await expect(createStudy(store, { ...plan, title: '  ' })).rejects.toThrow(InputError);
    expect(await listStudies(store)).toHaveLength(0);
  });

  it('keep the same device id across reopenings, a different one per database', async () => {
    const store = await freshStore();
    const name = store.db.name;
    const device = store.device;
    closeStore(store);
    const again = await openStore({ name, storage: null });
    expect(again.device).toBe(device);
    const other = await freshStore();
    expect(other.device).not.toBe(device);
    expect(again.db.verno).toBe(SCHEMA_VERSION);
  });
});

describe('logged runs', () => {
  it('a saved run is there after reopening, with its readings and their mean left to the analysis', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const { result } = await logRun(store, study.id, 3, ['68.5 70.1 69.0', '88']);
    expect(result.duplicate).toBe(false);
    expect(result.run.readings).toEqual([[68.5, 70.1, 69.0], [88]]);
    closeStore(store);
    const again = await openStore({ name: store.db.name, storage: null });
    const runs = await listRuns(again, study.id);
    expect(runs).toHaveLength(1);
    expect(runs[0]).toEqual(result.run);
    expect(runs[0].actual).toEqual([160, 4, 30]); // run 3 in standard order is "b": A low, B high, C low (Montgomery 8th ed., section 6.3)
  });

  it('one tap, one record: saving the same form twice, or at once, writes one revision', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 1);
    const values = parseRunForm(state.study, { ...state.form, readings: ['70', '90'] });
    const input = { ...state, studyId: study.id, values };
    const [a, b] = await Promise.all([saveRun(store, input), saveRun(store, input)]);
    const c = await saveRun(store, input);
    expect([a.duplicate, b.duplicate].sort()).toEqual([false, true]);
    expect(c.duplicate).toBe(true);
    expect(await listRuns(store, study.id)).toHaveLength(1);
    expect(await runHistory(store, state.runId)).toHaveLength(1);
  });

  it('an edit appends a revision; the earlier values stay and can be restored', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const { state, result: first } = await logRun(store, study.id, 2, ['70', '90']);
    const edit = await openRun(store, state.runId);
    expect(edit.parents).toEqual([first.revision.id]);
    const second = await saveRun(store, { ...edit, studyId: study.id, values: parseRunForm(study, { ...edit.form, readings: ['72', '91'], notes: 'panel 2 re-measured' }) });
    expect(second.changedSince).toBeNull();
    expect(second.run.rev).toBe(2);
    expect(second.run.readings).toEqual([[72], [91]]);
    const restored = await restoreRevision(store, state.runId, first.revision.id);
    expect(restored.run.readings).toEqual([[70], [90]]);
    expect(restored.run.restoredFrom).toBe(first.revision.id);
    const history = await runHistory(store, state.runId);
    expect(history.map((r) => r.rev)).toEqual([1, 2, 3]);
    expect(history[1].readings).toEqual([[72], [91]]);
    expect((await getRun(store, state.runId)).heads).toEqual([restored.revision.id]);
  });

  it('exclusion needs a reason, is a revision, and can be taken back', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const { state } = await logRun(store, study.id, 4, ['70', '90']);
    await expect(excludeRun(store, state.runId, ' ')).rejects.toThrow(/reason/);
    const ex = await excludeRun(store, state.runId, 'panel dropped before curing');
    expect(ex.run.excluded).toBe(true);
    expect(ex.run.reason).toBe('panel dropped before curing');
    const back = await readmitRun(store, state.runId);
    expect(back.run.excluded).toBe(false);
    expect(back.run.reason).toBe('');
    expect(await runHistory(store, state.runId)).toHaveLength(3);
  });

  it('two tabs on the same run: the second save sees the change and both revisions are kept', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const { state } = await logRun(store, study.id, 5, ['70', '90']);
    const tab1 = await openRun(store, state.runId);
    const tab2 = await openRun(store, state.runId);
    const s1 = await saveRun(store, { ...tab1, studyId: study.id, values: parseRunForm(study, { ...tab1.form, readings: ['71', '90'] }) });
    const s2 = await saveRun(store, { ...tab2, studyId: study.id, values: parseRunForm(study, { ...tab2.form, readings: ['69', '90'] }) });
    expect(s1.changedSince).toBeNull();
    expect(s2.changedSince).toBe(s1.revision.id);
    const run = await getRun(store, state.runId);
    expect([...run.heads].sort()).toEqual([s1.revision.id, s2.revision.id].sort());
    expect(run.revisionId).toBe(s2.revision.id);
    const history = await runHistory(store, state.runId);
    expect(history.map((r) => r.readings[0][0])).toEqual([70, 71, 69]);
    // A later save from the current view joins the two again.
    const tab3 = await openRun(store, state.runId);
    const s3 = await saveRun(store, { ...tab3, studyId: study.id, values: parseRunForm(study, { ...tab3.form, readings: ['70.5', '90'] }) });
    expect(s3.run.heads).toEqual([s3.revision.id]);
  });

  it('two tabs that reopened one draft (a duplicated tab copies its session, so its form id) share its revision id: both saves are kept, and a retry writes nothing new', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const opened = await openNewRun(store, study.id, 1);
    await saveDraft(store, { ...opened, studyId: study.id }, { ...opened.form, readings: ['70', '90'] });
    const tab1 = await openRun(store, opened.runId, opened.formId);
    const tab2 = await openRun(store, opened.runId, opened.formId);
    expect(tab2.revisionId).toBe(tab1.revisionId); // both come from the draft's fixed ids
    const s1 = await saveRun(store, { ...tab1, studyId: study.id, values: parseRunForm(study, { ...tab1.form, readings: ['70', '90'] }) });
    // Tab 2 goes on typing (its draft comes back under the same ids) and saves other values.
    await saveDraft(store, { ...tab2, studyId: study.id }, { ...tab2.form, readings: ['55', '90'] });
    const input2 = { ...tab2, studyId: study.id, values: parseRunForm(study, { ...tab2.form, readings: ['55', '90'] }) };
    const s2 = await saveRun(store, input2);
    expect(s2.duplicate).toBe(false);
    expect(s2.revision.id).not.toBe(s1.revision.id);
    expect(s2.changedSince).toBe(s1.revision.id);
    expect((await runHistory(store, opened.runId)).map((r) => r.readings[0][0]).sort()).toEqual([55, 70]);
    expect([...(await getRun(store, opened.runId)).heads].sort()).toEqual([s1.revision.id, s2.revision.id].sort());
    expect(await getDraft(store, opened.formId)).toBeNull();
    // The same save again (a second tap of tab 2) finds its revision.
    const again = await saveRun(store, input2);
    expect(again.duplicate).toBe(true);
    expect(again.revision.id).toBe(s2.revision.id);
    expect(await runHistory(store, opened.runId)).toHaveLength(2);
  });

  it('a draft left on a revision id that is already saved goes when the same values are saved again, and only then', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const opened = await openNewRun(store, study.id, 2);
    const input = { ...opened, studyId: study.id, values: parseRunForm(study, { ...opened.form, readings: ['70', '90'] }) };
    await saveRun(store, input);
    // Other typing on that id (another tab) is kept when the first save is tapped again...
    await saveDraft(store, { ...opened, studyId: study.id }, { ...opened.form, readings: ['55', '90'] });
    expect((await saveRun(store, input)).duplicate).toBe(true);
    expect((await getDraft(store, opened.formId))?.form.readings).toEqual(['55', '90']);
    // ...typing equal to what is saved is not waiting any more, and goes.
    await saveDraft(store, { ...opened, studyId: study.id }, { ...opened.form, readings: ['70', '90'] });
    expect((await saveRun(store, input)).duplicate).toBe(true);
    expect(await getDraft(store, opened.formId)).toBeNull();
  });

  it('refuses a time that the backup file could not carry, and writes nothing', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const opened = await openNewRun(store, study.id, 3);
    // What Date.prototype.toString gives (ECMA-262, "Date.prototype.toString"): Date.parse reads
    // it, but it is not ISO 8601, and longer than the 40 characters of a time in
    // trialbook-backup.schema.json; the save's first check (the run's values) refuses it.
    const loggedAt = new Date(Date.UTC(2024, 4, 2, 12)).toString();
    expect(Number.isNaN(Date.parse(loggedAt))).toBe(false);
    expect(loggedAt.length).toBeGreaterThan(40);
    const values = { ...parseRunForm(study, { ...opened.form, readings: ['70', '90'] }), loggedAt };
    await expect(saveRun(store, { ...opened, studyId: study.id, values })).rejects.toThrow(/^Time: needs a date and time \(ISO 8601, e\.g\. 2026-03-01T14:05\) or nothing, got "Thu May 02 2024/);
    expect(await store.db.revisions.count()).toBe(0);
  });

  it('refuses bad values with a message naming the field, and writes nothing', async () => {
    const store = await freshStore();
    const study = await createStudy(store, brandPlan());
    const state = await openNewRun(store, study.id, 1);
    expect(parseRunForm(study, { ...state.form, readings: ['12,5'] }).readings).toEqual([[12.5]]); // a decimal comma, as a phone keypad gives it
    expect(() => parseRunForm(study, { ...state.form, readings: ['12,5,1'] })).toThrow(/Gloss: reading 1 needs a number, got "12,5,1" \(separate readings with spaces or ;, and use a point or one comma/);
    expect(() => parseRunForm(study, { ...state.form, actual: ['180', 'Brand East'] })).toThrow(/Powder: the actual setting needs "Brand North" or "Brand South"/);
    const bad = { ...state, studyId: study.id, values: { ...parseRunForm(study, state.form), readings: [[Number.NaN]] } };
    await expect(saveRun(store, bad)).rejects.toThrow(/Gloss: reading 1 needs a finite number/);
    await expect(saveRun(store, { ...bad, plannedRun: 99 })).rejects.toThrow(/Run 99 is not in the plan/);
    await expect(saveRun(store, { ...bad, values: { ...bad.values, readings: [[1]], excluded: true, reason: '' } })).rejects.toThrow(/needs a reason/);
    expect(await listRuns(store, study.id)).toHaveLength(0);
    expect(await store.db.revisions.count()).toBe(0);
  });

  it('categorical levels are stored as declared whatever the case typed', async () => {
    const store = await freshStore();
    const study = await createStudy(store, brandPlan());
    const state = await openNewRun(store, study.id, 2);
    const values = parseRunForm(study, { ...state.form, actual: ['181.5', 'brand south'], readings: ['84'] });
    const saved = await saveRun(store, { ...state, studyId: study.id, values });
    expect(saved.run.actual).toEqual([181.5, 'Brand South']);
  });
});

describe('drafts', () => {
  it('are kept on every change, come back when the form reopens, and go when the run is saved', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 6);
    await saveDraft(store, { ...state, studyId: study.id }, { ...state.form, readings: ['6', ''] });
    await saveDraft(store, { ...state, studyId: study.id }, { ...state.form, readings: ['69', ''], notes: 'half typed' });
    closeStore(store);
    const again = await openStore({ name: store.db.name, storage: null });
    expect((await listDrafts(again, study.id)).map((d) => d.runId)).toEqual([state.runId]);
    const reopened = await openRun(again, state.runId, state.formId);
    expect(reopened.fromDraft).toBe(true);
    expect(reopened.form.readings).toEqual(['69', '']);
    expect(reopened.form.notes).toBe('half typed');
    // The draft keeps the ids fixed at opening, so a save after the reload is the same record.
    expect(reopened.revisionId).toBe(state.revisionId);
    await saveRun(again, { ...reopened, studyId: study.id, values: parseRunForm(study, reopened.form) });
    expect(await getDraft(again, state.formId)).toBeNull();
  });

  it('three tabs on one run each keep their own draft: a save drops only the draft of what it saved, and a reload finds its own tab\'s typing', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const first = await openNewRun(store, study.id, 4);
    const saved = await saveRun(store, { ...first, studyId: study.id, values: parseRunForm(study, { ...first.form, readings: ['70', '90'] }) });
    // Three tabs open the logged run (each with its own form id); each types, tab 3 last.
    const tabs = [await openRun(store, first.runId), await openRun(store, first.runId), await openRun(store, first.runId)];
    expect(new Set(tabs.map((t) => t.formId)).size).toBe(3);
    const typing = ['71', '55', '66'];
    for (const [i, tab] of tabs.entries()) await saveDraft(store, { ...tab, studyId: study.id }, { ...tab.form, readings: [typing[i], '90'] });
    expect((await listDrafts(store, study.id)).map((d) => d.form.readings[0]).sort()).toEqual(['55', '66', '71']);
    // Tab 1 saves: its draft goes; tabs 2 and 3 keep theirs (tab 3's later typing took over nothing).
    const s1 = await saveRun(store, { ...tabs[0], studyId: study.id, values: parseRunForm(study, { ...tabs[0].form, readings: ['71', '90'] }) });
    expect(s1.changedSince).toBeNull();
    expect(await getDraft(store, tabs[0].formId)).toBeNull();
    // A reload of tab 2 finds tab 2's typing, and lists tab 3's as other typing (never the reverse).
    const reloaded = await openRun(store, first.runId, tabs[1].formId);
    expect(reloaded.fromDraft).toBe(true);
    expect(reloaded.form.readings).toEqual(['55', '90']);
    expect(reloaded.parents).toEqual([saved.revision.id]); // it started before tab 1's save
    expect(reloaded.otherDrafts.map((d) => d.form.readings[0])).toEqual(['66']);
    const s2 = await saveRun(store, { ...reloaded, studyId: study.id, values: parseRunForm(study, reloaded.form) });
    expect(s2.changedSince).toBe(s1.revision.id);
    expect(await getDraft(store, tabs[1].formId)).toBeNull();
    expect((await getDraft(store, tabs[2].formId))?.form.readings).toEqual(['66', '90']);
    expect([...(await getRun(store, first.runId)).heads].sort()).toEqual([s1.revision.id, s2.revision.id].sort());
    // A new tab lists tab 3's typing and can take it in; the save drops both copies of it.
    const fourth = await openRun(store, first.runId);
    expect(fourth.fromDraft).toBe(false);
    expect(fourth.otherDrafts.map((d) => d.formId)).toEqual([tabs[2].formId]);
    const taken = takeOtherDraft(fourth, tabs[2].formId);
    expect(taken.formId).toBe(fourth.formId);
    expect(taken.form.readings).toEqual(['66', '90']);
    expect(taken.parents).toEqual([saved.revision.id]);
    expect(taken.revisionId).not.toBe(tabs[2].revisionId);
    await saveDraft(store, { ...taken, studyId: study.id }, taken.form);
    expect((await getDraft(store, tabs[2].formId))?.form.readings).toEqual(['66', '90']); // the other copy stays until a save
    await saveRun(store, { ...taken, studyId: study.id, values: parseRunForm(study, taken.form) });
    expect(await listDrafts(store, study.id)).toEqual([]);
    expect(() => takeOtherDraft(fourth, 'no-such-form')).toThrow(/no longer waiting/);
  });

  it('a new run saved with a blank time drops its draft (the time is filled at saving)', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 5);
    const form = { ...state.form, loggedAt: '', readings: ['70', '90'] };
    await saveDraft(store, { ...state, studyId: study.id }, form);
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...form, loggedAt: '2024-05-02T12:00:00.000Z' }) });
    expect(await getDraft(store, state.formId)).toBeNull();
  });

  it('a failed save keeps the draft', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const state = await openNewRun(store, study.id, 1);
    const form = { ...state.form, readings: ['70', '90'] };
    await saveDraft(store, { ...state, studyId: study.id }, form);
    await expect(saveRun(store, { ...state, studyId: study.id, values: { ...parseRunForm(study, form), actual: [1, 2] } })).rejects.toThrow(InputError);
    expect((await getDraft(store, state.formId))?.form).toEqual(form);
    await discardDraft(store, state.formId);
    expect(await getDraft(store, state.formId)).toBeNull();
  });
});

describe('openPlannedRun', () => {
  it('reopens the waiting draft, then the logged run, so a planned run never gets a second record by reopening its form', async () => {
    const store = await freshStore();
    const study = await createStudy(store, coatingPlan());
    const first = await openPlannedRun(store, study.id, 2);
    expect(first.current).toBeNull();
    await saveDraft(store, { ...first, studyId: study.id }, { ...first.form, notes: 'typed, not saved' });
    // Another form (another tab) opens the same record, blank, and is told of the waiting typing.
    const other = await openPlannedRun(store, study.id, 2);
    expect(other.runId).toBe(first.runId);
    expect(other.fromDraft).toBe(false);
    expect(other.form.notes).toBe('');
    expect(other.otherDrafts.map((d) => d.formId)).toEqual([first.formId]);
    // The same form (a reload of that tab) gets its own typing back.
    const again = await openPlannedRun(store, study.id, 2, first.formId);
    expect(again.runId).toBe(first.runId);
    expect(again.fromDraft).toBe(true);
    expect(again.form.notes).toBe('typed, not saved');
    expect(again.otherDrafts).toEqual([]);
    const values = parseRunForm(again.study, { ...again.form, readings: again.form.readings.map(() => '70') });
    await saveRun(store, { ...again, studyId: study.id, values });
    const logged = await openPlannedRun(store, study.id, 2);
    expect(logged.runId).toBe(first.runId);
    expect(logged.current).not.toBeNull();
    expect(await listRuns(store, study.id)).toHaveLength(1);
    await expect(openPlannedRun(store, study.id, 999)).rejects.toThrow(/not in the plan/);
  });
});
