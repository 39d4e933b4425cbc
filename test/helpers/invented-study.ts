/** An INVENTED study for tests of planned runs added later: a 2^2 plan with one center run in one block (standard order as in Montgomery, 8th ed., section 6.2). */
import type { AddedBlock } from '../../src/core/study/added-block.ts';
import type { StudyRecord } from '../../src/core/study/study.ts';
import { factorialRuns, plainDesign } from './plain-design.ts';

export function inventedStudy(): StudyRecord {
  return {
    id: 's-1',
    device: 'dev-1',
    createdAt: '2024-05-02T10:00:00.000Z',
    title: 'Invented demo: two-factor trial',
    purpose: 'INVENTED DEMO DATA.',
    factors: [
      { kind: 'numeric', name: 'Temperature', letter: 'A', low: 160, high: 200, unit: '°C' },
      { kind: 'numeric', name: 'Time', letter: 'B', low: 10, high: 20, unit: 's' },
    ],
    responses: [{ name: 'Gloss', goal: 'maximize', lowerBound: null }],
    design: plainDesign(factorialRuns(2, 1, 1), 'Invented 2^2 with a center run.'),
  };
}

export function inventedBlock(id: string, runs: AddedBlock['runs'], purpose: AddedBlock['purpose'] = 'path'): AddedBlock {
  return { id, studyId: 's-1', device: 'dev-2', createdAt: '2024-05-03T10:00:00.000Z', purpose, note: 'invented', runs };
}

