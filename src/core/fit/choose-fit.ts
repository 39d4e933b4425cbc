/**
 * The fit step of the analysis: the model's columns (intercept, block contrasts, terms in model
 * order) and the least-squares fit by the right path. Yates' algorithm when the runs are a
 * complete, balanced factorial at exactly +-1 with no blocks (see fit-yates.ts), Householder QR
 * otherwise (fit-qr.ts); both give one LinearFit. Blocks count only when there are two or more.
 * Terms are de-duplicated and sorted into model order (model/term.ts compareTerms); the default
 * is main effects and two-factor interactions (model/formula.ts defaultTerms).
 * The nominal plan decides what can be estimated (nominal-settings.ts): when actual settings
 * are off their nominal levels, the rank and the alias chains come from a fit on the nominal
 * settings; each chain is estimated through its first term in model order, and the kept
 * columns are then fitted on the ACTUAL settings, so an off-target setting adjusts the
 * estimates but never makes separable what the plan confounds (common practice). When the
 * nominal runs are a full factorial less a few, the plan's rank and chains come from
 * walsh-plan.ts (the same columns, no nominal factorisation).
 * Cost: O(k 2^k + n) on the Yates path, O(n p^2) on the QR path; the response-free part of the
 * QR fit is kept by the runs' settings (fit-qr.ts fitQrOnSettings), so the same runs again cost O(n p).
 * Throws InputError for a term that names a factor the study does not have.
 * Example: chooseFit(the 2^2 yield data of Montgomery 8th ed. section 6.2, {}) -> method 'yates', terms [A, B, AB].
 */
import { defaultTerms } from '../model/formula.ts';
import { checkTerms, isSquare, modelOrder, type Term } from '../model/term.ts';
import type { ResponseData } from '../study/response-data.ts';
import { blockLevels, modelColumns, modelMatrix, type Column } from './columns.ts';
import { fitOnPlan } from './fit-on-plan.ts';
import { fitQrOnSettings } from './fit-qr.ts';
import { fitYates, yatesCells } from './fit-yates.ts';
import type { LinearFit } from './linear-fit.ts';
import { exactNominal, nominalSettings, type NominalSettings } from './nominal-settings.ts';
import { walshPlan } from './walsh-plan.ts';

export interface FitChoice {
  /** Model terms in model order. */
  readonly terms: readonly Term[];
  /** Distinct block labels in ascending order when there are two or more blocks, else empty. */
  readonly blockLevels: readonly number[];
  /** Block of each run when there are two or more blocks, else null. */
  readonly blocks: readonly number[] | null;
  /** Yates cell of each run (-1 for a center run) on the Yates path, else null. */
  readonly cells: Int32Array | null;
  readonly fit: LinearFit;
  /** The nominal plan of the runs (nominal-settings.ts). */
  readonly nominal: NominalSettings;
}

export function chooseFit(data: ResponseData, options: { readonly terms?: readonly Term[]; readonly forceQr?: boolean } = {}): FitChoice {
  const k = data.factors.length;
  const terms = modelOrder(options.terms ?? defaultTerms(k));
  checkTerms(terms, data.factors);
  const levels = blockLevels(data.blocks);
  const blocks = levels.length > 1 ? data.blocks : null;
  const columns = modelColumns(blocks ? levels : [], terms);
  // Yates' algorithm holds for products of two-level columns only: any square takes the QR path.
  const cells = !blocks && !options.forceQr && !terms.some(isSquare) ? yatesCells(data.coded, k) : null;
  // Yates' cells hold only settings exactly at -1, 0 or +1: without a plan they are the nominal ones.
  const nominal = cells && !data.planned ? exactNominal(data.coded) : nominalSettings(data.coded, data.planned);
  const fit = cells
    ? fitYates(columns, terms, cells, k, data.y)
    : nominal.exact
      ? fitQrOnSettings(columns, data.coded, blocks, data.y)
      : fitOnNominal(columns, nominal.nominal, data, blocks, k);
  return { terms, blockLevels: blocks ? levels : [], blocks, cells, fit, nominal };
}

/** The fit on the actual settings with what the nominal plan can estimate: from walsh-plan.ts when it applies, else from a nominal factorisation (fit-on-plan.ts). */
function fitOnNominal(columns: readonly Column[], nominal: readonly (readonly number[])[], data: ResponseData, blocks: readonly number[] | null, k: number): LinearFit {
  const plan = blocks ? null : walshPlan(columns, nominal, k);
  // The actual fit is found by its settings (fit-qr.ts fitQrOnSettings), its matrix built only when new.
  const actual = { coded: data.coded, blocks };
  return plan ? fitOnPlan(columns, new Float64Array(0), actual, data.y, plan) : fitOnPlan(columns, modelMatrix(columns, nominal, blocks), actual, data.y);
}
