/**
 * What a person compares before committing to a second-order design: run count, axial distance,
 * whether the design is rotatable, whether its blocks are orthogonal to the full quadratic
 * model, the scaled prediction variance at the center and at distance 1, whether the runs can
 * estimate the full quadratic model at all, and the axial settings in real units with a warning
 * for each that lies outside the factorial range (with the standing caution).
 */
import { toReal } from '../factor/coding.ts';
import type { Factor, NumericFactor } from '../factor/factor.ts';
import { CAUTION } from '../predict/caution.ts';
import { designNoteText } from '../text/design-text.ts';
import type { DesignNote } from './design-note.ts';
import { SETTING_TOLERANCE } from '../tolerance.ts';
import { blocksOrthogonal } from './block-orthogonality.ts';
import type { Design, DesignRun } from './design.ts';
import { predictionVariance } from './prediction-variance.ts';
import { isRotatable } from './rotatability.ts';
import { fullQuadraticTerms } from './second-order-terms.ts';

export type SecondOrderKind = 'central composite' | 'Box-Behnken';

export interface AxialSetting {
  readonly name: string;
  readonly letter: string;
  readonly unit?: string;
  /** Real setting at coded -alpha and +alpha (12 significant digits). */
  readonly low: number;
  readonly high: number;
  /** True when alpha > 1: the axial runs go past the factorial range. */
  readonly outside: boolean;
}

export interface SecondOrderProperties {
  readonly kind: SecondOrderKind;
  readonly runs: number;
  /** Axial distance in coded units; null for a Box-Behnken design. */
  readonly alpha: number | null;
  readonly rotatable: boolean;
  readonly blocks: number;
  /** Blocks orthogonal to the full quadratic model; null with one block. */
  readonly blocksOrthogonal: boolean | null;
  /** Whether the runs can estimate the full second-order model. */
  readonly fullQuadratic: boolean;
  /** N Var(y-hat)/sigma^2 at the center, and at distance 1 along an axis and along the diagonal; null when the full quadratic cannot be estimated. */
  readonly spv: { readonly center: number; readonly axis: number; readonly diagonal: number } | null;
  readonly axialSettings: readonly AxialSetting[];
  /** One warning per factor whose axial settings lie outside the factorial range. */
  readonly warnings: readonly string[];
  /** The same warnings as typed design notes. */
  readonly warningFacts: readonly DesignNote[];
  readonly caution: readonly string[];
}

export interface SecondOrderPlan {
  readonly design: Design;
  readonly properties: SecondOrderProperties;
}

function round12(v: number): number {
  return Number(v.toPrecision(12));
}

/**
 * The axial settings in real units at coded -alpha and +alpha for each factor, and a warning for
 * each factor when alpha > 1 (outside the factorial range, perhaps beyond what the machine
 * allows). Cost O(k). Throws InputError (from toReal) for a non-finite alpha.
 * Example: Temperature 160..200 degC, alpha 1.414 -> low 151.72, high 208.28, outside true, and
 * the warning 'Axial runs set Temperature to 151.7 degC and 208.3 degC, outside the factorial
 * range 160 to 200 degC: ...'.
 */
export function axialSettings(factors: readonly NumericFactor[], alpha: number): { settings: AxialSetting[]; warnings: string[]; warningFacts: DesignNote[] } {
  const outside = alpha > 1 + SETTING_TOLERANCE;
  const settings = factors.map((f) => ({
    name: f.name,
    letter: f.letter,
    ...(f.unit ? { unit: f.unit } : {}),
    low: round12(toReal(f, -alpha) as number),
    high: round12(toReal(f, alpha) as number),
    outside,
  }));
  const warningFacts: DesignNote[] = outside
    ? settings.map((s, i) => ({
        kind: 'axial-outside' as const,
        name: s.name,
        ...(s.unit ? { unit: s.unit } : {}),
        low: s.low,
        high: s.high,
        factorialLow: factors[i].low,
        factorialHigh: factors[i].high,
      }))
    : [];
  return { settings, warnings: warningFacts.map(designNoteText), warningFacts };
}

/**
 * The properties of a second-order plan from its runs (see the file comment). Cost O(N p^2) for
 * the prediction variance plus O(N k^4) for rotatability.
 * Example: for the rotatable two-factor central composite design with 5 center runs ->
 * { runs: 13, alpha: 1.4142, rotatable: true, spv.center: 2.6, ... }.
 */
export function secondOrderProperties(kind: SecondOrderKind, factors: readonly Factor[], runs: readonly DesignRun[], alpha: number | null): SecondOrderProperties {
  const points = runs.map((r) => r.coded);
  const k = factors.length;
  const pv = predictionVariance(points);
  const blockList = runs.map((r) => r.block);
  const nBlocks = new Set(blockList).size;
  const axis = Array.from({ length: k }, (_, i) => (i === 0 ? 1 : 0));
  const diag = new Array<number>(k).fill(1 / Math.sqrt(k));
  const ax = alpha === null ? { settings: [], warnings: [], warningFacts: [] } : axialSettings(factors as readonly NumericFactor[], alpha);
  return {
    kind,
    runs: runs.length,
    alpha,
    rotatable: isRotatable(points),
    blocks: nBlocks,
    blocksOrthogonal: nBlocks > 1 ? blocksOrthogonal(points, blockList, fullQuadraticTerms(k)) : null,
    fullQuadratic: pv !== null,
    spv: pv ? { center: pv.at(new Array<number>(k).fill(0)), axis: pv.at(axis), diagonal: pv.at(diag) } : null,
    axialSettings: ax.settings,
    warnings: ax.warnings,
    warningFacts: ax.warningFacts,
    caution: CAUTION,
  };
}
