/** The path command's JSON: direction, real step and each step's settings keyed by factor name. */
import type { SteepestPath } from '../../core/predict/steepest-path.ts';

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
