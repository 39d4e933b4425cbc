/**
 * Several responses at once: per response a goal and its acceptable and ideal values (starting
 * from the study's goal and the logged values, core/optimum/desirability-entry.ts), and the
 * setting inside the tested box with the highest overall desirability found by the core's search
 * (desirability-search.ts), from each response's model as chosen on the Effects screen (the
 * study's shared analysis). A value that cannot be used gets its message beside the field and
 * changes nothing: the result keeps the last values that could be read.
 */
import { computed, createModel, signal } from '@preact/signals';
import type { FittedModel } from '../../core/fit/analysis.ts';
import { defaultDesirabilityEntry, desirabilityEntryProblem, readDesirabilityEntry, type DesirabilityEntry, type EntryProblem } from '../../core/optimum/desirability-entry.ts';
import { maximizeDesirability, type DesirabilityOptimum } from '../../core/optimum/desirability-search.ts';
import { desirabilityShortfalls } from '../../core/optimum/desirability-shortfall.ts';
import type { DesirabilitySpec } from '../../core/optimum/desirability.ts';
import { cachedPredictor } from '../../core/predict/compiled-predictor.ts';
import { CAUTION } from '../../core/predict/caution.ts';
import { NOTHING_TO_OPTIMIZE, noSettingMeetsAll, notFittedMessage, transformedMessage } from '../../core/text/desirability-text.ts';
import { problemOf } from '../lib/problem.ts';
import { MODEL_CHOICES, QUADRATIC_CHOICE, type StudyAnalysis } from './study-analysis-model.ts';

/** One response's row on the screen: what is typed, its message, and whether it can take part. */
export interface ResponseRow {
  readonly index: number;
  readonly name: string;
  readonly unit?: string;
  readonly entry: DesirabilityEntry;
  /** Why the typed values cannot be used (the result keeps the values before), or null. */
  readonly error: string | null;
  /** The field the problem is in ('order': the value fields together), or null. */
  readonly errorField: EntryProblem['field'] | null;
  /** The model chosen for it on the Effects screen, as that screen names it. */
  readonly modelLabel: string;
  /** Why the response's model cannot be used (not fitted, transformed), or null. */
  readonly unusable: string | null;
}

/** A response left out (goal Ignore) with its prediction at the best setting. */
export interface IgnoredPrediction {
  readonly name: string;
  readonly unit?: string;
  readonly fit: number;
  readonly pi: readonly [number, number] | null;
}

export type SeveralResult =
  | { readonly ok: true; readonly best: DesirabilityOptimum; readonly units: readonly (string | undefined)[]; readonly ignored: readonly IgnoredPrediction[]; readonly noneMeetsAll: string | null }
  | { readonly ok: false; readonly message: string };

export const SeveralResponsesModel = createModel((shared: StudyAnalysis) => {
  /** What the person typed, by response name (absent: the starting values). */
  const typed = signal<ReadonlyMap<string, DesirabilityEntry>>(new Map());
  /** The last settings that could be read, by response name (null: ignore). */
  const lastGood = signal<ReadonlyMap<string, DesirabilitySpec | null>>(new Map());

  const rows = computed<readonly ResponseRow[]>(() =>
    shared.responses.value.map((ra) => {
      const result = ra.result.value;
      const logged = result.ok ? result.data.y : [];
      const entry = typed.value.get(ra.response.name) ?? defaultDesirabilityEntry(ra.response, logged);
      const problem = desirabilityEntryProblem(ra.response.name, entry);
      // A sentence of its own, so the note after it reads on.
      const error = problem ? (/[.!?]$/.test(problem.message) ? problem.message : `${problem.message}.`) : null;
      const unusable = !result.ok ? notFittedMessage(ra.response.name, result.message) : ra.settings.value.transform !== 'none' ? transformedMessage(ra.response.name) : null;
      return { index: ra.index, name: ra.response.name, ...(ra.response.unit ? { unit: ra.response.unit } : {}), entry, error, errorField: problem?.field ?? null, modelLabel: [...MODEL_CHOICES, QUADRATIC_CHOICE].find((c) => c.value === ra.settings.value.model)?.label ?? '', unusable };
    }),
  );

  /** The settings each response takes part with: the typed ones when they read, else the last good ones (undefined: none yet). */
  function specOf(row: ResponseRow): DesirabilitySpec | null | undefined {
    if (row.error === null) return readDesirabilityEntry(row.name, row.entry);
    return lastGood.value.has(row.name) ? lastGood.value.get(row.name) : undefined;
  }

  const result = computed<SeveralResult | null>(() => {
    const rs = rows.value;
    if (rs.length === 0) return null;
    const used: { model: FittedModel; spec: DesirabilitySpec; unit?: string }[] = [];
    const left: { model: FittedModel; name: string; unit?: string }[] = [];
    for (const row of rs) {
      const spec = specOf(row);
      const r = shared.responses.value[row.index].result.value;
      if (spec === undefined) return { ok: false, message: row.error! };
      if (spec === null) {
        if (r.ok && row.unusable === null) left.push({ model: r.analysis.model, name: row.name, ...(row.unit ? { unit: row.unit } : {}) });
        continue;
      }
      if (row.unusable !== null || !r.ok) return { ok: false, message: row.unusable ?? '' };
      used.push({ model: r.analysis.model, spec, ...(row.unit ? { unit: row.unit } : {}) });
    }
    if (used.length === 0) return { ok: false, message: NOTHING_TO_OPTIMIZE };
    try {
      const first = shared.responses.value[rs[0].index].result.value;
      const points = first.ok ? first.data.coded : [];
      const best = maximizeDesirability(
        used.map((u) => u.model),
        used.map((u) => u.spec),
        points,
      );
      const units = used.map((u) => u.unit);
      const ignored = left.map((l) => {
        const iv = cachedPredictor(l.model).interval(best.coded);
        return { name: l.name, ...(l.unit ? { unit: l.unit } : {}), fit: iv.fit, pi: iv.piLo !== null && iv.piHi !== null ? ([iv.piLo, iv.piHi] as const) : null };
      });
      const short = best.D === 0 ? desirabilityShortfalls(used.map((u) => u.spec), best.responses.map((r) => r.fit), units) : [];
      return { ok: true, best, units, ignored, noneMeetsAll: best.D === 0 ? noSettingMeetsAll(short) : null };
    } catch (err) {
      return { ok: false, message: problemOf(err).message };
    }
  });

  /** What was typed for each goal of a response, so switching goals back and forth loses nothing. */
  const memory = new Map<string, Map<DesirabilityEntry['goal'], DesirabilityEntry>>();
  function remember(name: string, e: DesirabilityEntry) {
    if (!memory.has(name)) memory.set(name, new Map());
    memory.get(name)!.set(e.goal, e);
  }

  function edit(name: string, patch: Partial<DesirabilityEntry>) {
    const row = rows.peek().find((r) => r.name === name);
    if (!row) return;
    // Keep the settings in use before this change, so a value that cannot be read changes nothing.
    if (row.error === null) {
      const good = new Map(lastGood.peek());
      good.set(name, readDesirabilityEntry(name, row.entry));
      lastGood.value = good;
    }
    const next = new Map(typed.peek());
    next.set(name, { ...row.entry, ...patch });
    typed.value = next;
  }

  return {
    rows,
    result,
    caution: computed(() => (result.value?.ok ? result.value.best.caution : CAUTION)),
    /** Sets a response's goal; the values typed for it stay (a target keeps its three). */
    setGoal(name: string, goal: DesirabilityEntry['goal']) {
      const row = rows.peek().find((r) => r.name === name);
      const ra = shared.responses.peek().find((r) => r.response.name === name);
      if (!row || !ra || row.entry.goal === goal) return;
      // Each goal keeps what was typed for it; Ignore keeps the values of the goal before it.
      if (row.entry.goal !== 'ignore') remember(name, row.entry);
      if (goal === 'ignore') return edit(name, { goal });
      const r = ra.result.peek();
      const start = defaultDesirabilityEntry(ra.response, r.ok ? r.data.y : [], goal);
      edit(name, memory.get(name)?.get(goal) ?? { ...start, weight: row.entry.weight });
    },
    setField(name: string, field: Exclude<keyof DesirabilityEntry, 'goal'>, text: string) {
      edit(name, { [field]: text });
    },
    /** Back to the starting values of every response. */
    reset() {
      typed.value = new Map();
      lastGood.value = new Map();
      memory.clear();
    },
  };
});

export type SeveralResponses = InstanceType<typeof SeveralResponsesModel>;
