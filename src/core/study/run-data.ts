/**
 * From a study's logged runs to the data the analysis takes for one response: the coded ACTUAL
 * settings of every run used, and the mean of its readings. Excluded runs and runs without a
 * reading of the response are skipped and counted in the messages. Several readings of one run are
 * repeat measurements: their mean is the run's value, and they are never counted as replicates
 * (true replicates are separate runs of the plan). The planned coded settings come along: the
 * nominal plan decides what the runs can estimate (fit/nominal-settings.ts).
 * An actual setting far outside the planned range (farOutsideSettings) is named in the
 * messages with its run.
 * Example: a run with readings [10, 12] contributes one row with y = 11.
 */
import { InputError } from '../errors.ts';
import { toCoded } from '../factor/coding.ts';
import type { Response } from './response.ts';
import type { ResponseData } from './response-data.ts';
import { farOutsideSettings } from '../factor/far-outside.ts';
import { farOutsideText } from '../text/far-outside-text.ts';
import type { RunKind } from '../design/design.ts';
import { meanReading, plannedRunOf, type LoggedRun, type StudyPlan } from './study.ts';

/** Finds a response by name (case-insensitive, surrounding spaces ignored); throws listing the names otherwise. */
export function findResponse(study: Pick<StudyPlan, 'responses' | 'title'>, name: string): { response: Response; index: number } {
  const key = name.trim().toLowerCase();
  const index = study.responses.findIndex((r) => r.name.trim().toLowerCase() === key);
  if (index < 0) {
    const names = study.responses.map((r) => `"${r.name}"`).join(', ') || 'none';
    throw new InputError(`Study "${study.title}" has no response "${name}"; its responses are ${names}`);
  }
  return { response: study.responses[index], index };
}

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/**
 * Run kinds kept out of the model unless asked for: path runs lie outside the region the model
 * was fitted in, and confirmation runs are the test of the model, so fitting them would judge
 * the model by itself (common practice; Montgomery, 8th ed., section 11.2, from memory).
 */
export const JUDGED_KINDS: readonly RunKind[] = ['path', 'confirmation'];

/** The message for n path or confirmation runs left out of the fit. Example: judgedKeptOut(3) -> "3 path and confirmation runs kept out of the model (they are judged against it)". */
export function judgedKeptOut(n: number): string {
  return `${plural(n, 'path or confirmation run', 'path and confirmation runs')} kept out of the model (they are judged against it)`;
}

export interface RunDataOptions {
  /** Also fit the path and confirmation runs (JUDGED_KINDS); default false. */
  readonly includeJudged?: boolean;
}

/** The analysis data of one response from the current state of a study's logged runs. */
export function responseDataFromRuns(study: StudyPlan, runs: readonly LoggedRun[], responseName: string, options: RunDataOptions = {}): ResponseData {
  const { response, index } = findResponse(study, responseName);
  const ordered = [...runs].sort((a, b) => a.plannedRun - b.plannedRun || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const coded: number[][] = [];
  const y: number[] = [];
  const blocks: number[] = [];
  const labels: string[] = [];
  const points: string[] = [];
  const standardOrder: (number | null)[] = [];
  const planned: (number[] | null)[] = [];
  const seen = new Map<number, number>();
  let excluded = 0;
  let missing = 0;
  let repeated = 0;
  const farNotes: string[] = [];
  let judged = 0;
  for (const run of ordered) {
    const plan = plannedRunOf(study, run.plannedRun);
    if (!options.includeJudged && plan && JUDGED_KINDS.includes(plan.kind)) {
      judged++;
      continue;
    }
    if (run.excluded) {
      excluded++;
      continue;
    }
    const readings = run.readings[index] ?? [];
    const mean = meanReading(readings);
    if (mean === null) {
      missing++;
      continue;
    }
    if (readings.length > 1) repeated++;
    // A setting far outside the plan (a slipped digit) is named, as the fit extrapolates through it.
    for (const far of farOutsideSettings(study.factors, run.actual)) farNotes.push(farOutsideText(`Run ${run.plannedRun}`, study.factors[far.factor], far));
    coded.push(study.factors.map((f, i) => toCoded(f, run.actual[i])));
    y.push(mean);
    blocks.push(plan?.block ?? 1);
    // Runs planned at the same coded settings are repeats of one point, whatever their actuals.
    points.push(plan ? plan.coded.join(',') : `run ${run.plannedRun}`);
    planned.push(plan ? [...plan.coded] : null);
    standardOrder.push(plan && plan.kind === 'factorial' ? plan.standardOrder : null);
    const k = (seen.get(run.plannedRun) ?? 0) + 1;
    seen.set(run.plannedRun, k);
    labels.push(k === 1 ? String(run.plannedRun) : `${run.plannedRun}#${k}`);
  }
  const messages: string[] = [];
  if (judged > 0) messages.push(judgedKeptOut(judged));
  if (excluded > 0) messages.push(`${plural(excluded, 'excluded run', 'excluded runs')} skipped`);
  if (missing > 0) messages.push(`${plural(missing, 'run', 'runs')} without a value for ${response.name} skipped`);
  if (repeated > 0) {
    messages.push(`${plural(repeated, 'run has', 'runs have')} several readings of ${response.name}: each run's mean is used, and repeat readings are not counted as replicates`);
  }
  messages.push(...farNotes);
  const blocked = blocks.some((b) => b !== 1);
  return {
    factors: study.factors,
    response: response.name,
    ...(response.unit ? { unit: response.unit } : {}),
    lowerBound: response.lowerBound ?? null,
    coded,
    y,
    blocks: blocked ? blocks : null,
    points,
    planned,
    ...(study.design.screening ? { screening: { runs: study.design.screening.runs, standardOrder } } : {}),
    labels,
    messages,
  };
}
