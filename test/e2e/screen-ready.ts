import type { ROUTE_NAMES } from '../../src/ui/app/routes.ts';

/** What each screen of the route table shows once it has opened: an element and its text. */
export const READY: Record<(typeof ROUTE_NAMES)[number], readonly [string, RegExp]> = {
  studies: ['h2', /^Studies$/],
  newStudy: ['h2', /^Plan a new study$/],
  runSheet: ['.progress', /planned runs logged/],
  runForm: ['h2', /^Run 2 of/],
  analysis: ['h2', /^Effects$/],
  quickCard: ['h2', /^Quick card$/],
  nextRuns: ['h2', /^Next runs$/],
  severalResponses: ['h2', /^Several responses at once$/],
  export: ['h2', /^Export$/],
  setAside: ['h2', /^Set-aside records$/],
};
