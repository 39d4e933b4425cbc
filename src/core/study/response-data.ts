/**
 * The runs of one response, ready for the analysis: what the command line reads from a CSV or a
 * backup and what the screens pass from the store. Rows are the runs used (logged, not
 * excluded, with a value for this response); settings are the coded ACTUAL settings.
 */
import type { Factor } from '../factor/factor.ts';

export interface ResponseData {
  readonly factors: readonly Factor[];
  /** Response name (with its unit, if any, kept apart). */
  readonly response: string;
  readonly unit?: string;
  /** The lowest value the response can take (0 for "cannot be negative"), or null/absent for none. */
  readonly lowerBound?: number | null;
  /** Coded actual settings, one row per run used, one value per factor in declared order. */
  readonly coded: readonly (readonly number[])[];
  /** The response at each run (the mean of its readings when a run has several). */
  readonly y: readonly number[];
  /** Block of each run, or null when the runs carry no block. */
  readonly blocks: readonly number[] | null;
  /**
   * The planned point of each run, when the runs come from a plan: runs planned at the same
   * settings share one, so their spread is pure error even when the actual settings they were
   * run at differ slightly. Absent: runs count as repeats only at identical actual settings.
   */
  readonly points?: readonly string[] | null;
  /**
   * Present when the runs come from a Plackett-Burman plan: its factorial runs per replicate and
   * the standard-order index (its row of the design's table) of each row's planned run, null for
   * a center run. The analysis then fits main effects by default and applies Lenth's method to
   * the design's N - 1 orthogonal columns.
   */
  readonly screening?: { readonly runs: number; readonly standardOrder: readonly (number | null)[] };
  /**
   * The planned coded settings of each run (null for a run the plan does not hold), when the runs
   * come from a plan: the nominal plan that decides what can be estimated (fit/nominal-settings.ts).
   * Absent: the plan is inferred from the actual settings (-1, 0, +1 within 0.1 coded).
   */
  readonly planned?: readonly (readonly number[] | null)[] | null;
  /** Run labels for reports (run numbers), aligned with the rows. */
  readonly labels: readonly string[];
  /** What was skipped and why ("2 excluded runs skipped"), for the report. */
  readonly messages: readonly string[];
}
