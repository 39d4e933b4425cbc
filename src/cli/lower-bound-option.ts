/**
 * `--lower-bound NAME=VALUE`: the lowest value the response can take (0 for a response that
 * cannot be negative), as the app's planning form gives it. Transforms then apply to y - L
 * (core/fit/response-transform.ts), the report carries the bound note and the Box-Cox
 * suggestion of the response minus its bound, and predictions warn when they cross it.
 * Example: withLowerBound(data, 'Roughness=0') -> the same data with lowerBound 0.
 */
import { InputError } from '../core/errors.ts';
import { parseNumber } from '../core/factor/coding.ts';
import type { ResponseData } from '../core/study/response-data.ts';
import { bareColumnName } from '../io/csv/read-table.ts';
import { parseAssignments } from './args.ts';

/** Throws InputError for a malformed option, another response's name, a value that is not a number, or a logged value below the bound; changes nothing then. */
export function withLowerBound(data: ResponseData, option: string | undefined): ResponseData {
  if (option === undefined) return data;
  const pairs = parseAssignments(option, '--lower-bound');
  if (pairs.length !== 1) throw new InputError(`--lower-bound: give one response and its lowest value, such as --lower-bound ${data.response}=0; got "${option}"`);
  const [[name, text]] = pairs;
  if (bareColumnName(name) !== bareColumnName(data.response)) {
    throw new InputError(`--lower-bound names "${name}", but the response analyzed is "${data.response}": give --lower-bound ${data.response}=VALUE`);
  }
  const bound = parseNumber(text);
  if (text === '' || !Number.isFinite(bound)) throw new InputError(`--lower-bound: the lowest value of ${data.response} needs a number (0 for "cannot be negative"), got "${text}"`);
  const own = data.lowerBound ?? null;
  if (own !== null && own !== bound) {
    throw new InputError(`The study gives ${data.response} the lower bound ${own}: leave out --lower-bound, or give the same value`);
  }
  const below = data.y.findIndex((v) => v < bound);
  if (below >= 0) {
    throw new InputError(`Run ${data.labels[below]} has ${data.response} ${data.y[below]}, below the lower bound ${bound} given by --lower-bound: check that value, or give a lower bound at or below it`);
  }
  return { ...data, lowerBound: bound };
}
