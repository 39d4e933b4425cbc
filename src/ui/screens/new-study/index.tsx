/**
 * Plan a new study: title and purpose, factors, responses and the design, with a live preview of
 * the plan (run count, summary, defining relation, resolution, notes) before "Create study"
 * stores it and opens its run sheet. A wrong entry is explained beside the form; nothing is made.
 */
import { useModel } from '@preact/signals';
import { useEffect, useRef } from 'preact/hooks';
import { romanResolution } from '../../../core/design/defining-relation.ts';
import { factorLetters } from '../../../core/factor/letters.ts';
import type { Store } from '../../../store/store.ts';
import { ChoiceButtons } from '../../components/choice-buttons/index.tsx';
import { CountStepper } from '../../components/count-stepper/index.tsx';
import { ProblemBox } from '../../components/problem-box/index.tsx';
import { hrefTo } from '../../app/routes.ts';
import { SecondOrderFacts } from '../../components/second-order-facts/index.tsx';
import { SecondOrderFields } from '../../components/second-order-fields/index.tsx';
import { categoricalNames, type DesignFamily } from '../../models/second-order-choice.ts';
import { secondOrderNeedsNumeric } from '../../../core/text/second-order-text.ts';
import { aliasListText, catalogGeneratorsHint, hardToChangeText, NO_HARD_FACTOR_TEXT, notOfferedText, spaced } from '../../../core/text/plan-form-text.ts';
import { BLOCK_CHOICES, choiceName, FORM_MAX_FACTORS, NewStudyModel, type FactorDraft, type ResponseDraft } from '../../models/new-study-model.ts';
import { SignToggle } from '../../components/sign-toggle/index.tsx';
import './style.css';

export type NewStudyScreenProps = { readonly store: Store };

const KIND_CHOICES = [
  { value: 'numeric' as const, label: 'Numbers' },
  { value: 'categorical' as const, label: 'Named levels' },
];
const GOAL_CHOICES = [
  { value: 'maximize' as const, label: 'Maximize' },
  { value: 'minimize' as const, label: 'Minimize' },
  { value: 'target' as const, label: 'Hit a target' },
];
const FLOOR_CHOICES = [
  { value: 'none' as const, label: 'No lowest value' },
  { value: 'zero' as const, label: 'Cannot be negative' },
  { value: 'other' as const, label: 'Another lowest value' },
];
const FAMILY_CHOICES: readonly { value: DesignFamily; label: string }[] = [
  { value: 'two-level', label: 'Two-level' },
  { value: 'central composite', label: 'Central composite' },
  { value: 'Box-Behnken', label: 'Box-Behnken' },
];
/** Alias chains listed in the preview before "and N more" (a design choice: a short list on a phone). */
const ALIASES_SHOWN = 8;
const SHOWN_WITH_FACTS = new Set<string | undefined>(['axial-outside', 'standing-caution']);
const ORDER_CHOICES = [
  { value: 'random' as const, label: 'Randomized' },
  { value: 'standard' as const, label: 'Standard order' },
];

function valueOf(e: Event): string {
  return (e.currentTarget as HTMLInputElement | HTMLTextAreaElement).value;
}

type TextFieldProps = {
  readonly id: string;
  readonly label: string;
  readonly value: string;
  readonly onInput: (v: string) => void;
  readonly numeric?: boolean;
  readonly invalid?: boolean;
  readonly placeholder?: string;
  /** A number that may be negative: a sign button beside it, for keypads without a minus. */
  readonly signed?: boolean;
};

/** "Factor A low" -> "Factor A's low", so the sign button's name never repeats the field's own label. */
function possessive(label: string): string {
  return label.replace(/^(\S+ \S+) /, "$1's ");
}

function TextField({ id, label, value, onInput, numeric, invalid, placeholder, signed }: TextFieldProps) {
  const input = (
    <input
      id={id}
      class={numeric ? 'num' : 'text'}
      type="text"
      inputMode={numeric ? 'decimal' : undefined}
      autocomplete="off"
      value={value}
      placeholder={placeholder}
      aria-invalid={invalid ? true : undefined}
      onInput={(e) => onInput(valueOf(e))}
    />
  );
  return (
    <div class="field">
      <label for={id} class="field-name">
        {label}
      </label>
      {signed ? (
        <div class="signed-entry">
          {input}
          <SignToggle text={value} what={possessive(label)} controls={id} onText={onInput} />
        </div>
      ) : (
        input
      )}
    </div>
  );
}

/** True once a factor row has both its settings typed, so a message about them is worth showing. */
function filledIn(f: FactorDraft): boolean {
  return f.kind === 'numeric' ? f.low.trim() !== '' && f.high.trim() !== '' : f.levelA.trim() !== '' && f.levelB.trim() !== '';
}

export function NewStudyScreen({ store }: NewStudyScreenProps) {
  const model = useModel(() => new NewStudyModel(store));
  const problemRef = useRef<HTMLDivElement>(null);
  const factors = model.factors.value;
  const letters = factorLetters(factors.length);
  const preview = model.preview.value;
  const design = preview.design;
  const problem = model.problem.value;
  const family = model.family.value;
  const categorical = family === 'two-level' ? [] : categoricalNames(factors);

  useEffect(() => {
    void model.loadNoiseSources();
  }, [model]);
  const power = model.power.value;
  const shownMessages = `${model.factorMessages.value.join('|')}|${model.generatorsProblem.value ?? ''}`;
  // A message that appears under the box being typed in is scrolled clear of the plan bar held
  // at the foot (the root's scroll-padding-bottom); 'nearest' leaves it alone when it is in view.
  useEffect(() => {
    const active = document.activeElement;
    const holder = active instanceof HTMLElement ? (active.closest('.plan-card') ?? active.closest('.field')) : null;
    holder?.querySelector('.field-error')?.scrollIntoView({ block: 'nearest' });
  }, [shownMessages]);

  async function create() {
    const made = await model.create();
    if (made) location.hash = hrefTo('runSheet', { studyId: made.id });
    else problemRef.current?.scrollIntoView({ block: 'center' });
  }

  return (
    <section class="new-study">
      <a class="back" href={hrefTo('studies', {})}>
        ‹ All studies
      </a>
      <h2>Plan a new study</h2>

      <div class="group">
        <TextField id="ns-title" label="Title" value={model.title.value} onInput={(v) => model.setTitle(v)} invalid={model.tried.value && model.title.value.trim() === ''} />
        <div class="field">
          <label for="ns-purpose" class="field-name">
            Purpose
          </label>
          <textarea id="ns-purpose" class="text" rows={2} value={model.purpose.value} onInput={(e) => model.setPurpose(valueOf(e))} />
        </div>
      </div>

      <fieldset class="group">
        <legend>Factors</legend>
        <p class="quiet">What you change on purpose, each at two levels.</p>
        {factors.map((f, i) => {
          const letter = letters[i];
          const message = model.factorMessages.value[i];
          const show = message !== null && (model.tried.value || filledIn(f));
          const reversed = model.factorProblems.value[i]?.kind === 'reversed';
          // Right under the settings it is about, so the plan bar at the foot does not cover it while typing.
          const rowMessage = show && (
            <>
              <p class="field-error" role="alert" id={`ns-f${f.key}-error`}>
                {message}
              </p>
              {reversed && (
                <button type="button" class="btn block swap-levels" aria-describedby={`ns-f${f.key}-error`} onClick={() => model.swapLevels(i)}>
                  Swap low and high
                </button>
              )}
            </>
          );
          return (
            <div class="plan-card" key={f.key} data-factor={letter}>
              <div class="plan-card-head">
                <span class="plan-card-title">Factor {letter}</span>
                <button type="button" class="btn ghost" aria-label={`Remove factor ${letter}`} onClick={() => model.removeFactor(i)}>
                  Remove
                </button>
              </div>
              <TextField id={`ns-f${f.key}-name`} label={`Factor ${letter} name`} value={f.name} onInput={(v) => model.setFactor(i, { name: v })} />
              <ChoiceButtons label={`Factor ${letter} levels are`} options={KIND_CHOICES} value={f.kind} onChoose={(kind) => model.setFactor(i, { kind })} />
              {f.kind === 'numeric' ? (
                <>
                  <div class="pair">
                    <TextField id={`ns-f${f.key}-low`} label={`Factor ${letter} low`} numeric signed value={f.low} onInput={(v) => model.setFactor(i, { low: v })} invalid={show} />
                    <TextField id={`ns-f${f.key}-high`} label={`Factor ${letter} high`} numeric signed value={f.high} onInput={(v) => model.setFactor(i, { high: v })} invalid={show} />
                  </div>
                  {rowMessage}
                  <TextField id={`ns-f${f.key}-unit`} label={`Factor ${letter} unit`} value={f.unit} placeholder="e.g. °C" onInput={(v) => model.setFactor(i, { unit: v })} />
                </>
              ) : (
                <div class="pair">
                  <TextField id={`ns-f${f.key}-a`} label={`Factor ${letter} level 1`} value={f.levelA} onInput={(v) => model.setFactor(i, { levelA: v })} invalid={show} />
                  <TextField id={`ns-f${f.key}-b`} label={`Factor ${letter} level 2`} value={f.levelB} onInput={(v) => model.setFactor(i, { levelB: v })} invalid={show} />
                </div>
              )}
              {f.kind === 'categorical' && rowMessage}
            </div>
          );
        })}
        <button type="button" class="btn block" disabled={factors.length >= FORM_MAX_FACTORS} onClick={() => model.addFactor()}>
          + Add a factor
        </button>
      </fieldset>

      <fieldset class="group">
        <legend>Responses</legend>
        <p class="quiet">What you will measure at each run.</p>
        {model.responses.value.map((r: ResponseDraft, i) => (
          <div class="plan-card" key={r.key}>
            <div class="plan-card-head">
              <span class="plan-card-title">Response {i + 1}</span>
              <button type="button" class="btn ghost" aria-label={`Remove response ${i + 1}`} onClick={() => model.removeResponse(i)}>
                Remove
              </button>
            </div>
            <TextField id={`ns-r${r.key}-name`} label={`Response ${i + 1} name`} value={r.name} onInput={(v) => model.setResponse(i, { name: v })} />
            <TextField id={`ns-r${r.key}-unit`} label={`Response ${i + 1} unit`} value={r.unit} onInput={(v) => model.setResponse(i, { unit: v })} />
            <ChoiceButtons label={`Response ${i + 1} goal`} options={GOAL_CHOICES} value={r.goal} onChoose={(goal) => model.setResponse(i, { goal })} />
            {r.goal === 'target' && <TextField id={`ns-r${r.key}-target`} label={`Response ${i + 1} target`} numeric signed value={r.target} onInput={(v) => model.setResponse(i, { target: v })} />}
            <ChoiceButtons label={`Response ${i + 1} lowest value it can take`} options={FLOOR_CHOICES} value={r.floor} onChoose={(floor) => model.setResponse(i, { floor })} />
            {r.floor === 'other' && (
              <TextField id={`ns-r${r.key}-floor`} label={`Response ${i + 1} lowest value`} numeric signed value={r.lowerBound} onInput={(v) => model.setResponse(i, { lowerBound: v })} />
            )}
          </div>
        ))}
        <button type="button" class="btn block" onClick={() => model.addResponse()}>
          + Add a response
        </button>
        {model.tried.value && model.responseProblem.value && (
          <p class="field-error" role="alert">
            {model.responseProblem.value}
          </p>
        )}
      </fieldset>

      <fieldset class="group">
        <legend>Design</legend>
        <ChoiceButtons label="Kind of design" options={FAMILY_CHOICES} value={family} onChoose={(v) => model.chooseFamily(v)} />
        {categorical.length > 0 && <p class="field-error" role="alert">{secondOrderNeedsNumeric(categorical)}</p>}
        {family === 'two-level' ? (
          <>
        <ChoiceButtons label="Runs of the factorial" options={model.options.value.map((o) => ({ value: o.value, label: o.label }))} value={model.fraction.value} onChoose={(v) => model.chooseFraction(v)} />
        {factors.length >= 2 && factors.length < 4 && <p class="quiet field-hint">Fractions from the catalog start at 8 runs, so they need 4 factors or more.</p>}
        {!model.fractionOffered.value && <p class="field-error">{notOfferedText(choiceName(model.fraction.value), factors.length)}</p>}
        {model.catalogGenerators.value !== null && model.fractionOffered.value && (
          <div class="field">
            <label for="ns-generators" class="field-name">
              Generators (optional)
            </label>
            <p class="quiet field-hint" id="ns-generators-hint">
              {catalogGeneratorsHint(model.catalogGenerators.value)}
            </p>
            <input
              id="ns-generators"
              class="text"
              type="text"
              autocomplete="off"
              autocapitalize="characters"
              spellcheck={false}
              placeholder={model.catalogGenerators.value.map(spaced).join(', ')}
              value={model.generatorsText.value}
              aria-describedby={model.generatorsProblem.value ? 'ns-generators-hint ns-generators-error' : 'ns-generators-hint'}
              aria-invalid={model.generatorsProblem.value ? true : undefined}
              onInput={(e) => model.setGeneratorsText(valueOf(e))}
            />
            {model.generatorsProblem.value && (
              <p class="field-error" role="alert" id="ns-generators-error">
                {model.generatorsProblem.value}
              </p>
            )}
          </div>
        )}
        <CountStepper id="ns-center" label="Center runs" hint="Per replicate; numeric factors at the middle of their ranges." value={model.centerRuns.value} min={0} onChange={(v) => model.setCenterRuns(v)} />
        <CountStepper id="ns-replicates" label="Replicates" hint="Times the whole design is run." value={model.replicates.value} min={1} onChange={(v) => model.setReplicates(v)} />
        <div class="choice-compact">
          <ChoiceButtons label="Blocks per replicate" options={BLOCK_CHOICES.map((n) => ({ value: n, label: String(n) }))} value={model.blocks.value} onChoose={(n) => model.chooseBlocks(n)} />
        </div>
          </>
        ) : (
          <SecondOrderFields
            family={family}
            axial={model.axial.value}
            axialText={model.axialText.value}
            blocks={model.soBlocks.value}
            centerRuns={model.soCenterRuns.value}
            onAxial={(v) => model.chooseAxial(v)}
            onAxialText={(v) => model.setAxialText(v)}
            onBlocks={(n) => model.chooseSecondOrderBlocks(n)}
            onCenterRuns={(v) => model.setSecondOrderCenterRuns(v)}
          />
        )}
        {family === 'two-level' && (
          <>
            <div class="hard-choice">
            <ChoiceButtons
              label="Hard-to-change factor"
              options={[{ value: 0, label: 'None' }, ...factors.map((f, i) => ({ value: f.key, label: f.name.trim() ? `${letters[i]} · ${f.name.trim()}` : letters[i] }))]}
              value={model.hardIndex.value === null ? 0 : model.hardFactor.value ?? 0}
              onChoose={(key) => model.chooseHardFactor(key === 0 ? null : key)}
            />
            </div>
            <p class={model.hardChanges.value ? 'hard-factor-cost marked' : 'quiet field-hint hard-factor-cost'} role="status">
              {model.hardChanges.value
                ? hardToChangeText(model.hardChanges.value.label, model.hardChanges.value.changes, model.hardChanges.value.unsorted, model.hardChanges.value.seed)
                : model.hardIndex.value === null
                  ? NO_HARD_FACTOR_TEXT
                  : ''}
            </p>
          </>
        )}
        <ChoiceButtons label="Run order" options={ORDER_CHOICES} value={model.randomize.value ? 'random' : 'standard'} onChoose={(v) => model.setRandomize(v === 'random')} />
        {model.randomize.value && (
          <div class="field">
            <label for="ns-seed" class="field-name">
              Seed of the run order
            </label>
            <p class="quiet field-hint">
              {model.seedDrawn.value ? `Blank: seed ${model.seed.value} was drawn and will be recorded.` : 'The same seed gives the same run order on any device.'}
            </p>
            <div class="stepper">
              <input
                id="ns-seed"
                class="num"
                type="text"
                inputMode="numeric"
                autocomplete="off"
                placeholder={String(model.seed.value)}
                value={model.seedText.value}
                onInput={(e) => model.setSeedText(valueOf(e))}
              />
              <button type="button" class="btn" onClick={() => model.redrawSeed()}>
                New seed
              </button>
            </div>
          </div>
        )}
      </fieldset>

      {family === 'two-level' && (
      <fieldset class="group plan-power-group">
        <legend>Will the plan find the effect?</legend>
        <p class="quiet">The power of the plan: how often its runs show an effect of the size that matters, given the run-to-run noise.</p>
        <div class="pair">
          <TextField id="ns-effect" label="Effect that matters" numeric value={model.effectText.value} onInput={(v) => model.setEffectText(v)} invalid={power.state === 'error' && /effect/i.test(power.message)} />
          <TextField id="ns-sigma" label="Run-to-run noise (SD)" numeric value={model.sigmaText.value} onInput={(v) => model.setSigmaText(v)} invalid={power.state === 'error' && /sigma/i.test(power.message)} />
        </div>
        <p class="quiet field-hint">The effect: the change from low to high, in the response's units. The noise: the standard deviation of repeated runs at one setting.</p>
        {model.noiseChoices.value.length > 0 && (
          <div class="noise-sources">
            <p class="field-name" id="ns-noise-from">Take the noise from an earlier study</p>
            <ul class="noise-list" aria-labelledby="ns-noise-from">
              {model.noiseChoices.value.map((s) => {
                const chosen = model.sigmaFrom.value?.studyId === s.studyId && model.sigmaFrom.value.response === s.response;
                return (
                  <li key={`${s.studyId}/${s.response}`}>
                    <button type="button" class="btn" aria-pressed={chosen} onClick={() => model.takeNoiseFrom(s)}>
                      {s.title} · {s.response}: {Number(s.sigma.toPrecision(3))} ({s.df} df)
                    </button>
                  </li>
                );
              })}
            </ul>
          </div>
        )}
        <p class={`plan-power plan-power-${power.state}`} role="status">
          {power.state === 'ready' ? power.words : power.message}
        </p>
      </fieldset>
      )}

      <section class="plan-preview" aria-label="Preview of the plan" aria-live="polite">
        <h3>Preview</h3>
        {design ? (
          <>
            <p class="plan-runs">{design.runs.length} runs</p>
            <p class="plan-summary">{design.summary}</p>
            {preview.secondOrder ? (
              <SecondOrderFacts facts={preview.secondOrder} />
            ) : (
            <dl class="plan-facts">
              <div>
                <dt>Resolution</dt>
                <dd class="plan-resolution">{design.screening ? 'Screening design: no defining relation, main effects partly mixed with interactions' : design.resolution === null ? 'Full factorial (no aliases)' : romanResolution(design.resolution)}</dd>
              </div>
              {design.definingRelation.length > 0 && (
                <div>
                  <dt>Defining relation</dt>
                  <dd class="plan-relation">I = {design.definingRelation.join(' = ')}</dd>
                </div>
              )}
              {design.generators.length > 0 && (
                <div>
                  <dt>Generators</dt>
                  <dd>{design.generators.map(spaced).join(', ')}</dd>
                </div>
              )}
              {design.aliases.some((c) => c.length > 1) && !design.screening && (
                <div>
                  <dt>Aliases</dt>
                  <dd class="plan-aliases">
                    {aliasListText(design.aliases, ALIASES_SHOWN).map((line) => (
                      <span key={line}>{line}</span>
                    ))}
                  </dd>
                </div>
              )}
              {design.blockWords.length > 0 && (
                <div>
                  <dt>Confounded with blocks</dt>
                  <dd>{design.blockWords.join(', ')}</dd>
                </div>
              )}
              <div>
                <dt>Run order</dt>
                <dd>{design.seed === null ? 'Standard order' : `Randomized, seed ${design.seed}`}</dd>
              </div>
            </dl>
            )}
            {design.notes.length > 0 && (
              <ul class="warnings plan-notes">
                {/* A second-order plan's axial warnings and caution show with its facts above. */}
                {design.notes.filter((_, i) => !preview.secondOrder || !SHOWN_WITH_FACTS.has(design.noteFacts[i]?.kind)).map((n) => (
                  <li key={n}>{n}</li>
                ))}
              </ul>
            )}
          </>
        ) : (
          <p class="plan-not-ready">Not ready yet: {preview.error}</p>
        )}
      </section>

      <div ref={problemRef}>{problem && <ProblemBox problem={problem} />}</div>
      <div class="plan-bar">
        <p class="plan-bar-state" aria-hidden="true">
          {design ? (
            <>
              <span class="plan-bar-runs">{design.runs.length} runs</span>
              <span class="plan-bar-res">{family !== 'two-level' ? family : design.screening ? 'screening' : design.resolution === null ? 'full factorial' : `resolution ${romanResolution(design.resolution)}`}</span>
            </>
          ) : (
            'Not ready yet'
          )}
        </p>
        <button type="button" class="btn primary big" disabled={model.creating.value} onClick={() => void create()}>
          {model.creating.value ? 'Creating…' : 'Create study'}
        </button>
      </div>
    </section>
  );
}
