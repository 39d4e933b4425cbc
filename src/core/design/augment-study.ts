/**
 * Augmenting a logged two-level study into a central composite design, the sequential strategy
 * of response surface work: the factorial and center runs already made are kept and reused, and
 * one new block is added, holding the 2k axial runs at plus and minus alpha and its own center
 * runs (Box and Wilson 1951, Journal of the Royal Statistical Society B 13, 1-45; Montgomery,
 * Design and Analysis of Experiments, 8th ed., section 11.4.1 and Example 11.2, where the axial
 * runs were added to a first-order design that showed curvature). The axial distance defaults to
 * orthogonal blocking (Box and Hunter 1957), since the added runs are a block of their own.
 */
import { InputError } from '../errors.ts';
import type { LoggedRun, StudyPlan } from '../study/study.ts';
import { axialDistance, type AxialDistance } from './axial-distance.ts';
import type { DesignRun, RunKind } from './design.ts';
import { romanResolution } from './defining-relation.ts';
import { drawSeed, MAX_SEED } from './random.ts';
import { orderRuns } from './run-order.ts';
import { secondOrderProperties, type SecondOrderProperties } from './second-order-plan.ts';
import { MAX_CCD_FACTORS, MIN_CCD_FACTORS } from './central-composite.ts';

export interface AugmentOptions {
  /** Default 'orthogonal'. */
  readonly axialDistance?: AxialDistance;
  /** Center runs in the added block; default: as many as the study's plan already has (at least 1). */
  readonly centerRuns?: number;
  /** Seed of the added block's run order; drawn when absent. */
  readonly seed?: number;
}

export interface Augmentation {
  /** The study's plan with the added block (its earlier runs unchanged, the new ones after them). */
  readonly plan: StudyPlan;
  /** The added runs: axial and center, in run order. */
  readonly added: readonly DesignRun[];
  readonly block: number;
  readonly alpha: number;
  readonly seed: number;
  readonly properties: SecondOrderProperties;
  /** What the augmented design can estimate, what is logged, and the warnings. */
  readonly notes: readonly string[];
  /** The notes without the warnings and the caution: what was added and what the augmented design can estimate (the added block's note). */
  readonly about: string;
}

/**
 * The augmented plan of a study (see the file comment): the added block is numbered one above
 * the study's highest block, its runs numbered after the study's last run, with kind 'axial' or
 * 'center', no standard-order index, and the block as their block of origin. Cost O(N p^2) for
 * the properties.
 * Throws InputError for a study with fewer than 2 or more than 8 factors, a categorical factor,
 * no factorial runs, axial runs already in the plan, no logged run that is not excluded, runs
 * of another plan (a planned run number the study does not have), a center-run count that is not
 * a whole number, or a bad seed.
 * Example: a 2^2 with 3 center runs, augmented with 3 center runs in the new block -> 4 axial runs
 * at alpha = 1.4142 and 3 centers in block 2; the blocks are orthogonal.
 */
export function augmentStudy(study: StudyPlan, logged: readonly LoggedRun[], options: AugmentOptions = {}): Augmentation {
  const k = study.factors.length;
  if (k < MIN_CCD_FACTORS || k > MAX_CCD_FACTORS) throw new InputError(`Augmenting into a central composite design takes ${MIN_CCD_FACTORS} to ${MAX_CCD_FACTORS} factors; "${study.title}" has ${k}`);
  const cats = study.factors.filter((f) => f.kind !== 'numeric');
  if (cats.length > 0) throw new InputError(`Axial runs need numeric factors; in "${study.title}" ${cats.map((f) => f.name).join(', ')} ${cats.length === 1 ? 'is' : 'are'} categorical`);
  const runs = study.design.runs;
  const factorial = runs.filter((r) => r.kind === 'factorial');
  if (factorial.length === 0) throw new InputError(`"${study.title}" has no factorial runs to build on`);
  if (runs.some((r) => r.kind === 'axial')) throw new InputError(`"${study.title}" already has axial runs: it has been augmented before`);
  const planned = new Set(runs.map((r) => r.run));
  for (const l of logged) {
    if (!planned.has(l.plannedRun)) throw new InputError(`A logged run is for planned run ${l.plannedRun}, which "${study.title}" does not have (it has runs 1 to ${runs.length}); these runs belong to another plan`);
  }
  const used = logged.filter((l) => !l.excluded);
  if (used.length === 0) throw new InputError(`"${study.title}" has no logged runs yet (none that are not excluded): run the first-order design first, or plan a central composite design from the start`);
  const centers = runs.filter((r) => r.kind === 'center').length;
  const ns0 = options.centerRuns ?? Math.max(1, centers);
  if (!Number.isInteger(ns0) || ns0 < 0) throw new InputError(`Center runs in the added block must be a whole number, 0 or more, got ${ns0}`);
  if (options.seed !== undefined && (!Number.isSafeInteger(options.seed) || options.seed < 0)) throw new InputError(`A seed must be a whole number from 0 to ${MAX_SEED}, got ${options.seed}`);
  const ns = 2 * k;
  const alpha = axialDistance(options.axialDistance ?? 'orthogonal', k, factorial.length, { nc: factorial.length, nc0: centers, ns, ns0 });

  const block = Math.max(...runs.map((r) => r.block)) + 1;
  type Draft = { kind: RunKind; coded: readonly number[]; block: number };
  const drafts: Draft[] = [];
  for (let i = 0; i < k; i++) for (const sgn of [-1, 1]) drafts.push({ kind: 'axial', block, coded: Array.from({ length: k }, (_, j) => (j === i ? sgn * alpha : 0)) });
  for (let i = 0; i < ns0; i++) drafts.push({ kind: 'center', block, coded: new Array<number>(k).fill(0) });
  const seed = options.seed ?? drawSeed();
  const first = Math.max(...runs.map((r) => r.run)) + 1;
  const added: DesignRun[] = orderRuns(drafts, { seed }).map((d, i) => ({ run: first + i, standardOrder: null, replicate: 1, block, originBlock: block, kind: d.kind, coded: [...d.coded] }));
  const all = [...runs, ...added];
  const properties = secondOrderProperties('central composite', study.factors, all, alpha);

  const notes: string[] = [];
  // Earlier runs that give nothing yet: not logged at all, or logged and excluded (said apart: an excluded run is logged).
  const usedPlanned = new Set(used.map((l) => l.plannedRun));
  const anyPlanned = new Set(logged.map((l) => l.plannedRun));
  const notLogged = runs.filter((r) => !anyPlanned.has(r.run)).map((r) => r.run);
  const excluded = runs.filter((r) => anyPlanned.has(r.run) && !usedPlanned.has(r.run)).map((r) => r.run);
  const listed = (what: string, list: number[]) => `${list.length} of them ${what}: ${list.slice(0, 12).join(', ')}${list.length > 12 ? ', ...' : ''}`;
  const gaps = [...(notLogged.length > 0 ? [listed('not logged yet', notLogged)] : []), ...(excluded.length > 0 ? [listed('excluded', excluded)] : [])];
  notes.push(
    `New block ${block}: ${ns} axial runs at ±${Number(alpha.toPrecision(4))} (coded) and ${ns0} center run${ns0 === 1 ? '' : 's'}, runs ${first} to ${first + added.length - 1}; the ${runs.length} earlier runs are reused` +
      (gaps.length > 0 ? ` (${gaps.join('; ')}).` : '.'),
  );
  if (properties.fullQuadratic) {
    notes.push(`The augmented design can estimate the full second-order model (main effects, two-factor interactions, squares) with a block effect${properties.blocksOrthogonal ? ' orthogonal to it' : ', though not orthogonal to it'}.`);
  } else {
    const res = study.design.resolution;
    notes.push(
      `The augmented design cannot estimate the full second-order model: ${res !== null && res < 5 ? `its factorial part is resolution ${romanResolution(res)}, so some two-factor interactions are aliased with each other; fold it over or add the other fraction first` : 'its runs leave some second-order terms aliased'}. Main effects and squares can still be estimated.`,
    );
  }
  if (!properties.rotatable) notes.push('The augmented design is not rotatable: the precision of a prediction depends on its direction from the center, not only its distance.');
  const about = notes.join(' ');
  notes.push(...properties.warnings);
  if (properties.warnings.length > 0) notes.push(...properties.caution);

  const design = {
    ...study.design,
    runs: all,
    summary: `${study.design.summary} Augmented into a central composite design: block ${block} holds ${ns} axial runs (alpha ${Number(alpha.toPrecision(4))}) and ${ns0} center runs, ${all.length} runs in all.`,
    notes: [...study.design.notes, ...notes],
  };
  return { plan: { ...study, design }, added, block, alpha, seed, properties, notes, about };
}
