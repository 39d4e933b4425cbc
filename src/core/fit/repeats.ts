/**
 * The repeats step of the analysis: which runs are repeats of one another, the pure error they
 * give, and how many repeat groups are near replicates. Repeats are the runs of one nominal
 * point (nominal-settings.ts) when given, else of one planned point (data.points), else the runs
 * at identical settings: on the Yates
 * path the runs sharing a cell (all center runs form one group), otherwise settings equal within
 * SETTING_TOLERANCE (pure-error.ts). Always within one block.
 * A near-replicate group is a group of planned repeats whose actual settings are not all equal:
 * pure error from it is then approximate (common practice: the runs were meant as replicates).
 * Source: Montgomery, Design and Analysis of Experiments, 8th ed., section 10.7 (pure error).
 * Cost O(n log n k).
 * Example: the 2^3 plasma etch runs (Montgomery 8th ed., Example 6.1) -> pure.df 8, nearReplicates 0.
 */
import { labelGroups, pureErrorOfGroups, settingGroups, type PureError } from './pure-error.ts';

export interface Repeats {
  /** Group number of each run (runs repeated at one point and block share one). */
  readonly groups: Int32Array;
  readonly pure: PureError;
  /** Number of planned repeat groups whose actual settings differ; 0 without a plan. */
  readonly nearReplicates: number;
}

export interface RepeatsInput {
  readonly coded: readonly (readonly number[])[];
  readonly y: readonly number[];
  /** Planned point of each run, or null/undefined when the plan is not known. */
  readonly points?: readonly string[] | null;
  /** Block of each run, or null when unblocked. */
  readonly blocks: readonly number[] | null;
  /** Yates cell of each run (-1 for a center run) when the Yates path was taken, else null. */
  readonly cells: Int32Array | null;
  /** Number of factors (the center runs' group number on the Yates path is 2^k). */
  readonly k: number;
  /**
   * Nominal coded settings of each run (nominal-settings.ts): when given, runs at one nominal
   * point and block are repeats, and groups whose actual settings differ are near replicates.
   */
  readonly nominal?: readonly (readonly number[])[] | null;
}

export function findRepeats(input: RepeatsInput): Repeats {
  const { coded, y, points, blocks, cells, k, nominal } = input;
  const groups = cells
    ? cellGroups(cells, k)
    : nominal
      ? settingGroups(nominal, blocks)
      : points
        ? labelGroups(points, blocks)
        : settingGroups(coded, blocks);
  const pure = pureErrorOfGroups(groups, y);
  let nearReplicates = 0;
  if ((points || nominal) && !cells && pure.df > 0) {
    const exact = settingGroups(coded, blocks);
    const near = new Set<number>();
    const firstExact = new Map<number, number>();
    for (let i = 0; i < groups.length; i++) {
      const f = firstExact.get(groups[i]);
      if (f === undefined) firstExact.set(groups[i], exact[i]);
      else if (f !== exact[i]) near.add(groups[i]);
    }
    nearReplicates = near.size;
  }
  return { groups, pure, nearReplicates };
}

/** On Yates' path the group of a run is its cell, and 2^k for every center run. */
function cellGroups(cells: Int32Array, k: number): Int32Array {
  const out = new Int32Array(cells.length);
  const center = 1 << k;
  for (let i = 0; i < cells.length; i++) out[i] = cells[i] < 0 ? center : cells[i];
  return out;
}
