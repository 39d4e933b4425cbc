/**
 * The sentences that say a run has two (or more) current revisions, for the analysis notes, the
 * import report and the command line: which run, that both are kept, the value each holds, and
 * which one is used. Values are written with shortNumber; the response or factor is named.
 * Example: divergedNote(study, d) -> "Run 3 has 2 current revisions (changed in two places from
 * the same revision): the one used holds Gloss 88.6 GU; the other holds Gloss 87.1 GU. Both are kept;
 * keep one as a new revision on the run's form."
 */
import type { DivergedRun } from '../study/diverged-runs.ts';
import { meanReading, type RunRevision, type StudyPlan } from '../study/study.ts';
import { shortNumber } from './number-text.ts';

type Names = Pick<StudyPlan, 'factors' | 'responses'>;

const settingText = (v: number | string, unit: string | undefined) => (typeof v === 'number' ? `${shortNumber(v)}${unit ? ` ${unit}` : ''}` : v);

/** The values of one current revision, as short phrases: each response's mean, the settings that differ between the heads, and an exclusion. */
export function revisionValuesText(study: Names, rev: RunRevision, all: readonly RunRevision[]): string {
  const parts: string[] = [];
  study.factors.forEach((f, i) => {
    if (all.some((o) => o.actual[i] !== rev.actual[i])) parts.push(`${f.name} ${settingText(rev.actual[i], f.kind === 'numeric' ? f.unit : undefined)}`);
  });
  study.responses.forEach((r, i) => {
    const m = meanReading(rev.readings[i] ?? []);
    parts.push(`${r.name} ${m === null ? 'not measured' : settingText(m, r.unit || undefined)}`);
  });
  if (rev.excluded) parts.push(`excluded (${rev.reason})`);
  else if (all.some((o) => o.excluded)) parts.push('used in the analysis');
  return parts.join(', ');
}

/** Where the edits were made, in words: one device's two tabs, or two devices. */
export function divergedPlaces(d: Pick<DivergedRun, 'oneDevice'>): string {
  return d.oneDevice ? 'changed in two places on one device' : 'changed on two devices';
}

/** One sentence for a diverged run, naming it, both values, and which one is used. */
export function divergedNote(study: Names, d: DivergedRun): string {
  const all = [...d.others, d.current];
  const others = d.others.map((o) => revisionValuesText(study, o, all));
  return (
    `Run ${d.plannedRun} has ${all.length} current revisions (${divergedPlaces(d)} from the same revision): ` +
    `the one used holds ${revisionValuesText(study, d.current, all)}; ` +
    `${others.length === 1 ? 'the other holds' : 'the others hold'} ${others.join('; ')}. ${all.length === 2 ? 'Both are' : 'All are'} kept; keep one as a new revision on the run's form.`
  );
}
