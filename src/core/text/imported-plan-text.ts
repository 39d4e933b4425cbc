/**
 * The sentences of a CSV import that carries each run's planned settings beside its actual ones
 * (a Trialbook export, or columns the person mapped as planned settings): how the new study's
 * plan was made, and what to do when a planned cell cannot be used.
 * Example: plannedCellMissing('Row 4, column 7 ("Power planned")', 'Power') ->
 *   'Row 4, column 7 ("Power planned"): Power has no planned setting; give the run's planned setting, or leave the column unmapped to import the runs without a plan'.
 */

/** A planned cell that is empty. */
export function plannedCellMissing(where: string, factor: string): string {
  return `${where}: ${factor} has no planned setting; give the run's planned setting, or leave the column unmapped to import the runs without a plan`;
}

/** A planned cell that is not a setting of the factor (the reason comes from the coding). */
export function plannedCellUnreadable(where: string, reason: string): string {
  return `${where}: the planned setting cannot be read: ${reason}. Correct the cell, or leave the column unmapped to import the runs without a plan`;
}

/** Some factors have a planned column and others none. */
export function plannedColumnsPartial(missing: readonly string[]): string {
  return `Map a planned-settings column for every factor, or for none: ${missing.join(', ')} ${missing.length === 1 ? 'has' : 'have'} none`;
}

/** A Kind cell that is not a kind of run. */
export function runKindUnknown(where: string, got: string, kinds: readonly string[]): string {
  return `${where}: the kind of run needs one of ${kinds.join(', ')}, got "${got}"`;
}

/** A standard-order or replicate cell that is not a whole number from 1. */
export function wholeNumberNeeded(where: string, what: string, got: string, blankAllowed: boolean): string {
  return `${where}: ${what} needs a whole number from 1${blankAllowed ? ' (or an empty cell)' : ''}, got "${got}"`;
}

/** The design summary of a study imported with its planned settings. */
export function importedWithPlanSummary(rows: number): string {
  return `Imported from a CSV file of ${rows} ${rows === 1 ? 'row' : 'rows'} with each run's planned and actual settings; the plan is the file's planned settings.`;
}

/** The design note of a study imported with its planned settings. */
export const IMPORTED_WITH_PLAN_NOTE =
  'The planned settings are the plan: the plan decides what can be estimated, and the actual settings enter the fit, as for runs logged on this phone.';

/** A row of the plan that holds no logged run (its settings and readings are empty). */
export function unloggedRowsNote(n: number): string {
  return `${n} planned ${n === 1 ? 'run has' : 'runs have'} no actual settings or readings in the file: ${n === 1 ? 'it is' : 'they are'} in the plan, not yet logged`;
}
