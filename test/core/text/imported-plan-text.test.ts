import { describe, expect, it } from 'vitest';
import { plannedColumnsPartial, unloggedRowsNote, importedWithPlanSummary, wholeNumberNeeded } from '../../../src/core/text/imported-plan-text.ts';

// Wording checks (plain English agreement of number; common practice).
describe('imported plan text', () => {
  it('agrees in number', () => {
    expect(plannedColumnsPartial(['Focus'])).toMatch(/Focus has none$/);
    expect(plannedColumnsPartial(['Focus', 'Gas'])).toMatch(/Focus, Gas have none$/);
    expect(unloggedRowsNote(1)).toMatch(/^1 planned run has .* it is in the plan/);
    expect(unloggedRowsNote(3)).toMatch(/^3 planned runs have .* they are in the plan/);
    expect(importedWithPlanSummary(1)).toContain('1 row ');
    expect(importedWithPlanSummary(11)).toContain('11 rows ');
    expect(wholeNumberNeeded('Row 2', 'the replicate', 'x', false)).toBe('Row 2: the replicate needs a whole number from 1, got "x"');
    expect(wholeNumberNeeded('Row 2', 'the standard order', 'x', true)).toBe('Row 2: the standard order needs a whole number from 1 (or an empty cell), got "x"');
  });
});
