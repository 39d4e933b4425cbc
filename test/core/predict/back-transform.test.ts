import { describe, expect, it } from 'vitest';
import type { FittedModel } from '../../../src/core/fit/analysis.ts';
import { onResponseScale } from '../../../src/core/predict/back-transform.ts';

const base = { response: 'Roughness' } as unknown as FittedModel; // only response and transform are read
const model = (token: string, lambda: number, lowerBound: number | null, suggestion: string | null = null): FittedModel => ({ ...base, transform: { token, lambda, lowerBound, suggestion } });

describe('onResponseScale (Box and Cox 1964 back-transform)', () => {
  it('log: y = L + exp(z); the ends map to ends (arithmetic: exp(-1) = 0.3679, exp(1) = 2.7183)', () => {
    const r = onResponseScale(model('log', 0, 0), { fit: 0, se: 0.5, ci: [-1, 1], pi: null });
    expect(r.fit).toBeCloseTo(1, 12);
    expect(r.ci![0]).toBeCloseTo(0.36788, 5);
    expect(r.ci![1]).toBeCloseTo(2.71828, 5);
    expect(r.transformed).toEqual({ fit: 0, se: 0.5, ci: [-1, 1], pi: null });
    expect(r.messages.join(' ')).toMatch(/estimates the median, not the mean/);
  });
  it('sqrt: an end below the domain is clipped to the bound and said; inverse: an end beyond has no finite value and is said', () => {
    const s = onResponseScale(model('sqrt', 0.5, 2), { fit: 1, se: 1, ci: [-3, 2], pi: null });
    expect(s.ci![0]).toBe(2); // 1 + 0.5 (-3) < 0: clipped to L = 2
    expect(s.fit).toBeCloseTo(2 + 1.5 ** 2, 12); // (1 + 0.5 x 1)^2 = 2.25 above the bound
    expect(s.messages.join(' ')).toMatch(/clipped to 2/);
    const inv = onResponseScale(model('inverse', -1, 0), { fit: 0.5, se: 0.3, ci: [0.2, 1.2], pi: null });
    expect(inv.fit).toBeCloseTo(2, 12); // (1 - 0.5)^-1
    expect(inv.ci![1]).toBe(Infinity);
    expect(inv.messages.join(' ')).toMatch(/no finite value/);
  });
  it('no transform, bounded response: a prediction below the bound is warned of, with the Box-Cox suggestion', () => {
    const r = onResponseScale(model('none', 1, 0, 'log'), { fit: 0.4, se: 0.2, ci: [-0.1, 0.9], pi: [-0.5, 1.3] });
    expect(r.fit).toBe(0.4);
    expect(r.transformed).toBeNull();
    expect(r.messages.join(' ')).toMatch(/goes below 0, a value Roughness cannot go below.*log transform/);
  });
  it('degenerate input: no transform and no bound change nothing and say nothing', () => {
    const r = onResponseScale(base, { fit: -5, se: null, ci: null, pi: null });
    expect(r).toEqual({ fit: -5, ci: null, pi: null, transformed: null, messages: [] });
  });
});
