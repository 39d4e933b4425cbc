/**
 * The largest plan Trialbook makes: 1024 runs in all, replicates and center runs included. A plan
 * is run, recorded and analyzed by hand on a phone on the production floor; past a thousand runs
 * it no longer fits a shift's work or a screen, and a mistake in it costs more than splitting the
 * work into several studies. (A design choice of this project, not a published limit.)
 */
import { InputError } from '../errors.ts';

/** Most runs in one design, replicates and center runs included. */
export const MAX_RUNS = 1024;

/**
 * Throws InputError when `total` runs exceed MAX_RUNS, saying how the total came about
 * (`breakdown`, e.g. "128 factorial runs x 8 replicates") and why the limit exists.
 * Example: checkRunLimit(2048, '2^11 = 2048 factorial runs') throws
 * "2^11 = 2048 factorial runs make 2048 runs, over the limit of 1024 ...".
 */
export function checkRunLimit(total: number, breakdown: string): void {
  if (!Number.isFinite(total) || total > MAX_RUNS) {
    throw new InputError(
      `${breakdown} make ${total} runs, over the limit of ${MAX_RUNS} runs for one design ` +
        '(a plan that size no longer fits a shift or a phone screen, and one slip costs more; ' +
        'use a fraction, fewer replicates or center runs, or split the work into several studies)',
    );
  }
}
