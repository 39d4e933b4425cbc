/**
 * A run's form as typed: every field is text until it is saved. This is what a draft keeps on
 * every change, and what parseRunForm turns into checked RunValues at saving.
 * Readings of one response are separated by spaces or semicolons ("10.2 10.4; 10.3"); a decimal
 * comma is refused with a message rather than read as two readings.
 * Example: parseRunForm(study, {...blankForm(study, 3), readings: ['12.5 12.7']}).readings -> [[12.5, 12.7]].
 */
import { InputError } from '../errors.ts';
import { parseNumber } from '../factor/coding.ts';
import { parseTypedNumber, readSetting } from '../factor/read-setting.ts';
import { splitReadings } from './reading-text.ts';
import { checkRunValues, plannedSettings, type RunValues, type StudyPlan } from './study.ts';

export interface RunForm {
  /** Actual settings as typed, one per factor in declared order. */
  readonly actual: readonly string[];
  /** Readings as typed, one text per response in declared order. */
  readonly readings: readonly string[];
  /** When the run was made, ISO 8601, or empty. */
  readonly loggedAt: string;
  readonly operator: string;
  readonly notes: string;
  readonly excluded: boolean;
  readonly reason: string;
}

/** The form of a new run: planned settings filled in, no readings. */
export function blankForm(study: StudyPlan, plannedRun: number): RunForm {
  return {
    actual: plannedSettings(study, plannedRun).map((s) => String(s)),
    readings: study.responses.map(() => ''),
    loggedAt: '',
    operator: '',
    notes: '',
    excluded: false,
    reason: '',
  };
}

/** The form showing saved values. */
export function formFromValues(values: RunValues): RunForm {
  return {
    actual: values.actual.map((s) => String(s)),
    readings: values.readings.map((list) => list.map((x) => String(x)).join(' ')),
    loggedAt: values.loggedAt ?? '',
    operator: values.operator ?? '',
    notes: values.notes,
    excluded: values.excluded,
    reason: values.reason,
  };
}

/**
 * Readings typed for one response; throws naming the response and the reading. With
 * `typed` (the run form) a comma may be the decimal mark of each reading (parseTypedNumber);
 * without it (files) numbers are read strictly.
 */
export function parseReadings(textIn: string, responseName: string, typed = false): number[] {
  const parts = splitReadings(textIn).filter((p) => p !== '');
  return parts.map((p, i) => {
    const x = typed ? parseTypedNumber(p) : parseNumber(p);
    if (!Number.isFinite(x)) {
      const hint = /,/.test(p) ? ' (separate readings with spaces or ;, and use a point or one comma for decimals)' : '';
      throw new InputError(`${responseName}: reading ${i + 1} needs a number, got "${p}"${hint}`);
    }
    return x;
  });
}

/** The checked values of a typed form; throws InputError naming the first field in error. */
export function parseRunForm(study: StudyPlan, form: RunForm): RunValues {
  if (form.actual.length !== study.factors.length) throw new InputError(`Actual settings: needs one per factor (${study.factors.length}), got ${form.actual.length}`);
  if (form.readings.length !== study.responses.length) throw new InputError(`Readings: needs one per response (${study.responses.length}), got ${form.readings.length}`);
  const actual = study.factors.map((f, i) => readSetting(f, form.actual[i], `${f.name}: the actual setting`));
  const readings = study.responses.map((r, i) => parseReadings(form.readings[i], r.name, true));
  const loggedAt = form.loggedAt.trim() === '' ? null : form.loggedAt.trim();
  return checkRunValues(study, {
    actual,
    readings,
    loggedAt,
    operator: form.operator.trim() === '' ? null : form.operator,
    notes: form.notes,
    excluded: form.excluded,
    reason: form.reason,
  });
}
