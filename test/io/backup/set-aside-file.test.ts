import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../../src/core/records/canonical-json.ts';
import type { RunRevision } from '../../../src/core/study/study.ts';
import { SET_ASIDE_FORMAT, writeSetAsideFile, type SetAsideEntry } from '../../../src/io/backup/set-aside-file.ts';

// The checksum is checked against Node's own SHA-256 (node:crypto, OpenSSL's implementation of
// FIPS 180-4) over the records' canonical JSON, not against the app's own hash.
const record = { id: 'r1', runId: 'u1', studyId: 's1', plannedRun: 3, rev: 2, parents: ['r0'], readings: [[99], []] } as unknown as RunRevision;
const entry: SetAsideEntry = { kind: 'revision', id: 'r1', studyId: 's1', plannedRun: 3, field: 'readings[0][0]', reason: 'differs', fromDevice: 'dev-a', setAsideAt: '2026-01-02T03:04:05.000Z', record };

describe('the file of set-aside records', () => {
  it('holds every record whole, with why and when, and a checksum that Node\'s SHA-256 confirms', async () => {
    const text = await writeSetAsideFile([entry], { device: 'dev-b', exportedAt: '2026-02-01T00:00:00.000Z' });
    const doc = JSON.parse(text);
    expect(doc.format).toBe(SET_ASIDE_FORMAT);
    expect(doc.count).toBe(1);
    expect(doc.device).toBe('dev-b');
    expect(doc.records).toEqual([entry]);
    const expected = createHash('sha256').update(canonicalJson(doc.records), 'utf8').digest('hex');
    expect(doc.checksum).toEqual({ algorithm: 'SHA-256', value: expected });
  });

  it('a store row\'s key and any extra field stay out of the file', async () => {
    const row = { ...entry, key: 'revision:r1:abc', extra: 1 } as SetAsideEntry;
    const doc = JSON.parse(await writeSetAsideFile([row], { device: 'd', exportedAt: '2026-02-01T00:00:00.000Z' }));
    expect(Object.keys(doc.records[0]).sort()).toEqual(Object.keys(entry).sort());
  });

  it('no records (degenerate input) is a file with count 0', async () => {
    const doc = JSON.parse(await writeSetAsideFile([], { device: 'd', exportedAt: '2026-02-01T00:00:00.000Z' }));
    expect(doc.count).toBe(0);
    expect(doc.records).toEqual([]);
  });
});
