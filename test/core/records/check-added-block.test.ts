/** The record checks of an added block. The study is INVENTED (test/helpers/invented-study.ts). */
import { describe, expect, it } from 'vitest';
import { checkAddedBlock } from '../../../src/core/records/check-added-block.ts';
import { addedRuns } from '../../../src/core/study/added-block.ts';
import { inventedBlock as block, inventedStudy } from '../../helpers/invented-study.ts';

describe('checkAddedBlock', () => {
  const studies = new Map([['s-1', inventedStudy()]]);
  const good = block('b-1', addedRuns(inventedStudy(), [{ kind: 'path', coded: [2, 1] }, { kind: 'path', coded: [4, 2] }]));
  it('passes a block made by addedRuns, rebuilt from its fields', () => {
    expect(checkAddedBlock(JSON.parse(JSON.stringify(good)), 'block', studies)).toEqual(good);
  });
  it('passes an axial block (axial and center runs that augment the plan)', () => {
    const axial = { ...block('b-2', addedRuns(inventedStudy(), [{ kind: 'axial', coded: [-1.4, 0] }, { kind: 'center', coded: [0, 0] }])), purpose: 'axial' };
    expect(checkAddedBlock(JSON.parse(JSON.stringify(axial)), 'block', studies).purpose).toBe('axial');
  });
  it('refuses runs numbered inside the plan, a shared number, mixed or old blocks, an unknown study or purpose, extra fields', () => {
    const bad = (change: (b: any) => void) => {
      const b = JSON.parse(JSON.stringify(good));
      change(b);
      return () => checkAddedBlock(b, 'block', studies);
    };
    expect(bad((b) => (b.runs[0].run = 3))).toThrow("block.runs[0].run: needs a number after the study's own runs (above 5), got 3");
    expect(bad((b) => (b.runs[1].run = 6))).toThrow('block.runs[1].run: run numbers must differ, got 6 twice');
    expect(bad((b) => (b.runs[1].block = 3))).toThrow(/originBlock: an added run's block of origin is its block \(3\), got 2/);
    expect(bad((b) => ((b.runs[1].block = 3), (b.runs[1].originBlock = 3)))).toThrow(/share one block \(2\), got 3/);
    expect(bad((b) => b.runs.forEach((r: any) => ((r.block = 1), (r.originBlock = 1))))).toThrow(/block after the study's own blocks \(above 1\), got 1/);
    expect(bad((b) => (b.studyId = 's-9'))).toThrow(/needs a study in this file, got "s-9"/);
    expect(bad((b) => (b.purpose = 'extra'))).toThrow(/block.purpose: needs "path" or "foldover" or "confirmation" or "axial"/);
    expect(bad((b) => (b.runs = []))).toThrow(/block.runs: needs at least one planned run/);
    expect(bad((b) => (b.colour = 'red'))).toThrow(/has no field "colour"/);
    expect(bad((b) => (b.runs[0].coded = [1]))).toThrow(/one coded setting per factor \(2\)/);
  });
});
