import { describe, expect, it } from 'vitest';
import { factorMessage } from '../../src/ui/models/new-study-model.ts';

const row = (over: Partial<Parameters<typeof factorMessage>[0]>) => ({ key: 1, kind: 'numeric' as const, name: 'Pressure', unit: 'kPa', low: '100', high: '120', levelA: '', levelB: '', ...over });

describe('factorMessage: the planning form refuses what a new factor may not be', () => {
  it('a range too narrow to code reliably is refused at planning, naming the factor', () => {
    expect(factorMessage(row({}), 0)).toBeNull();
    expect(factorMessage(row({ low: '1000', high: '1000.0000001' }), 0)).toMatch(/^Pressure: the range 1000 to 1000.0000001 is too narrow to code reliably/);
  });
  it('a name the command line could not use is refused (the same rule as design --factor)', () => {
    expect(factorMessage(row({ name: 'Temp, C' }), 0)).toMatch(/contains a comma/);
  });
});
