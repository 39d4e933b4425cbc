/**
 * Planning a new study on the phone: title and purpose, factors, responses and the design
 * (full factorial or a catalog fraction, center runs, replicates, blocks, run order and seed).
 * The plan is built by the core's buildDesign on every change, so the preview shows exactly what
 * "Create study" will store. A wrong entry gets a message and nothing is created.
 */
import { factorRowProblem, factorRowSpec, sameNames, swapLowHigh, type FactorRow, type FactorRowProblem } from '../../core/factor/factor-row-problem.ts';
import { factorLetters } from '../../core/factor/letters.ts';
import { catalogFraction } from '../../core/design/catalog.ts';
import { parseFraction } from '../../core/design/fractional.ts';
import { readTypedGenerators } from '../../core/design/typed-generators.ts';
import { settingChanges } from '../../core/design/setting-changes.ts';
import { countText, factorCalled, factorRowText, NO_RESPONSE_TEXT, NO_TITLE_TEXT, responseLowestMissingText, responseNameText, responseNumberText, sameResponseNamesText, sameFactorNamesText, seedText as seedProblemText, tooFewFactorsText } from '../../core/text/plan-form-text.ts';
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import { buildDesign, type DesignSpec } from '../../core/design/build-design.ts';
import { catalogChoices, plackettBurmanChoices } from '../../core/design/catalog-choices.ts';
import { planPower, type PlanPower } from '../../core/plan/power.ts';
import { powerInWords } from '../../core/plan/power-words.ts';
import { noiseSources, type NoiseSource } from './noise-sources.ts';
import { romanResolution } from '../../core/design/defining-relation.ts';
import { MAX_DESIGN_FACTORS } from '../../core/design/max-design-factors.ts';
import type { Design } from '../../core/design/design.ts';
import { drawSeed } from '../../core/design/random.ts';
import { InputError } from '../../core/errors.ts';
import { parseTypedNumber, readNumber } from '../../core/factor/read-setting.ts';
import { defineFactors, type FactorSpec } from '../../core/factor/factor.ts';
import { defineResponses } from '../../core/study/define-responses.ts';
import type { Response } from '../../core/study/response.ts';
import { studyPlan, type StudyRecord } from '../../core/study/study.ts';
import type { Store } from '../../store/store.ts';
import { createStudy } from '../../store/studies.ts';
import { problemOf, type Problem } from '../lib/problem.ts';
import type { SecondOrderProperties } from '../../core/design/second-order-plan.ts';
import { defaultCenterRuns, secondOrderPlanOf, type AxialChoice, type DesignFamily } from './second-order-choice.ts';

/** A factor row of the form as typed (core/factor/factor-row-problem.ts), with its list key. */
export interface FactorDraft extends FactorRow {
  readonly key: number;
}

export interface ResponseDraft {
  readonly key: number;
  readonly name: string;
  readonly unit: string;
  readonly goal: Response['goal'];
  readonly target: string;
  /** The lowest value it can take: none, 0 (cannot be negative), or the typed `lowerBound`. */
  readonly floor: 'none' | 'zero' | 'other';
  readonly lowerBound: string;
}

/** 'full', a catalog fraction such as '1/2', or a Plackett-Burman design such as 'pb-12'. */
export type FractionChoice = string;

/** The most factors the form takes: 23, the most a Plackett-Burman design holds (24 runs); full factorials and fractions stop at MAX_DESIGN_FACTORS. */
export const FORM_MAX_FACTORS = 23;

/** A design choice in words for a message: "the full factorial", "the 1/2 fraction", "the 12-run Plackett-Burman design". */
export function choiceName(choice: FractionChoice): string {
  const pb = plackettBurmanRunsOf(choice);
  if (pb !== null) return `the ${pb}-run Plackett-Burman design`;
  return choice === 'full' ? 'the full factorial' : `the ${choice} fraction`;
}

/** The run count of a Plackett-Burman choice ('pb-12' -> 12), or null for a factorial choice. */
export function plackettBurmanRunsOf(choice: FractionChoice): number | null {
  const m = /^pb-(\d+)$/.exec(choice);
  return m ? Number(m[1]) : null;
}

export interface FractionOption {
  readonly value: FractionChoice;
  readonly runs: number;
  /** Roman numeral, or null for a full factorial. */
  readonly resolution: string | null;
  readonly label: string;
}

export const BLOCK_CHOICES = [1, 2, 4, 8] as const;

let nextKey = 1;

function blankFactor(): FactorDraft {
  return { key: nextKey++, kind: 'numeric', name: '', unit: '', low: '', high: '', levelA: '', levelB: '' };
}

function blankResponse(): ResponseDraft {
  return { key: nextKey++, name: '', unit: '', goal: 'maximize', target: '', floor: 'none', lowerBound: '' };
}

/** A factor row as the core's factor declaration; throws InputError for a low or high that is not a number. */
export function factorSpecOf(f: FactorDraft): FactorSpec {
  return factorRowSpec(f);
}

/** The message for row `i` on its own, naming the factor by its letter and name as its fields do, or null when it is complete and valid. */
export function factorMessage(f: FactorDraft, i: number): string | null {
  const p = factorRowProblem(f);
  return p === null ? null : factorRowText(p, factorLetters(i + 1)[i], f.name);
}

/** The responses as the study keeps them (the core's rules, defineResponses); throws InputError with a clear message. */
export function responsesOf(drafts: readonly ResponseDraft[]): Response[] {
  // What a person can get wrong on the form, in plain words before the core's own checks.
  if (drafts.length === 0) throw new InputError(NO_RESPONSE_TEXT);
  drafts.forEach((r, i) => {
    if (r.name.trim() === '') throw new InputError(responseNameText(i + 1));
  });
  const twins = sameNames(drafts.map((r) => r.name));
  if (twins) throw new InputError(sameResponseNamesText(twins[0] + 1, twins[1] + 1, drafts[twins[1]].name));
  for (const r of drafts) {
    if (r.goal === 'target' && r.target.trim() !== '' && !Number.isFinite(parseTypedNumber(r.target))) throw new InputError(responseNumberText(r.name, 'target', r.target));
    if (r.floor === 'other' && r.lowerBound.trim() !== '' && !Number.isFinite(parseTypedNumber(r.lowerBound))) throw new InputError(responseNumberText(r.name, 'lowest value', r.lowerBound));
  }
  return defineResponses(
    drafts.map((r) => ({ name: r.name, unit: r.unit, goal: r.goal, target: r.target, lowerBound: r.floor === 'zero' ? 0 : r.floor === 'other' ? lowestTyped(r) : null })),
  );
}

/** The typed lowest value; an empty box under "another lowest value" is a clear message, not "no bound". */
function lowestTyped(r: ResponseDraft): string {
  if (r.lowerBound.trim() === '') throw new InputError(responseLowestMissingText(r.name));
  return r.lowerBound;
}

/** A count typed in a box: a whole number, or InputError saying what is needed. */
function wholeCount(text: string, what: string, min: number): number {
  const s = text.trim();
  if (!/^\d+$/.test(s) || Number(s) < min) throw new InputError(countText(what, min, s));
  return Number(s);
}

/**
 * What the form offers for k factors: the full factorial and each catalog fraction, with runs
 * and resolution (the core's catalogChoices, up to MAX_DESIGN_FACTORS factors), then the
 * Plackett-Burman screening designs that take k factors (plackettBurmanChoices).
 */
export function fractionOptions(k: number): FractionOption[] {
  if (k < 1) return [{ value: 'full', runs: 1, resolution: null, label: 'Full factorial · 1 runs' }];
  const factorial =
    k > MAX_DESIGN_FACTORS
      ? []
      : catalogChoices(k).map((c) => {
          const res = c.resolution === null ? null : romanResolution(c.resolution);
          const label = c.fraction === 'full' ? `Full factorial · ${c.runs} runs` : `${c.fraction} · ${c.runs} runs${res ? ` · resolution ${res}` : ''}`;
          return { value: c.fraction, runs: c.runs, resolution: res, label };
        });
  const screening = plackettBurmanChoices(k).map((c) => ({ value: `pb-${c.runs}`, runs: c.runs, resolution: null, label: `Screening · ${c.runs} runs (Plackett-Burman)` }));
  return [...factorial, ...screening];
}

/** What the power fields hold: the effect that matters and the noise, typed or from an earlier study. */
export type PowerView =
  | { readonly state: 'waiting'; readonly message: string }
  | { readonly state: 'error'; readonly message: string }
  | { readonly state: 'ready'; readonly power: PlanPower; readonly words: string };

/**
 * The power of the plan for the typed effect and noise, in plain words (the core's planPower and
 * powerInWords), or what is still missing, or the core's message for a wrong entry (an effect of
 * 0, a negative sigma), which changes nothing else on the form.
 */
export function powerView(design: Design | null, effectText: string, sigmaText: string): PowerView {
  if (!design) return { state: 'waiting', message: 'The power is shown once the plan above is ready.' };
  if (effectText.trim() === '' || sigmaText.trim() === '') {
    return { state: 'waiting', message: 'Type the smallest effect that matters and the run-to-run noise (or take the noise from an earlier study) to see whether this plan will find it.' };
  }
  try {
    const effect = readNumber(effectText, 'The effect that matters');
    const sigma = readNumber(sigmaText, 'The run-to-run noise (sigma)');
    const power = planPower(design, { effect, sigma });
    return { state: 'ready', power, words: powerInWords(power) };
  } catch (err) {
    if (err instanceof InputError) return { state: 'error', message: err.message };
    throw err;
  }
}

/** The plan as it stands; `secondOrder` holds a second-order design's properties for the comparison. */
export type Preview =
  | { readonly design: Design; readonly error: null; readonly secondOrder?: SecondOrderProperties }
  | { readonly design: null; readonly error: string };

export const NewStudyModel = createModel((store: Store) => {
  const title = signal('');
  const purpose = signal('');
  const factors = signal<FactorDraft[]>([blankFactor(), blankFactor()]);
  const responses = signal<ResponseDraft[]>([blankResponse()]);
  const fraction = signal<FractionChoice>('full');
  const centerRuns = signal('0');
  const replicates = signal('1');
  const blocks = signal<number>(1);
  const family = signal<DesignFamily>('two-level');
  const axial = signal<AxialChoice>('rotatable');
  const axialText = signal('');
  const soBlocks = signal<1 | 2>(1);
  const soCenterRuns = signal(String(defaultCenterRuns('central composite', 1, 2)));
  const randomize = signal(true);
  const seedText = signal('');
  /** Drawn once for a blank seed box, so the preview and the created study share one run order. */
  const drawnSeed = signal(drawSeed());
  const effectText = signal('');
  const sigmaText = signal('');
  /** The earlier study and response the noise was taken from, or null when it was typed. */
  const sigmaFrom = signal<NoiseSource | null>(null);
  /** Residual SDs of earlier studies on this device (read once when the form opens). */
  const sources = signal<readonly NoiseSource[]>([]);
  const problem = signal<Problem | null>(null);
  const creating = signal(false);
  /** Set after a "Create study" with something wrong, so every row shows its message. */
  const tried = signal(false);

  const options = computed(() => fractionOptions(factors.value.length));

  /** The seed the plan uses: the typed one, else the drawn one; null in standard order. */
  const seed = computed<number | null>(() => {
    if (!randomize.value) return null;
    const s = seedText.value.trim();
    if (s === '') return drawnSeed.value;
    return /^\d+$/.test(s) && Number.isSafeInteger(Number(s)) ? Number(s) : Number.NaN;
  });

  const factorProblems = computed<(FactorRowProblem | null)[]>(() => factors.value.map((f) => factorRowProblem(f)));
  const factorMessages = computed(() => {
    const letters = factorLetters(factors.value.length);
    return factors.value.map((f, i) => {
      const p = factorProblems.value[i];
      return p === null ? null : factorRowText(p, letters[i], f.name);
    });
  });
  /** Typed generators for a catalog fraction ("E = ABCD"); blank keeps the catalog's. */
  const generatorsText = signal('');
  /** The key of the factor kept sorted as hard to change, or null. */
  const hardFactor = signal<number | null>(null);
  /** The index of the hard-to-change factor among the rows, or null (also when its row was removed). */
  const hardIndex = computed(() => {
    const i = factors.value.findIndex((f) => f.key === hardFactor.value);
    return i < 0 ? null : i;
  });

  /** The factor rows as the core's declarations and the seed, or InputError for what cannot be read. */
  function factorsAndSeed(): { specs: FactorSpec[]; seed: number | null } {
    const rows = factors.value;
    if (rows.length < 2) throw new InputError(tooFewFactorsText(rows.length));
    rows.forEach((f, i) => {
      const m = factorMessages.value[i];
      if (m) throw new InputError(m);
    });
    const twins = sameNames(rows.map((f) => f.name));
    if (twins) {
      const letters = factorLetters(rows.length);
      throw new InputError(sameFactorNamesText([letters[twins[0]], letters[twins[1]]], rows[twins[1]].name));
    }
    const s = seed.value;
    if (s !== null && !Number.isFinite(s)) throw new InputError(seedProblemText(seedText.value));
    return { specs: rows.map((f) => factorSpecOf(f)), seed: s };
  }

  /** The design spec, or InputError for what cannot be read; `sorted` false leaves out the hard-to-change factor (for the comparison). */
  function spec(sorted = true): DesignSpec {
    const { specs, seed: s } = factorsAndSeed();
    const pb = plackettBurmanRunsOf(fraction.value);
    const typed = pb === null && fraction.value !== 'full' ? readTypedGenerators(generatorsText.value, defineFactors(specs), fraction.value, parseFraction(fraction.value)) : null;
    const hard = hardIndex.value;
    return {
      factors: specs,
      ...(pb !== null ? { plackettBurman: pb } : fraction.value === 'full' ? {} : typed ? { generators: typed } : { fraction: fraction.value }),
      ...(sorted && hard !== null ? { sortBy: [factorLetters(specs.length)[hard]] } : {}),
      centerRuns: wholeCount(centerRuns.value, 'Center runs', 0),
      replicates: wholeCount(replicates.value, 'Replicates', 1),
      blocks: blocks.value,
      randomize: randomize.value,
      ...(s !== null ? { seed: s } : {}),
    };
  }

  const preview = computed<Preview>(() => {
    try {
      if (family.value !== 'two-level') {
        const { specs, seed: s } = factorsAndSeed();
        const plan = secondOrderPlanOf(specs, { family: family.value, axial: axial.value, axialText: axialText.value, blocks: soBlocks.value, centerRuns: soCenterRuns.value }, randomize.value, s);
        return { design: plan.design, error: null, secondOrder: plan.properties };
      }
      return { design: buildDesign(spec()), error: null };
    } catch (err) {
      if (err instanceof InputError) return { design: null, error: err.message };
      throw err;
    }
  });

  /**
   * The hard-to-change factor's changes in the planned order, and in the order the same seed
   * gives without sorting (null in standard order, where the comparison says nothing).
   */
  const hardChanges = computed<{ readonly index: number; readonly label: string; readonly changes: number; readonly unsorted: number | null; readonly seed: number | null } | null>(() => {
    const i = hardIndex.value;
    const d = preview.value.design;
    if (i === null || d === null || family.value !== 'two-level') return null;
    let unsorted: number | null = null;
    if (d.seed !== null) {
      try {
        unsorted = settingChanges(buildDesign(spec(false)).runs, i);
      } catch (err) {
        if (!(err instanceof InputError)) throw err;
      }
    }
    return { index: i, label: factorCalled(factorLetters(i + 1)[i], factors.value[i].name), changes: settingChanges(d.runs, i), unsorted, seed: d.seed };
  });

  /** The catalog's generators for the chosen fraction (shown under a blank Generators box), or null. */
  const catalogGenerators = computed<readonly string[] | null>(() => {
    const f = fraction.value;
    if (f === 'full' || plackettBurmanRunsOf(f) !== null) return null;
    try {
      return catalogFraction(factors.value.length, parseFraction(f)).generators;
    } catch (err) {
      if (err instanceof InputError) return null;
      throw err;
    }
  });

  /** What is wrong with the typed generators, shown beside their box; null when they are blank, valid, or the factors are not ready. */
  const generatorsProblem = computed<string | null>(() => {
    const f = fraction.value;
    if (generatorsText.value.trim() === '' || f === 'full' || plackettBurmanRunsOf(f) !== null) return null;
    let specs: FactorSpec[];
    try {
      specs = factorsAndSeed().specs;
    } catch (err) {
      if (err instanceof InputError) return null;
      throw err;
    }
    try {
      readTypedGenerators(generatorsText.value, defineFactors(specs), f, parseFraction(f));
      return null;
    } catch (err) {
      if (err instanceof InputError) return err.message;
      throw err;
    }
  });

  const responseProblem = computed<string | null>(() => {
    try {
      responsesOf(responses.value);
      return null;
    } catch (err) {
      if (err instanceof InputError) return err.message;
      throw err;
    }
  });

  const responseNames = computed(() => new Set(responses.value.map((r) => r.name.trim().toLowerCase()).filter((n) => n !== '')));

  function edit() {
    if (problem.peek()?.kind === 'input') problem.value = null;
  }
  function setFactor(i: number, patch: Partial<Omit<FactorDraft, 'key'>>) {
    const next = [...factors.peek()];
    next[i] = { ...next[i], ...patch };
    factors.value = next;
    edit();
  }
  function setResponse(i: number, patch: Partial<Omit<ResponseDraft, 'key'>>) {
    const next = [...responses.peek()];
    next[i] = { ...next[i], ...patch };
    responses.value = next;
    edit();
  }

  return {
    title: title as ReadonlySignal<string>,
    purpose: purpose as ReadonlySignal<string>,
    factors: factors as ReadonlySignal<readonly FactorDraft[]>,
    responses: responses as ReadonlySignal<readonly ResponseDraft[]>,
    fraction: fraction as ReadonlySignal<FractionChoice>,
    centerRuns: centerRuns as ReadonlySignal<string>,
    replicates: replicates as ReadonlySignal<string>,
    blocks: blocks as ReadonlySignal<number>,
    family: family as ReadonlySignal<DesignFamily>,
    axial: axial as ReadonlySignal<AxialChoice>,
    axialText: axialText as ReadonlySignal<string>,
    soBlocks: soBlocks as ReadonlySignal<1 | 2>,
    soCenterRuns: soCenterRuns as ReadonlySignal<string>,
    /** Chooses the design family; the second-order center runs start at the core's default. */
    chooseFamily(v: DesignFamily) {
      if (v !== 'two-level' && v !== family.peek()) soCenterRuns.value = String(defaultCenterRuns(v, soBlocks.peek(), factors.peek().length));
      family.value = v;
      edit();
    },
    chooseAxial(v: AxialChoice) {
      axial.value = v;
      edit();
    },
    setAxialText(v: string) {
      axialText.value = v;
      edit();
    },
    chooseSecondOrderBlocks(n: 1 | 2) {
      if (n !== soBlocks.peek()) soCenterRuns.value = String(defaultCenterRuns('central composite', n, factors.peek().length));
      soBlocks.value = n;
      edit();
    },
    setSecondOrderCenterRuns(v: string) {
      soCenterRuns.value = v;
      edit();
    },
    randomize: randomize as ReadonlySignal<boolean>,
    seedText: seedText as ReadonlySignal<string>,
    problem: problem as ReadonlySignal<Problem | null>,
    creating: creating as ReadonlySignal<boolean>,
    tried: tried as ReadonlySignal<boolean>,
    options,
    seed,
    /** True when the seed in use was drawn here (the box is blank). */
    seedDrawn: computed(() => randomize.value && seedText.value.trim() === ''),
    factorMessages,
    /** Each row's typed problem (a reversed low and high offers the swap), or null. */
    factorProblems,
    /** Exchanges the low and high of row i (or its two level names); nothing else changes. */
    swapLevels(i: number) {
      const next = [...factors.peek()];
      next[i] = swapLowHigh(next[i]);
      factors.value = next;
      edit();
    },
    generatorsText: generatorsText as ReadonlySignal<string>,
    setGeneratorsText(v: string) {
      generatorsText.value = v;
      edit();
    },
    catalogGenerators,
    generatorsProblem,
    hardFactor: hardFactor as ReadonlySignal<number | null>,
    hardIndex,
    /** Marks the factor with this key as hard to change (null: none); one at most. */
    chooseHardFactor(key: number | null) {
      hardFactor.value = key;
      edit();
    },
    hardChanges,
    responseProblem,
    preview,
    effectText: effectText as ReadonlySignal<string>,
    sigmaText: sigmaText as ReadonlySignal<string>,
    sigmaFrom: sigmaFrom as ReadonlySignal<NoiseSource | null>,
    /** Earlier studies with an analysis of a response named as one of this form's responses, and its residual SD. */
    noiseChoices: computed(() => sources.value.filter((s) => responseNames.value.has(s.response.trim().toLowerCase()))),
    /** The power of the plan as it stands, in words. */
    power: computed(() => powerView(family.value === 'two-level' ? preview.value.design : null, effectText.value, sigmaText.value)),
    setEffectText(v: string) {
      effectText.value = v;
    },
    setSigmaText(v: string) {
      sigmaText.value = v;
      sigmaFrom.value = null;
    },
    /** Takes the noise from an earlier study's residual SD (its figure goes into the noise field, which stays editable). */
    takeNoiseFrom(source: NoiseSource) {
      sigmaText.value = String(Number(source.sigma.toPrecision(3)));
      sigmaFrom.value = source;
    },
    /** Reads the earlier studies' residual SDs; a study that cannot be analyzed is left out. */
    async loadNoiseSources(): Promise<void> {
      sources.value = await noiseSources(store);
    },
    /** True when the chosen fraction is one the catalog offers for this many factors. */
    fractionOffered: computed(() => options.value.some((o) => o.value === fraction.value)),

    setTitle(v: string) {
      title.value = v;
      edit();
    },
    setPurpose(v: string) {
      purpose.value = v;
      edit();
    },
    setFactor,
    addFactor() {
      if (factors.peek().length >= FORM_MAX_FACTORS) return;
      factors.value = [...factors.peek(), blankFactor()];
      edit();
    },
    removeFactor(i: number) {
      factors.value = factors.peek().filter((_, j) => j !== i);
      edit();
    },
    setResponse,
    addResponse() {
      responses.value = [...responses.peek(), blankResponse()];
      edit();
    },
    removeResponse(i: number) {
      responses.value = responses.peek().filter((_, j) => j !== i);
      edit();
    },
    chooseFraction(v: FractionChoice) {
      fraction.value = v;
      edit();
    },
    setCenterRuns(v: string) {
      centerRuns.value = v;
      edit();
    },
    setReplicates(v: string) {
      replicates.value = v;
      edit();
    },
    chooseBlocks(n: number) {
      blocks.value = n;
      edit();
    },
    setRandomize(on: boolean) {
      randomize.value = on;
      edit();
    },
    setSeedText(v: string) {
      seedText.value = v;
      edit();
    },
    /** Draws another seed for a blank seed box (another random run order). */
    redrawSeed() {
      drawnSeed.value = drawSeed();
      seedText.value = '';
      edit();
    },

    /** Checks everything and creates the study; resolves to it, or to null with a message and nothing created. */
    async create(): Promise<StudyRecord | null> {
      if (creating.peek()) return null;
      problem.value = null;
      try {
        const name = title.peek().trim();
        if (name === '') throw new InputError(NO_TITLE_TEXT);
        const p = preview.peek();
        if (p.error !== null) throw new InputError(p.error);
        const plan = studyPlan(name, purpose.peek().trim(), responsesOf(responses.peek()), p.design);
        creating.value = true;
        return await createStudy(store, plan);
      } catch (err) {
        tried.value = true;
        problem.value = problemOf(err);
        return null;
      } finally {
        creating.value = false;
      }
    },
  };
});
