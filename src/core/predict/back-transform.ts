/**
 * A prediction made on a transformed scale, brought back to the response's own units: with the
 * fit on z = (y'^lambda - 1) / lambda, y' = y - L (fit/response-transform.ts), each of fit and
 * interval ends is y = L + (1 + lambda z)^(1/lambda) (L + exp z at lambda 0). The transform is
 * monotone increasing, so interval ends map to interval ends; the back-transformed fit estimates
 * the median of the response, not its mean (Box and Cox 1964, JRSS B 26, 211-252; common
 * practice). An end beyond the transform's domain (1 + lambda z <= 0) is clipped to the bound for
 * a positive power and has no finite value (Infinity, null in JSON) for a negative one; both are
 * said. Without a transform, a fit or interval below the response's lower bound is warned of,
 * with the Box-Cox suggestion when there is one.
 * Cost O(1). Example: log scale, L = 0, fit 0 with ci [-1, 1] -> fit 1, ci [0.368, 2.718].
 */
import type { FittedModel } from '../fit/analysis.ts';
import { backTransform } from '../fit/response-transform.ts';

type Interval = readonly [number, number] | null;

export interface ScaleResult {
  readonly fit: number;
  readonly ci: Interval;
  readonly pi: Interval;
  /** The figures on the transformed scale, when there is a transform. */
  readonly transformed: { readonly fit: number; readonly se: number | null; readonly ci: Interval; readonly pi: Interval } | null;
  readonly messages: readonly string[];
}

export function onResponseScale(model: FittedModel, z: { fit: number; se: number | null; ci: Interval; pi: Interval }): ScaleResult {
  const t = model.transform;
  const bound = t?.lowerBound ?? null;
  if (!t || t.lambda === 1) {
    const messages: string[] = [];
    const lows = [z.fit, z.ci?.[0], z.pi?.[0]].filter((v): v is number => v !== undefined);
    if (bound !== null && lows.some((v) => v < bound)) {
      const what = z.fit < bound ? 'The prediction' : 'The lower end of an interval';
      const hint = t?.suggestion && t.suggestion !== 'none' ? ` a ${t.suggestion} transform (the Box-Cox suggestion)` : ' a log or square-root transform';
      messages.push(`${what} goes below ${bound}, a value ${model.response} cannot go below: the straight-line model does not know the bound. Refit with${hint} to keep predictions inside it.`);
    }
    return { fit: z.fit, ci: z.ci, pi: z.pi, transformed: null, messages };
  }
  const L = bound ?? 0;
  let clipped = false;
  let open = false;
  const back = (v: number): number => {
    const b = backTransform(v, t.lambda);
    if (b === null) {
      open = true;
      return Infinity;
    }
    if (b === 0 && t.lambda > 0) clipped = true;
    return L + b;
  };
  const interval = (iv: Interval): Interval => (iv ? [back(iv[0]), back(iv[1])] : null);
  const fit = back(z.fit);
  const ci = interval(z.ci);
  const pi = interval(z.pi);
  const messages = [`Fitted on the ${t.token} scale of ${model.response}${bound !== null && bound !== 0 ? ` minus its bound ${bound}` : ''} and brought back to its units: the fit estimates the median, not the mean, and the intervals are not symmetric.`];
  if (clipped) messages.push(`An interval end lies beyond what the ${t.token} transform can give: it is clipped to ${L}, the lowest value ${model.response} can take.`);
  if (open) messages.push(`An interval end lies beyond what the ${t.token} transform can give: it has no finite value (shown as no upper limit).`);
  return { fit, ci, pi, transformed: { fit: z.fit, se: z.se, ci: z.ci, pi: z.pi }, messages };
}
