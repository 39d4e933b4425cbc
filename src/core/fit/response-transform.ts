/**
 * Transforms of a response, all members of the Box-Cox power family (Box and Cox 1964, "An
 * analysis of transformations", JRSS B 26, 211-252): with y' = y - L (L the response's lower
 * bound, 0 when it has none), the fit is made on z = (y'^lambda - 1) / lambda, log y' at
 * lambda = 0. Log is lambda 0, square root 0.5, inverse -1. This form keeps the sign of every
 * effect, the meaning of maximise and minimise and the direction of the path. Back: y' =
 * (1 + lambda z)^(1/lambda) (exp z at 0), defined while 1 + lambda z > 0; the back-transformed
 * fit estimates the median of the response, not its mean (common practice; Box and Cox 1964).
 * Cost O(1) per value.
 * Example: parseTransform('sqrt') -> { token: 'sqrt', lambda: 0.5 }; transformValue(9, 0.5) -> 4.
 */
import { InputError } from '../errors.ts';

export interface ResponseTransform {
  /** The command-line token: none, log, sqrt, inverse or power=L. */
  readonly token: string;
  /** The power; 1 for none. */
  readonly lambda: number;
}

export const NO_TRANSFORM: ResponseTransform = { token: 'none', lambda: 1 };

const NAMED: Readonly<Record<string, number>> = { none: 1, log: 0, sqrt: 0.5, inverse: -1 };

/** The token of a power: none, log, sqrt or inverse when it is one of those, else power=L. */
export function transformToken(lambda: number): string {
  for (const [name, l] of Object.entries(NAMED)) if (l === lambda) return name;
  return `power=${lambda}`;
}

/** Reads none | log | sqrt | inverse | power=L (L a number from -3 to 3). Throws InputError otherwise. */
export function parseTransform(text: string | undefined): ResponseTransform {
  const t = (text ?? 'none').trim().toLowerCase();
  if (t in NAMED) return { token: t, lambda: NAMED[t] };
  const m = /^power=(.+)$/.exec(t);
  const lambda = m ? Number(m[1]) : NaN;
  if (!m || !Number.isFinite(lambda) || lambda < -3 || lambda > 3) {
    throw new InputError(`A transform needs none, log, sqrt, inverse or power=L with L from -3 to 3, got "${text}"`);
  }
  return { token: transformToken(lambda), lambda };
}

/** z = (y'^lambda - 1) / lambda, or log y' at lambda 0; y' must lie in the transform's domain (checked by the caller). */
export function transformValue(yp: number, lambda: number): number {
  return lambda === 0 ? Math.log(yp) : (Math.pow(yp, lambda) - 1) / lambda;
}

/**
 * y' from z: (1 + lambda z)^(1/lambda), exp z at 0. When 1 + lambda z <= 0 the value is beyond
 * the transform's domain: 0 (the bound) for a positive power, null (no finite value) for a
 * negative one.
 */
export function backTransform(z: number, lambda: number): number | null {
  if (lambda === 0) return Math.exp(z);
  const base = 1 + lambda * z;
  if (base <= 0) return lambda > 0 ? 0 : null;
  return Math.pow(base, 1 / lambda);
}

/**
 * The transformed responses, or an InputError naming the first value outside the domain:
 * y - L > 0 for log and non-positive powers, y - L >= 0 for positive ones. Cost O(n).
 */
export function transformResponses(y: readonly number[], lambda: number, lowerBound: number, name: string): number[] {
  if (lambda === 1) return [...y];
  return y.map((v) => {
    const yp = v - lowerBound;
    if (yp < 0 || (yp === 0 && lambda <= 0)) {
      const what = lowerBound === 0 ? `${name} ${lambda > 0 ? 'of 0 or more' : 'above 0'}` : `${name} ${lambda > 0 ? 'at or above' : 'above'} its lower bound ${lowerBound}`;
      throw new InputError(`The ${transformToken(lambda)} transform needs every ${what}, got ${v}`);
    }
    return transformValue(yp, lambda);
  });
}
