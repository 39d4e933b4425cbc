/**
 * The form of one planned run: planned settings beside the actual ones (pre-filled from the
 * plan), each response's readings, notes, operator, and exclusion with a reason. Every change is
 * kept as a draft (saveDraft), so a reload or a crash brings the typing back; "Saved" is shown
 * only once saveRun has resolved. A wrong entry gets a message and nothing is written; a storage
 * failure shows the store's message and offers an export.
 */
import { computed, createModel, effect, signal, type ReadonlySignal } from '@preact/signals';
import { farOutsideSettings } from '../../core/factor/far-outside.ts';
import { readSetting } from '../../core/factor/read-setting.ts';
import { farOutsideText } from '../../core/text/far-outside-text.ts';
import { joinReadings, splitReadings } from '../../core/study/reading-text.ts';
import { parseReadings, parseRunForm, type RunForm } from '../../core/study/run-form.ts';
import { meanReading, plannedSettings, type Setting } from '../../core/study/study.ts';
import { discardDraft, listRunDrafts, saveDraft } from '../../store/drafts.ts';
import type { Draft } from '../../store/db.ts';
import type { DivergedRun } from '../../core/study/diverged-runs.ts';
import { listDivergedRuns, openPlannedRun, openRun, restoreRevision, saveRun, takeOtherDraft, type RunFormState, type SaveResult } from '../../store/runs.ts';
import type { Store } from '../../store/store.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import { registerOnScreen } from '../lib/on-screen.ts';
import { storageCleared } from '../lib/storage-cleared.ts';
import { markTyping } from '../lib/unsaved-forms.ts';
import { formIdFor } from '../lib/form-id.ts';
import { num } from '../lib/format.ts';

/** The channel on which a tab says it saved a run (the other tabs' forms keep their typing again). */
const SAVES_CHANNEL = 'trialbook-run-saves';

export type SaveState = 'loading' | 'editing' | 'saving' | 'saved';
export type DraftState = 'none' | 'restored' | 'keeping' | 'kept' | 'failed';

/** The boxes of one response's readings, as the form text holds them ("70.2;70.4" or "70.2 70.4"). */
export function readingBoxes(text: string): string[] {
  return splitReadings(text);
}

/** The form text of a response's reading boxes. */
export function joinBoxes(boxes: readonly string[]): string {
  return joinReadings(boxes);
}

/** What the actual-setting fields are called in messages, the same words as at saving (parseRunForm). */
function actualField(name: string): string {
  return `${name}: the actual setting`;
}

/** The file name of a run form's typing downloaded when the records are gone. */
function onScreenName(title: string, plannedRun: number): string {
  const slug = title.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'study';
  return `trialbook-typing-${slug}-run-${plannedRun}.json`;
}

/** What a run form shows, as it was typed, named by study and run (a record of the typing, not a backup). */
function onScreenText(s: RunFormState, f: RunForm, now: Date): string {
  const { study } = s;
  return JSON.stringify(
    {
      what: 'The typing of one Trialbook run form, downloaded after the browser removed the records of this device. It is not a backup file: type it again into the run form.',
      downloadedAt: now.toISOString(),
      study: { id: study.id, title: study.title },
      run: s.plannedRun,
      runId: s.runId,
      settings: study.factors.map((factor, i) => ({ factor: factor.name, planned: plannedSettings(study, s.plannedRun)[i], actual: f.actual[i] })),
      readings: study.responses.map((r, i) => ({ response: r.name, unit: r.unit ?? '', readings: f.readings[i] })),
      loggedAt: f.loggedAt,
      operator: f.operator,
      notes: f.notes,
      excluded: f.excluded,
      reason: f.reason,
    },
    null,
    2,
  );
}

export const RunFormModel = createModel((store: Store, studyId: string, plannedRun: number) => {
  const state = signal<RunFormState | null>(null);
  const form = signal<RunForm | null>(null);
  const saveState = signal<SaveState>('loading');
  const draftState = signal<DraftState>('none');
  const problem = signal<Problem | null>(null);
  const lastSave = signal<SaveResult | null>(null);
  /** The run's current revisions when its edits diverged (changed in two places), else null. */
  const diverged = signal<DivergedRun | null>(null);
  const keeping = signal(false);
  let drafts: Promise<unknown> = Promise.resolve();
  // This form's own id in this tab: its draft is its own, and a reload of the tab finds it again.
  const formKey = `run-form:${studyId}:${plannedRun}`;
  const formId = formIdFor(formKey);
  /** Typing of this run kept by other forms (other tabs, or tabs since closed), oldest change first. */
  const otherDrafts = signal<readonly Draft[]>([]);

  const planned = computed<Setting[]>(() => (state.value ? plannedSettings(state.value.study, plannedRun) : []));

  /** Per factor: a message when its actual setting cannot be read, else null. */
  const actualErrors = computed<(string | null)[]>(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f) return [];
    return s.study.factors.map((factor, i) => {
      try {
        readSetting(factor, f.actual[i], actualField(factor.name));
        return null;
      } catch (err) {
        return problemOf(err).message;
      }
    });
  });

  /** Per factor: true when the actual setting as typed can be read and differs from the plan. */
  const differs = computed<boolean[]>(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f) return [];
    return s.study.factors.map((factor, i) => {
      try {
        return readSetting(factor, f.actual[i]) !== planned.value[i];
      } catch {
        return false;
      }
    });
  });

  /** Per factor: the strong warning when the actual setting as typed is far outside the planned range, else null. */
  const farOutside = computed<(string | null)[]>(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f) return [];
    const factors = s.study.factors;
    return factors.map((factor, i) => {
      try {
        const v = readSetting(factor, f.actual[i]);
        const actual = factors.map((_, j) => (j === i ? v : Number.NaN));
        const far = farOutsideSettings(factors, actual)[0];
        return far ? farOutsideText(`Run ${plannedRun}`, factor, far) : null;
      } catch {
        return null;
      }
    });
  });
  /** The far-outside warnings waiting for the person's yes before saving, or null. */
  const confirmingFar = signal<readonly string[] | null>(null);
  /**
   * A save with no reading of any response (and not excluded) waiting for the person's yes, or
   * null: `dropped` names the readings saved before that this save would take away (each with
   * its unit), empty for a run that had none.
   */
  const confirmingNoReading = signal<{ readonly dropped: readonly string[] } | null>(null);

  /** Per response: a message when a reading cannot be read, else null. */
  const readingErrors = computed<(string | null)[]>(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f) return [];
    return s.study.responses.map((r, i) => {
      try {
        parseReadings(f.readings[i], r.name, true);
        return null;
      } catch (err) {
        return problemOf(err).message;
      }
    });
  });

  /** Per response: the mean of the readings typed so far, or null. */
  const means = computed<(number | null)[]>(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f) return [];
    return s.study.responses.map((r, i) => {
      try {
        return meanReading(parseReadings(f.readings[i], r.name, true));
      } catch {
        return null;
      }
    });
  });

  /** The problem to show: once the records are gone, that (the store's closed-database error would say "updated in another tab"). */
  function problemFor(err: unknown): Problem {
    const gone = storageCleared.peek();
    return gone !== null ? { message: gone, offerExport: false, kind: 'storage' } : problemOf(err);
  }

  function keepDraft() {
    const s = state.peek();
    const f = form.peek();
    if (!s || !f) return;
    draftState.value = 'keeping';
    drafts = drafts.then(
      () =>
        saveDraft(store, { ...s, studyId: s.study.id }, f).then(
          () => {
            if (form.peek() === f) draftState.value = 'kept';
          },
          (err) => {
            draftState.value = 'failed';
            problem.value = problemFor(err);
          },
        ),
    );
  }

  function change(patch: Partial<RunForm>) {
    const f = form.peek();
    if (!f || saveState.peek() === 'saving' || saveState.peek() === 'loading') return;
    form.value = { ...f, ...patch };
    saveState.value = 'editing';
    confirmingFar.value = null;
    confirmingNoReading.value = null;
    if (problem.peek()?.kind === 'input') problem.value = null;
    keepDraft();
  }

  function setBoxes(i: number, boxes: string[]) {
    const f = form.peek();
    if (!f) return;
    const readings = [...f.readings];
    readings[i] = joinBoxes(boxes);
    change({ readings });
  }

  /** True when there is something to save: a new run, typing waiting in a draft, or a change since the form opened. */
  const dirty = computed(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f) return false;
    if (!s.current || s.fromDraft) return true;
    return JSON.stringify(f) !== JSON.stringify(s.form);
  });
  /** True when this form holds typing of its own not yet saved (restored from its draft, or typed since it opened). */
  const ownTyping = computed(() => {
    const s = state.value;
    const f = form.value;
    if (!s || !f || saveState.value === 'saved') return false;
    return s.fromDraft || JSON.stringify(f) !== JSON.stringify(s.form);
  });
  // An app update waits while this form holds typing a reload would lose: typing whose draft
  // is still being written or could not be written, or a save under way (components/update-banner).
  effect(() => {
    const d = draftState.value;
    const s = saveState.value;
    markTyping(formKey, !dirty.value || s === 'saved' ? 'none' : s === 'saving' || d === 'keeping' || d === 'failed' ? 'unsaved' : d === 'none' ? 'none' : 'kept');
    return () => markTyping(formKey, 'none');
  });

  // Another tab's save of this run drops the run's draft when the draft held what it saved;
  // this form's typing, when it differs, is then kept again, so no tab's typing is lost.
  effect(() => {
    if (typeof BroadcastChannel === 'undefined') return;
    const channel = new BroadcastChannel(SAVES_CHANNEL);
    channel.onmessage = (e: MessageEvent<unknown>) => {
      const s = state.peek();
      const runId = (e.data as { runId?: unknown } | null)?.runId;
      if (s && runId === s.runId && dirty.peek() && saveState.peek() === 'editing') keepDraft();
      if (s && runId === s.runId) void refreshOthers();
    };
    return () => channel.close();
  });
  function announceSave(runId: string) {
    if (typeof BroadcastChannel === 'undefined') return;
    const channel = new BroadcastChannel(SAVES_CHANNEL);
    channel.postMessage({ runId });
    channel.close();
  }

  async function readDiverged(opened: RunFormState) {
    if (!opened.current || opened.current.heads.length < 2) {
      diverged.value = null;
      return;
    }
    diverged.value = (await listDivergedRuns(store, opened.study.id, [opened.current]))[0] ?? null;
  }

  // The browser removed the records under the page: the typing stays in this form only; say so
  // (no draft is kept), and give what is on screen as a file to download at once.
  effect(() => {
    const message = storageCleared.value;
    if (message === null) return;
    draftState.value = dirty.peek() ? 'failed' : draftState.peek();
    problem.value = { message, offerExport: false, kind: 'storage' };
  });
  effect(() => {
    registerOnScreen(formKey, () => {
      const s = state.peek();
      const f = form.peek();
      if (!s || !f) return null;
      return { name: onScreenName(s.study.title, plannedRun), text: onScreenText(s, f, store.now()) };
    });
    return () => registerOnScreen(formKey, null);
  });

  /** Reads again which other forms hold typing for this run (after another tab saved it). */
  async function refreshOthers() {
    const s = state.peek();
    if (!s) return;
    try {
      otherDrafts.value = (await listRunDrafts(store, s.runId)).filter((d) => d.formId !== formId);
    } catch {
      // The list is a hint only; the form itself is unaffected.
    }
  }

  function show(opened: RunFormState) {
    state.value = opened;
    form.value = opened.form;
    otherDrafts.value = opened.otherDrafts;
    draftState.value = opened.fromDraft ? 'restored' : 'none';
  }

  /** Reopens the form from the stored run (after a restore wrote a new current revision). */
  async function reload() {
    await drafts;
    const s = state.peek();
    try {
      const opened = s ? await openRun(store, s.runId, formId) : await openPlannedRun(store, studyId, plannedRun, formId);
      await readDiverged(opened);
      show(opened);
      saveState.value = 'editing';
      problem.value = null;
    } catch (err) {
      problem.value = problemFor(err);
    }
  }

  return {
    state: state as ReadonlySignal<RunFormState | null>,
    form: form as ReadonlySignal<RunForm | null>,
    saveState: saveState as ReadonlySignal<SaveState>,
    draftState: draftState as ReadonlySignal<DraftState>,
    problem: problem as ReadonlySignal<Problem | null>,
    lastSave: lastSave as ReadonlySignal<SaveResult | null>,
    diverged: diverged as ReadonlySignal<DivergedRun | null>,
    keeping: keeping as ReadonlySignal<boolean>,
    planned,
    actualErrors,
    differs,
    farOutside,
    confirmingFar: confirmingFar as ReadonlySignal<readonly string[] | null>,
    /** The person goes back to correct a far-outside setting: nothing is saved. */
    cancelFar() {
      confirmingFar.value = null;
    },
    confirmingNoReading: confirmingNoReading as ReadonlySignal<{ readonly dropped: readonly string[] } | null>,
    /** The person goes back to type the reading: nothing is saved. */
    cancelNoReading() {
      confirmingNoReading.value = null;
    },
    readingErrors,
    means,
    dirty,
    /** True when the run has been saved before (this form adds a revision). */
    isLogged: computed(() => state.value?.current != null),

    /** Opens the form: the logged run of this planned run (or its draft), else a waiting draft of a new run, else a new run. */
    async load() {
      try {
        const opened = await openPlannedRun(store, studyId, plannedRun, formId);
        await readDiverged(opened);
        show(opened);
        saveState.value = 'editing';
      } catch (err) {
        problem.value = problemFor(err);
      }
    },

    reload,

    otherDrafts: otherDrafts as ReadonlySignal<readonly Draft[]>,
    ownTyping,

    /**
     * Takes another form's waiting typing into this form (the person picked it), kept at once as
     * this form's own draft; the other form's draft stays as it was. Waits while this form holds
     * typing of its own (save or discard it first), so nothing typed here is replaced.
     */
    async takeOther(otherFormId: string) {
      const s = state.peek();
      if (!s || saveState.peek() === 'saving') return;
      if (ownTyping.peek()) return;
      await drafts;
      try {
        const taken = takeOtherDraft({ ...s, otherDrafts: otherDrafts.peek() }, otherFormId);
        show(taken);
        saveState.value = 'editing';
        problem.value = null;
        keepDraft();
      } catch (err) {
        problem.value = problemFor(err);
      }
    },

    /** Throws away another form's waiting typing (the person chose to, seeing it); this form is unchanged. */
    async discardOther(otherFormId: string) {
      try {
        await discardDraft(store, otherFormId);
        otherDrafts.value = otherDrafts.peek().filter((d) => d.formId !== otherFormId);
      } catch (err) {
        problem.value = problemFor(err);
      }
    },

    /**
     * Keeps one of a diverged run's current revisions: its values become a new revision made
     * from all of them (a restore), so the run has one current revision again; nothing is
     * deleted. Waits while the form holds typing (save or discard it first).
     */
    async keepRevision(revisionId: string) {
      const s = state.peek();
      if (!s || keeping.peek() || saveState.peek() === 'saving') return;
      if (dirty.peek() && saveState.peek() !== 'saved') return;
      keeping.value = true;
      problem.value = null;
      try {
        await restoreRevision(store, s.runId, revisionId);
        announceSave(s.runId);
        await reload();
      } catch (err) {
        problem.value = problemFor(err);
      } finally {
        keeping.value = false;
      }
    },

    /** Throws away the typing not yet saved (its draft too) and shows the saved run again. */
    async discardTyping() {
      const s = state.peek();
      if (!s || saveState.peek() === 'saving') return;
      await drafts;
      try {
        await discardDraft(store, formId);
      } catch (err) {
        problem.value = problemFor(err);
        return;
      }
      await reload();
    },

    setActual(i: number, text: string) {
      const f = form.peek();
      if (!f) return;
      const actual = [...f.actual];
      actual[i] = text;
      change({ actual });
    },
    setReading(i: number, j: number, text: string) {
      const f = form.peek();
      if (!f) return;
      const boxes = readingBoxes(f.readings[i]);
      boxes[j] = text.trim();
      setBoxes(i, boxes);
    },
    addReading(i: number) {
      const f = form.peek();
      if (!f) return;
      setBoxes(i, [...readingBoxes(f.readings[i]), '']);
    },
    removeReading(i: number, j: number) {
      const f = form.peek();
      if (!f) return;
      const boxes = readingBoxes(f.readings[i]);
      boxes.splice(j, 1);
      setBoxes(i, boxes.length === 0 ? [''] : boxes);
    },
    setNotes(notes: string) {
      change({ notes });
    },
    setOperator(operator: string) {
      change({ operator });
    },
    setExcluded(excluded: boolean) {
      change({ excluded });
    },
    setReason(reason: string) {
      change({ reason });
    },
    setTimeNow() {
      change({ loggedAt: store.now().toISOString() });
    },

    /**
     * Checks the form and saves it as a new revision; a wrong entry changes nothing. A setting far
     * outside the planned range waits for a yes (save again with `confirmed`) before saving, and so
     * does a run with no reading at all that is not excluded (save again with `noReading`): a
     * reading can come later, but a tap on Save must not log an empty run, nor take away the
     * readings saved before, without a word.
     */
    async save(confirmed = false, noReading = false) {
      const s = state.peek();
      const typed = form.peek();
      if (!s || !typed || saveState.peek() === 'saving') return;
      const far = farOutside.peek().filter((x): x is string => x !== null);
      if (far.length > 0 && !confirmed) {
        try {
          parseRunForm(s.study, typed); // a wrong entry is said first
        } catch (err) {
          problem.value = problemFor(err);
          return;
        }
        confirmingFar.value = far;
        return;
      }
      confirmingFar.value = null;
      // A run without a time gets the time of its first saving.
      const f = typed.loggedAt.trim() === '' && !s.current ? { ...typed, loggedAt: store.now().toISOString() } : typed;
      let values;
      try {
        values = parseRunForm(s.study, f);
      } catch (err) {
        problem.value = problemFor(err);
        return;
      }
      problem.value = null;
      if (!noReading && !values.excluded && values.readings.every((r) => r.length === 0)) {
        confirmingNoReading.value = { dropped: droppedReadings(s) };
        return;
      }
      confirmingNoReading.value = null;
      saveState.value = 'saving';
      try {
        await drafts; // the last draft write lands before the save drops the draft
        const result = await saveRun(store, { runId: s.runId, revisionId: s.revisionId, studyId: s.study.id, plannedRun: s.plannedRun, parents: s.parents, values });
        announceSave(s.runId);
        // A fresh form state: the next change will be a new revision on top of this one.
        const reopened = await openRun(store, s.runId, formId);
        await readDiverged(reopened);
        state.value = reopened;
        form.value = reopened.form;
        otherDrafts.value = reopened.otherDrafts;
        lastSave.value = result;
        draftState.value = 'none';
        saveState.value = 'saved';
      } catch (err) {
        problem.value = problemFor(err);
        saveState.value = 'editing';
      }
    },
  };
});

/** The readings of the run's saved state, one line per response that has any ("Thickness 70.4, 70.6 µm"). */
function droppedReadings(s: RunFormState): string[] {
  const saved = s.current?.readings;
  if (!saved) return [];
  const out: string[] = [];
  s.study.responses.forEach((r, i) => {
    const values = saved[i] ?? [];
    if (values.length > 0) out.push(`${r.name} ${values.map((v) => num(v, 6)).join(', ')}${r.unit ? ` ${r.unit}` : ''}`);
  });
  return out;
}
