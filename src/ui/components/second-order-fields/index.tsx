/**
 * The planning form's second-order fields: the axial distance of a central composite design
 * (face, rotatable, orthogonal blocks or a typed number), its one or two blocks, and the center
 * runs (per block with two); a Box-Behnken design takes only its center runs.
 */
import type { AxialChoice } from '../../models/second-order-choice.ts';
import { ChoiceButtons } from '../choice-buttons/index.tsx';
import { CountStepper } from '../count-stepper/index.tsx';
import { NumberInput } from '../number-input/index.tsx';
import './style.css';

export type SecondOrderFieldsProps = {
  readonly family: 'central composite' | 'Box-Behnken';
  readonly axial: AxialChoice;
  readonly axialText: string;
  readonly blocks: 1 | 2;
  readonly centerRuns: string;
  readonly onAxial: (v: AxialChoice) => void;
  readonly onAxialText: (v: string) => void;
  readonly onBlocks: (n: 1 | 2) => void;
  readonly onCenterRuns: (v: string) => void;
};

const AXIAL_CHOICES: readonly { value: AxialChoice; label: string }[] = [
  { value: 'face', label: 'On the faces (1)' },
  { value: 'rotatable', label: 'Rotatable' },
  { value: 'orthogonal', label: 'Orthogonal blocks' },
  { value: 'number', label: 'Type a number' },
];

const BLOCKS: readonly { value: 1 | 2; label: string }[] = [
  { value: 1, label: '1 block' },
  { value: 2, label: '2 blocks' },
];

export function SecondOrderFields(p: SecondOrderFieldsProps) {
  if (p.family === 'Box-Behnken') {
    return (
      <div class="so-fields">
        <p class="quiet field-hint">Every run sets each factor at low, center or high; no run sits on a corner of the box. For 3 to 7 factors.</p>
        <CountStepper id="ns-so-center" label="Center runs" value={p.centerRuns} min={0} onChange={p.onCenterRuns} />
      </div>
    );
  }
  return (
    <div class="so-fields">
      <p class="quiet field-hint">The two-level runs, one pair of axial runs on each factor's axis, and center runs. For 2 to 8 factors.</p>
      <ChoiceButtons label="Axial distance" options={AXIAL_CHOICES} value={p.axial} onChoose={p.onAxial} />
      {p.axial === 'face' && <p class="quiet field-hint">For a machine that cannot go past the low and high settings.</p>}
      {p.axial === 'number' && (
        <div class="field">
          <label for="ns-so-alpha" class="field-name">
            Axial distance (coded)
          </label>
          <NumberInput id="ns-so-alpha" value={p.axialText} onText={p.onAxialText} />
        </div>
      )}
      <ChoiceButtons label="Blocks" options={BLOCKS} value={p.blocks} onChoose={p.onBlocks} />
      {p.blocks === 2 && <p class="quiet field-hint">The two-level runs in one block and the axial runs in the other, each with its own center runs.</p>}
      <CountStepper id="ns-so-center" label={p.blocks === 2 ? 'Center runs in each block' : 'Center runs'} value={p.centerRuns} min={0} onChange={p.onCenterRuns} />
    </div>
  );
}
