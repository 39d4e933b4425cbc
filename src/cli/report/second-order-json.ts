/** The analyze command's `secondOrder` JSON: settings keyed by factor name, nulls where unavailable. */
import type { SecondOrderAnalysis } from '../../core/optimum/second-order-analysis.ts';

export function secondOrderJson(s: SecondOrderAnalysis): Record<string, unknown> {
  const names = s.canonical.surface.factors.map((f) => f.name);
  const keyed = (xs: readonly number[]) => Object.fromEntries(names.map((n, i) => [n, xs[i]]));
  const st = s.canonical.stationary;
  return {
    goal: s.goal.kind === 'target' ? `target=${s.goal.target}` : s.goal.kind,
    stationary: st ? { coded: keyed(st.coded), real: keyed(st.real), fit: st.fit, inside: st.inside } : null,
    eigenvalues: s.canonical.eigenvalues,
    eigenvectors: s.canonical.eigenvectors.map(keyed),
    nature: s.canonical.nature,
    ridge: s.ridge.map((p) => ({ radius: p.radius, coded: keyed(p.coded), real: keyed(p.real), fit: p.fit, pi: p.pi })),
    ridgeSense: s.ridgeSense,
    optimum: { coded: keyed(s.optimum.coded), real: keyed(s.optimum.real), fit: s.optimum.fit, ci: s.optimum.ci, pi: s.optimum.pi, method: s.optimum.method },
    notes: s.notes,
    caution: s.caution,
  };
}
