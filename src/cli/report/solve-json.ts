/** The solve command's JSON. */
import type { Solution } from '../../core/predict/solve-for-target.ts';

/**
 * The solve command's JSON object (keys setting, reachable, fit, pi, messages, caution, with the
 * factor, target, coded, se, ci, slope, reach, solutions, needed and settings besides).
 * Example: solveJson(solveForTarget(model, { factor: 'A', target: 41 })).reachable -> true.
 */
export function solveJson(s: Solution) {
  return {
    response: s.response,
    factor: s.factor.name,
    target: s.target,
    setting: s.setting,
    coded: s.coded,
    reachable: s.reachable,
    fit: s.fit,
    se: s.se,
    level: s.level,
    ci: s.ci,
    pi: s.pi,
    slope: s.slope,
    reach: s.reach,
    solutions: s.solutions,
    needed: s.needed,
    settings: Object.fromEntries(s.settings.map((x) => [x.name, x.real])),
    outside: s.outside,
    messages: s.messages,
    caution: s.caution,
    ...(s.transformed ? { transformed: s.transformed } : {}),
  };
}
