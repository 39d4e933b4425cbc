/**
 * The planning form's second-order choice: a central composite design (axial distance, one or
 * two blocks, center runs per block) or a Box-Behnken design, built by the core on every change
 * so that the comparison shown (run count, alpha, rotatable, blocks orthogonal, prediction
 * variance, axial settings) is exactly what "Create study" stores.
 */
import { boxBehnken, DEFAULT_BOX_BEHNKEN_CENTER_RUNS } from '../../core/design/box-behnken.ts';
import { centralComposite, DEFAULT_CCD_CENTER_RUNS } from '../../core/design/central-composite.ts';
import { parseAxialDistance, type AxialDistance } from '../../core/design/axial-distance.ts';
import type { SecondOrderPlan } from '../../core/design/second-order-plan.ts';
import { InputError } from '../../core/errors.ts';
import type { FactorSpec } from '../../core/factor/factor.ts';
import { secondOrderNeedsNumeric } from '../../core/text/second-order-text.ts';
import { countText, factorCalled } from '../../core/text/plan-form-text.ts';
import { factorLetters } from '../../core/factor/letters.ts';

/** The design families the form offers. */
export type DesignFamily = 'two-level' | 'central composite' | 'Box-Behnken';

/** How the axial distance is chosen; 'number' reads the typed value. */
export type AxialChoice = 'face' | 'rotatable' | 'orthogonal' | 'number';

export interface SecondOrderChoice {
  readonly family: 'central composite' | 'Box-Behnken';
  readonly axial: AxialChoice;
  readonly axialText: string;
  readonly blocks: 1 | 2;
  /** Center runs (per block with two blocks), as typed. */
  readonly centerRuns: string;
}

/** The center runs the form starts with for a family: the core's defaults. */
export function defaultCenterRuns(family: SecondOrderChoice['family'], blocks: 1 | 2, k: number): number {
  if (family === 'Box-Behnken') return DEFAULT_BOX_BEHNKEN_CENTER_RUNS[k] ?? 3;
  return blocks === 2 ? DEFAULT_CCD_CENTER_RUNS.perBlock : DEFAULT_CCD_CENTER_RUNS.unblocked;
}

/** The categorical factors, named by letter and name as the form's fields are (empty when every factor is numeric). */
export function categoricalNames(specs: readonly { readonly kind: string; readonly name: string }[]): string[] {
  const letters = factorLetters(specs.length);
  return specs.flatMap((s, i) => (s.kind === 'categorical' ? [factorCalled(letters[i], s.name)] : []));
}

function axialOf(choice: SecondOrderChoice): AxialDistance {
  if (choice.axial !== 'number') return choice.axial;
  if (choice.axialText.trim() === '') throw new InputError('Type the axial distance in coded units (1 puts the axial runs on the faces of the box), or choose one of the other options');
  return parseAxialDistance(choice.axialText);
}

function centerCount(text: string): number {
  const s = text.trim();
  if (!/^\d+$/.test(s)) throw new InputError(countText('Center runs', 0, s));
  return Number(s);
}

/**
 * The second-order plan for the form's factors and choice, or InputError with the core's message
 * (or the numeric-factors message when a categorical factor is present).
 */
export function secondOrderPlanOf(specs: readonly FactorSpec[], choice: SecondOrderChoice, randomize: boolean, seed: number | null): SecondOrderPlan {
  const cats = categoricalNames(specs);
  if (cats.length > 0) throw new InputError(secondOrderNeedsNumeric(cats));
  const order = { randomize, ...(randomize && seed !== null ? { seed } : {}) };
  const centerRuns = centerCount(choice.centerRuns);
  if (choice.family === 'Box-Behnken') return boxBehnken({ factors: specs, centerRuns, ...order });
  return centralComposite({ factors: specs, axialDistance: axialOf(choice), blocks: choice.blocks, centerRuns, ...order });
}
