/**
 * The second-order part of a response's analysis for the Effects screen: the canonical analysis
 * and the best setting inside the tested box for the response's goal (core/optimum), worked out
 * from the shared analysis when its model is second order, else the reason there is none.
 */
import type { Goal } from '../../core/optimum/box-optimum.ts';
import { isSecondOrderModel, secondOrderAnalysis, type SecondOrderAnalysis } from '../../core/optimum/second-order-analysis.ts';
import type { Response } from '../../core/study/response.ts';
import { secondOrderNotAvailable } from '../../core/text/second-order-text.ts';
import { problemOf } from '../lib/problem.ts';
import type { AnalysisResult } from './study-analysis-model.ts';

/** The optimum's goal from the response's goal as the study records it. */
export function goalOf(response: Response): Goal {
  if (response.goal === 'minimize') return { kind: 'min' };
  if (response.goal === 'target' && response.target !== undefined) return { kind: 'target', target: response.target };
  return { kind: 'max' };
}

export type SecondOrderView = { readonly ok: true; readonly so: SecondOrderAnalysis } | { readonly ok: false; readonly message: string };

/** The second-order analysis of a result, or why there is none (not a quadratic model, or the core's message). */
export function secondOrderView(result: AnalysisResult, response: Response): SecondOrderView {
  if (!result.ok) return { ok: false, message: result.message };
  const model = result.analysis.model;
  if (!isSecondOrderModel(model)) return { ok: false, message: secondOrderNotAvailable() };
  try {
    return { ok: true, so: secondOrderAnalysis(model, result.data.coded, goalOf(response)) };
  } catch (err) {
    return { ok: false, message: problemOf(err).message };
  }
}
