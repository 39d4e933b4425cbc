/**
 * Hand-made plans for tests, built here so that tests of the records, the store and the study do
 * not depend on the design builder: a 2^k full factorial's runs in standard order, and a design
 * record with no fraction, generators, aliases or blocks around given runs. INVENTED test plans.
 */
import type { DesignRun } from '../../src/core/design/design.ts';
import type { StudyPlan } from '../../src/core/study/study.ts';

/** A 2^k full factorial in standard order (A fastest; Montgomery, 8th ed., section 6.2), `replicates` times, then `centers` center runs. */
export function factorialRuns(k: number, replicates = 1, centers = 0): DesignRun[] {
  const runs: DesignRun[] = [];
  for (let rep = 1; rep <= replicates; rep++) {
    for (let i = 0; i < 2 ** k; i++) {
      runs.push({ run: runs.length + 1, standardOrder: i + 1, replicate: rep, block: 1, originBlock: 1, kind: 'factorial', coded: Array.from({ length: k }, (_, j) => ((i >> j) & 1 ? 1 : -1)) });
    }
  }
  for (let c = 0; c < centers; c++) runs.push({ run: runs.length + 1, standardOrder: null, replicate: 1, block: 1, originBlock: 1, kind: 'center', coded: Array.from({ length: k }, () => 0) });
  return runs;
}

/** A plan's design record around `runs`: no generators, defining relation, resolution, aliases, block words or seed. */
export function plainDesign(runs: DesignRun[], summary: string, notes: string[] = []): StudyPlan['design'] {
  return { runs, generators: [], definingRelation: [], resolution: null, wordLengths: {}, aliases: [], blockWords: [], seed: null, summary, notes };
}
