import { describe, expect, it } from 'vitest';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { surfaceNature } from '../../../src/core/optimum/canonical-analysis.ts';
import {
  pathNeedsFirstOrder,
  quadraticNotSupported,
  axialRunOutsideText,
  bestSettingHeading,
  natureName,
  natureWords,
  predictionVarianceWords,
  secondOrderNeedsNumeric,
  stationaryPlaceWords,
} from '../../../src/core/text/second-order-text.ts';

describe('second-order sentences', () => {
  it('names the categorical factors, one or several', () => {
    expect(secondOrderNeedsNumeric(['Powder'])).toMatch(/Powder has named levels\. Change it to numbers, or remove it/);
    expect(secondOrderNeedsNumeric(['Powder', 'Tool'])).toMatch(/Powder, Tool have named levels\. Change them/);
  });

  it('the axial run warning gives the setting in real units and the factorial range', () => {
    const [t] = defineFactors([{ kind: 'numeric', name: 'Temperature', low: 160, high: 200, unit: 'degC' }]);
    // 180 + 1.41421 x 20 = 208.28 (by hand)
    expect(axialRunOutsideText(t, 180 + 20 * Math.SQRT2)).toBe(
      "This axial run sets Temperature to 208.3 degC, outside the factorial range 160 to 200 degC: check it is within the machine's rated limits before making the run.",
    );
  });

  it('one plain sentence per nature, chosen by the eigenvalue signs (Montgomery 8th ed., section 11.3.2, from memory)', () => {
    expect(natureWords(surfaceNature([-0.96, -1.41]))).toMatch(/has a top/);
    expect(natureWords(surfaceNature([0.96, 1.41]))).toMatch(/has a bottom/);
    expect(natureWords(surfaceNature([1, -1]))).toMatch(/saddle/);
    expect(natureWords(surfaceNature([1, -0.01]))).toMatch(/ridge/);
    expect(natureName('saddle')).toBe('saddle');
  });

  it('inside or outside the tested box; the goal in the heading; the prediction variance rounded', () => {
    expect(stationaryPlaceWords(true)).toBe('It lies inside the tested box.');
    expect(stationaryPlaceWords(false)).toMatch(/outside the tested box/);
    expect(bestSettingHeading({ kind: 'max' }, 'Yield')).toBe('Highest Yield inside the tested box');
    expect(bestSettingHeading({ kind: 'min' }, 'Scrap')).toBe('Lowest Scrap inside the tested box');
    expect(bestSettingHeading({ kind: 'target', target: 12.5 }, 'Gap')).toBe('Gap nearest the target 12.5 inside the tested box');
    expect(predictionVarianceWords(2.6, 3.1667)).toBe('Scaled prediction variance 2.6 at the center and 3.17 at distance 1 (lower means steadier predictions).');
  });

  it('degenerate: an empty list of names still reads as a sentence', () => {
    expect(secondOrderNeedsNumeric([])).toMatch(/^Second-order designs/);
  });
});

describe('quadraticNotSupported: the reason, and what to do where the model is asked for', () => {
  it('the reason alone, then the screen and the command line each add their own way on', () => {
    const need = quadraticNotSupported();
    expect(need).toMatch(/three or more settings of each factor/);
    expect(quadraticNotSupported('screen').startsWith(need)).toBe(true);
    expect(quadraticNotSupported('screen')).toMatch(/add axial runs on the Next tab/);
    expect(quadraticNotSupported('command').startsWith(need)).toBe(true);
    expect(quadraticNotSupported('command')).toMatch(/--terms .*augment --axial/);
    expect(quadraticNotSupported('screen')).not.toMatch(/--/);
  });
});

describe('pathNeedsFirstOrder: the Next screen with a model that has squares', () => {
  it('names the response, points to the quick card and says how to get a path (Montgomery 8th ed., sections 11.2 and 11.3, from memory)', () => {
    const s = pathNeedsFirstOrder('Yield');
    expect(s).toContain('best setting for Yield');
    expect(s).toContain('quick card');
    expect(s).toMatch(/model without squares/);
    expect(s.endsWith('.')).toBe(true);
  });
});
