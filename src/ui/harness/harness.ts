/**
 * The store's browser-test page (built only for the tests by vite.harness.config.ts, never into
 * the deployed folder; it opens its own database, never the app's): a bare form
 * that drives the store functions the way the screens will. Every change to a field is kept as a
 * draft; "Saved" shows only after the save's transaction has resolved. With ?upgrade=throw it
 * opens with a made-up next schema version whose upgrade throws. window.harness exposes the
 * store to the tests and the benchmark. All data here is invented.
 */
import { buildDesign } from '../../core/design/build-design.ts';
import { parseRunForm, type RunForm } from '../../core/study/run-form.ts';
import { studyPlan, type RunRevision, type StudyRecord } from '../../core/study/study.ts';
import { SCHEMA_VERSION, declareSchema } from '../../store/db.ts';
import { listDrafts, saveDraft } from '../../store/drafts.ts';
import { exportBackup, mergeBackup } from '../../store/files.ts';
import { listRuns, openNewRun, openRun, saveRun, type RunFormState } from '../../store/runs.ts';
import { createStudy, listStudies } from '../../store/studies.ts';
import { persistenceAnswer, safetyStatus } from '../../store/status.ts';
import { openStore, type Store } from '../../store/store.ts';
import { newId } from '../../store/ids.ts';

const $ = <T extends HTMLElement>(id: string) => document.getElementById(id) as T;
const params = new URLSearchParams(location.search);

/** The test page's own database, so that visiting it can never touch the app's records (DB_NAME). */
export const HARNESS_DB_NAME = 'trialbook-test-page';

function say(text: string) {
  $('status').textContent = text;
}

function problem(err: unknown) {
  const p = $('problem');
  p.hidden = false;
  p.textContent = err instanceof Error ? err.message : String(err);
  if ((err as { offerExport?: boolean }).offerExport) $('export').hidden = false;
}

function throwingUpgrade(db: Parameters<typeof declareSchema>[0]) {
  declareSchema(db);
  db.version(SCHEMA_VERSION + 1)
    .stores({ runs: 'id, studyId, plannedRun' })
    .upgrade(async (tx) => {
      await tx.table('revisions').clear();
      throw new Error('test upgrade step failed on purpose');
    });
}

let store: Store;
let study: StudyRecord | null = null;
let form: RunFormState | null = null;

function demoPlan() {
  const design = buildDesign({
    factors: [
      { kind: 'numeric', name: 'Oven temperature', low: 160, high: 200, unit: '°C' },
      { kind: 'numeric', name: 'Line speed', low: 2, high: 4, unit: 'm/min' },
      { kind: 'numeric', name: 'Powder flow', low: 30, high: 50, unit: 'g/min' },
    ],
    centerRuns: 2,
    seed: 7,
  });
  return studyPlan('Invented demo: test page study', 'INVENTED DEMO DATA for the browser tests.', [{ name: 'Film thickness', unit: 'µm', goal: 'target', target: 70 }, { name: 'Gloss', unit: 'GU', goal: 'maximize' }], design);
}

function currentForm(): RunForm {
  if (!form) throw new Error('no form open');
  const n = form.study.factors.length;
  const inputs = [...document.querySelectorAll<HTMLInputElement>('#fields input')];
  return {
    ...form.form,
    actual: inputs.slice(0, n).map((i) => i.value),
    readings: inputs.slice(n).map((i) => i.value),
    notes: $<HTMLTextAreaElement>('notes').value,
  };
}

let draftWrites = 0;
async function keepDraft() {
  if (!form) return;
  const n = ++draftWrites;
  try {
    await saveDraft(store, { ...form, studyId: form.study.id }, currentForm());
    if (n === draftWrites) $('save-state').textContent = 'Draft kept';
  } catch (err) {
    problem(err);
  }
}

function showForm(state: RunFormState) {
  form = state;
  const fields = $('fields');
  fields.replaceChildren();
  const add = (label: string, value: string, name: string) => {
    const l = document.createElement('label');
    l.textContent = label + ' ';
    const input = document.createElement('input');
    input.name = name;
    input.value = value;
    input.inputMode = 'decimal';
    input.addEventListener('input', () => void keepDraft());
    l.append(input);
    fields.append(l, document.createElement('br'));
  };
  state.study.factors.forEach((f, i) => add(`${f.name} actual`, state.form.actual[i], `actual-${i}`));
  state.study.responses.forEach((r, i) => add(`${r.name} readings`, state.form.readings[i], `reading-${i}`));
  $<HTMLTextAreaElement>('notes').value = state.form.notes;
  $('run-form').hidden = false;
  $('save-state').textContent = state.fromDraft ? 'Draft restored' : '';
}

async function refreshCounts() {
  if (!study) return;
  $('run-count').textContent = String((await listRuns(store, study.id)).length);
  $('draft-count').textContent = String((await listDrafts(store, study.id)).length);
}

const taps = { saves: 0, duplicates: 0 };

async function save(ev: Event) {
  ev.preventDefault();
  if (!form) return;
  taps.saves++;
  $('save-state').textContent = 'Saving...';
  try {
    const values = parseRunForm(form.study, currentForm());
    const result = await saveRun(store, { ...form, studyId: form.study.id, values });
    if (result.duplicate) taps.duplicates++;
    $('save-state').textContent = result.changedSince ? 'Saved (the run had changed since it was opened; both revisions are kept)' : 'Saved';
    form = { ...form, current: result.run, parents: result.run.heads, revisionId: newId() };
    await refreshCounts();
  } catch (err) {
    $('save-state').textContent = 'Not saved';
    problem(err);
  }
}

/** Stores `count` logged runs in one study in one transaction (for the benchmark). */
async function fill(count: number): Promise<string> {
  const s = study ?? (await createStudy(store, demoPlan()));
  study = s;
  const savedAt = new Date().toISOString();
  const revisions: RunRevision[] = Array.from({ length: count }, (_, i) => {
    const planned = s.design.runs[i % s.design.runs.length];
    return {
      id: newId(), runId: newId(), studyId: s.id, plannedRun: planned.run, rev: 1, device: store.device, parents: [], restoredFrom: null, savedAt,
      actual: s.factors.map((f, j) => (f.kind === 'numeric' ? (f.low + f.high) / 2 + (planned.coded[j] * (f.high - f.low)) / 2 : f.levels[0])),
      readings: [[70 + (i % 7)], [80 + (i % 5)]], loggedAt: savedAt, operator: null, notes: 'invented bench run', excluded: false, reason: '',
    };
  });
  await mergeBackup(store, { payload: { studies: [s], revisions } });
  return s.id;
}

/** Saves `n` runs one after another and returns each save's time in milliseconds. */
async function timeSaves(n: number): Promise<number[]> {
  if (!study) throw new Error('no study');
  const times: number[] = [];
  for (let i = 0; i < n; i++) {
    const state = await openNewRun(store, study.id, 1 + (i % study.design.runs.length));
    const values = parseRunForm(state.study, { ...state.form, readings: ['70.1', '85'] });
    const t0 = performance.now();
    await saveRun(store, { ...state, studyId: study.id, values });
    times.push(performance.now() - t0);
  }
  return times;
}

async function start() {
  store = await openStore({
    name: HARNESS_DB_NAME,
    onClosed: (m) => problem(new Error(m)),
    onBlocked: (m) => say(m),
    ...(params.get('upgrade') === 'throw' ? { declare: throwingUpgrade } : {}),
  });
  const studies = await listStudies(store);
  study = studies[0] ?? null;
  if (study) {
    const drafts = await listDrafts(store, study.id);
    // The test page reopens the latest draft as its own form (the app keeps a form id per tab instead).
    const last = drafts[drafts.length - 1];
    if (last) showForm(await openRun(store, last.runId, last.formId));
  }
  await refreshCounts();
  say(`Ready (schema version ${store.db.verno})`);
}

$('new-study').addEventListener('click', async () => {
  try {
    study = await createStudy(store, demoPlan());
    say(`Study made: ${study.title}`);
    await refreshCounts();
  } catch (err) {
    problem(err);
  }
});
$('open-run').addEventListener('click', async () => {
  try {
    if (!study) throw new Error('Make a study first');
    showForm(await openNewRun(store, study.id, Number($<HTMLInputElement>('planned').value)));
  } catch (err) {
    problem(err);
  }
});
$('notes').addEventListener('input', () => void keepDraft());
$('run-form').addEventListener('submit', (ev) => void save(ev));
$('export').addEventListener('click', async () => {
  const text = await exportBackup(store);
  const a = document.createElement('a');
  a.href = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
  a.download = 'trialbook-backup.json';
  a.click();
});

(window as unknown as { harness: unknown }).harness = {
  get store() {
    return store;
  },
  fill,
  timeSaves,
  taps,
  counts: async () => ({ studies: await store.db.studies.count(), runs: await store.db.runs.count(), revisions: await store.db.revisions.count(), drafts: await store.db.formDrafts.count() }),
  persistence: () => persistenceAnswer(store),
  status: () => safetyStatus(store),
  version: () => store.db.verno,
};

start().catch((err) => {
  say('Could not open the store');
  problem(err);
});
