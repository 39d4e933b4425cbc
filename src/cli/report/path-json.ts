/** The path command's JSON: direction, real step and each step's settings keyed by factor name. */
import type { SteepestPath } from '../../core/predict/steepest-path.ts';

/**
 * The path command's JSON object (keys direction, steps with real, coded, fit, outside; messages;
 * caution; with sense, base, realStep, firstOutside and each step's pi besides), keyed by factor name.
 * Example: pathJson(steepestPath(model, { base: 'Time', step: 5, steps: 1 })).direction.Time -> 1.
 */
export function pathJson(p: SteepestPath) {
  const keyed = <T>(values: readonly T[]) => Object.fromEntries(p.factors.map((f, i) => [f.name, values[i]]));
  return {
    response: p.response,
    sense: p.sense,
    base: p.base,
    direction: keyed(p.direction),
    realStep: keyed(p.realStep),
    steps: p.steps.map((s) => ({ step: s.step, real: keyed(s.real), coded: keyed(s.coded), fit: s.fit, pi: s.pi, outside: s.outside })),
    firstOutside: p.firstOutside,
    messages: p.messages,
    caution: p.caution,
  };
}
