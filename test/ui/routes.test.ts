import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hrefTo, parseRoute, ROUTE_NAMES, ROUTES, STUDY_TABS, type Route } from '../../src/ui/app/routes.ts';

// The addresses the app has always had (README and bookmarks on phones rely on them).
const KNOWN: readonly [string, Route][] = [
  ['#/', { name: 'studies', params: {} }],
  ['', { name: 'studies', params: {} }],
  ['#/new', { name: 'newStudy', params: {} }],
  ['#/study/abc', { name: 'runSheet', params: { studyId: 'abc' } }],
  ['#/study/abc/run/3', { name: 'runForm', params: { studyId: 'abc', plannedRun: 3 } }],
  ['#/study/abc/analysis', { name: 'analysis', params: { studyId: 'abc' } }],
  ['#/study/abc/predict', { name: 'quickCard', params: { studyId: 'abc' } }],
  ['#/study/abc/responses', { name: 'severalResponses', params: { studyId: 'abc' } }],
  ['#/study/abc/export', { name: 'export', params: { studyId: 'abc' } }],
  ['#/export', { name: 'export', params: {} }],
];

/** Parameters for a route from generated values, one per parameter its first pattern names. */
function paramsFor(id: string, run: number, pattern: string): Record<string, string | number> {
  const out: Record<string, string | number> = {};
  if (pattern.includes(':studyId')) out.studyId = id;
  if (pattern.includes(':plannedRun')) out.plannedRun = run;
  return out;
}

describe('the route table', () => {
  it('parses every known address to its screen', () => {
    for (const [hash, route] of KNOWN) expect(parseRoute(hash)).toEqual(route);
  });
  it('every pattern of every screen round-trips: parse(href(params)) gives the params back (fast-check)', () => {
    fc.assert(
      fc.property(fc.string({ minLength: 1 }), fc.nat(100000), (id, run) => {
        for (const name of ROUTE_NAMES) {
          for (const pattern of ROUTES[name].paths) {
            const params = paramsFor(id, run, pattern);
            const h = hrefTo(name, params as never);
            expect(parseRoute(h)).toEqual({ name, params });
          }
        }
      }),
    );
  });
  it('the tabs are the screens with a tab label, in table order', () => {
    expect(STUDY_TABS.map((t) => [t.name, t.label])).toEqual([
      ['runSheet', 'Runs'],
      ['analysis', 'Effects'],
      ['quickCard', 'Predict'],
      ['nextRuns', 'Next'],
      ['export', 'Export'],
    ]);
  });
  it('an address that names no screen is missing (degenerate input)', () => {
    expect(parseRoute('#/study/abc/run/three')).toEqual({ name: 'missing', path: '/study/abc/run/three' });
    expect(parseRoute('#/study')).toEqual({ name: 'missing', path: '/study' });
    expect(parseRoute('#/study/%E0%A4%A')).toEqual({ name: 'missing', path: '/study/%E0%A4%A' });
    expect(parseRoute('#/nowhere/')).toEqual({ name: 'missing', path: '/nowhere' });
  });
  it('a link without the parameters its screen needs is refused, saying what was needed', () => {
    expect(() => hrefTo('runForm', { studyId: 'abc', plannedRun: 2.5 })).toThrow('A link to runForm needs plannedRun as a whole number, got 2.5');
    expect(() => hrefTo('runSheet', {} as never)).toThrow('A link to runSheet needs /study/:studyId, got {}');
  });
});
