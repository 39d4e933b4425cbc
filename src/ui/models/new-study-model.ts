/**
 * Planning a new study on the phone: title and purpose, factors, responses and the design
 * (full factorial or a catalogue fraction, center runs, replicates, blocks, run order and seed).
 * The plan is built by the core's buildDesign on every change, so the preview shows exactly what
 * "Create study" will store. A wrong entry gets a message and nothing is created.
 */
import { computed, createModel, signal, type ReadonlySignal } from '@preact/signals';
import { buildDesign, type DesignSpec } from '../../core/design/build-design.ts';
import { catalogueFraction } from '../../core/design/catalogue.ts';
import { romanResolution } from '../../core/design/defining-relation.ts';
import type { Design } from '../../core/design/design.ts';
import { drawSeed } from '../../core/design/random.ts';
import { InputError } from '../../core/errors.ts';
import { parseNumber } from '../../core/factor/coding.ts';
import { defineFactors, type FactorSpec } from '../../core/factor/factor.ts';
import type { Response } from '../../core/study/response.ts';
import { studyPlan, type StudyRecord } from '../../core/study/study.ts';
import type { Store } from '../../store/store.ts';
import { createStudy } from '../../store/studies.ts';
import { problemOf, type Problem } from '../lib/problem.ts';

export interface FactorDraft {
  readonly key: number;
  readonly kind: 'numeric' | 'categorical';
  readonly name: string;
  readonly unit: string;
  readonly low: string;
  readonly high: string;
  /** The two named levels of a categorical factor (the first is coded -1). */
  readonly levelA: string;
  readonly levelB: string;
}

export interface ResponseDraft {
  readonly key: number;
  readonly name: string;
  readonly unit: string;
  readonly goal: Response['goal'];
  readonly target: string;
}

/** 'full' or a catalogue fraction such as '1/2'. */
export type FractionChoice = string;

export interface FractionOption {
  readonly value: FractionChoice;
  readonly runs: number;
  /** Roman numeral, or null for a full factorial. */
  readonly resolution: string | null;
  readonly label: string;
}

export const BLOCK_CHOICES = [1, 2, 4, 8] as const;

/** The most factors the form offers (the catalogue's range). */
export const MAX_FORM_FACTORS = 15;

let nextKey = 1;

function blankFactor(): FactorDraft {
  return { key: nextKey++, kind: 'numeric', name: '', unit: '', low: '', high: '', levelA: '', levelB: '' };
}

function blankResponse(): ResponseDraft {
  return { key: nextKey++, name: '', unit: '', goal: 'maximize', target: '' };
}

/** A factor row as the core's factor declaration (numbers read with a point for decimals). */
export function factorSpecOf(f: FactorDraft): FactorSpec {
  if (f.kind === 'categorical') return { kind: 'categorical', name: f.name, levels: [f.levelA, f.levelB] };
  const unit = f.unit.trim();
  return { kind: 'numeric', name: f.name, low: parseNumber(f.low), high: parseNumber(f.high), ...(unit ? { unit } : {}) };
}

/** The message for one factor row on its own, or null when it is complete and valid. */
export function factorMessage(f: FactorDraft, i: number): string | null {
  const label = f.name.trim() || `Factor ${i + 1}`;
  if (f.kind === 'numeric') {
    for (const [text, which] of [[f.low, 'low'], [f.high, 'high']] as const) {
      if (text.trim() === '') return `${label} needs a ${which} setting`;
      if (!Number.isFinite(parseNumber(text))) return `${label}: the ${which} setting must be a number (use a point for decimals), got "${text.trim()}"`;
    }
  }
  try {
    defineFactors([factorSpecOf(f)]);
    return null;
  } catch (err) {
    if (err instanceof InputError) return err.message.replace(/^Factor 1 /, `Factor ${i + 1} `);
    throw err;
  }
}

/** The responses as the study keeps them; throws InputError with a clear message. */
export function responsesOf(drafts: readonly ResponseDraft[]): Response[] {
  if (drafts.length === 0) throw new InputError('A study needs at least one response (what you will measure), got none');
  const seen = new Map<string, number>();
  return drafts.map((r, i) => {
    const name = r.name.trim();
    if (name === '') throw new InputError(`Response ${i + 1} needs a name (what you will measure)`);
    const k = name.toLowerCase();
    if (seen.has(k)) throw new InputError(`Response names must differ, got "${name}" twice (responses ${seen.get(k)! + 1} and ${i + 1})`);
    seen.set(k, i);
    const unit = r.unit.trim();
    const out: Response = { name, goal: r.goal, ...(unit ? { unit } : {}) };
    if (r.goal !== 'target') return out;
    const t = parseNumber(r.target);
    if (r.target.trim() === '') throw new InputError(`${name}: the goal is a target, so it needs a target value`);
    if (!Number.isFinite(t)) throw new InputError(`${name}: the target must be a number (use a point for decimals), got "${r.target.trim()}"`);
    return { ...out, target: t };
  });
}

/** A count typed in a box: a whole number, or InputError saying what is needed. */
function wholeCount(text: string, what: string, min: number): number {
  const s = text.trim();
  if (!/^\d+$/.test(s) || Number(s) < min) throw new InputError(`${what} must be a whole number, ${min} or more, got "${s}"`);
  return Number(s);
}

/** What the form offers for k factors: the full factorial and each catalogue fraction, with runs and resolution. */
export function fractionOptions(k: number): FractionOption[] {
  const options: FractionOption[] = [{ value: 'full', runs: 2 ** k, resolution: null, label: `Full factorial · ${2 ** k} runs` }];
  if (k < 2) return options;
  const stand = Array.from({ length: k }, (_, i): FactorSpec => ({ kind: 'numeric', name: `x${i + 1}`, low: 0, high: 1 }));
  for (let p = 1; p < k; p++) {
    try {
      const entry = catalogueFraction(k, p);
      const d = buildDesign({ factors: stand, fraction: `1/${2 ** p}`, randomise: false });
      const res = d.resolution === null ? null : romanResolution(d.resolution);
      options.push({ value: `1/${2 ** p}`, runs: entry.runs, resolution: res, label: `1/${2 ** p} · ${entry.runs} runs${res ? ` · resolution ${res}` : ''}` });
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
    }
  }
  return options;
}

export type Preview = { readonly design: Design; readonly error: null } | { readonly design: null; readonly error: string };

export const NewStudyModel = createModel((store: Store) => {
  const title = signal('');
  const purpose = signal('');
  const factors = signal<FactorDraft[]>([blankFactor(), blankFactor()]);
  const responses = signal<ResponseDraft[]>([blankResponse()]);
  const fraction = signal<FractionChoice>('full');
  const centerRuns = signal('0');
  const replicates = signal('1');
  const blocks = signal<number>(1);
  const randomise = signal(true);
  const seedText = signal('');
  /** Drawn once for a blank seed box, so the preview and the created study share one run order. */
  const drawnSeed = signal(drawSeed());
  const problem = signal<Problem | null>(null);
  const creating = signal(false);
  /** Set after a "Create study" with something wrong, so every row shows its message. */
  const tried = signal(false);

  const options = computed(() => fractionOptions(factors.value.length));

  /** The seed the plan uses: the typed one, else the drawn one; null in standard order. */
  const seed = computed<number | null>(() => {
    if (!randomise.value) return null;
    const s = seedText.value.trim();
    if (s === '') return drawnSeed.value;
    return /^\d+$/.test(s) && Number.isSafeInteger(Number(s)) ? Number(s) : Number.NaN;
  });

  const factorMessages = computed(() => factors.value.map((f, i) => factorMessage(f, i)));

  /** The design spec, or InputError for what cannot be read. */
  function spec(): DesignSpec {
    const rows = factors.value;
    rows.forEach((f, i) => {
      const m = factorMessages.value[i];
      if (m) throw new InputError(m);
    });
    const s = seed.value;
    if (s !== null && !Number.isFinite(s)) throw new InputError(`The seed must be a whole number, or left blank to draw one; got "${seedText.value.trim()}"`);
    return {
      factors: rows.map(factorSpecOf),
      ...(fraction.value === 'full' ? {} : { fraction: fraction.value }),
      centerRuns: wholeCount(centerRuns.value, 'Center runs', 0),
      replicates: wholeCount(replicates.value, 'Replicates', 1),
      blocks: blocks.value,
      randomise: randomise.value,
      ...(s !== null ? { seed: s } : {}),
    };
  }

  const preview = computed<Preview>(() => {
    try {
      return { design: buildDesign(spec()), error: null };
    } catch (err) {
      if (err instanceof InputError) return { design: null, error: err.message };
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
    randomise: randomise as ReadonlySignal<boolean>,
    seedText: seedText as ReadonlySignal<string>,
    problem: problem as ReadonlySignal<Problem | null>,
    creating: creating as ReadonlySignal<boolean>,
    tried: tried as ReadonlySignal<boolean>,
    options,
    seed,
    /** True when the seed in use was drawn here (the box is blank). */
    seedDrawn: computed(() => randomise.value && seedText.value.trim() === ''),
    factorMessages,
    responseProblem,
    preview,
    /** True when the chosen fraction is one the catalogue offers for this many factors. */
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
      if (factors.peek().length >= MAX_FORM_FACTORS) return;
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
    setRandomise(on: boolean) {
      randomise.value = on;
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
        if (name === '') throw new InputError('Give the study a title, so it can be found in the list of studies');
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
