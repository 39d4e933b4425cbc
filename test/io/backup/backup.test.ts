import { describe, expect, it } from 'vitest';
import { BACKUP_VERSION, migrateBackup, parseJsonText, readBackupSync, writeBackup, readBackup } from '../../../src/io/backup/backup.ts';
import { portableDigest } from '../../../src/io/digest.ts';

const empty = { studies: [], revisions: [] };
const header = { device: 'dev-1', exportedAt: '2024-05-02T10:00:00.000Z', scope: 'all' as const };

describe('reading a backup', () => {
  it('the checksum of an empty payload is the SHA-256 of its canonical text', async () => {
    const text = await writeBackup(empty, header, portableDigest);
    const doc = JSON.parse(text);
    // canonical JSON of the empty payload is '{"revisions":[],"studies":[]}' (members sorted).
    const { createHash } = await import('node:crypto');
    expect(doc.checksum.value).toBe(createHash('sha256').update('{"revisions":[],"studies":[]}').digest('hex'));
    expect(doc.counts).toEqual({ studies: 0, runs: 0, revisions: 0 });
    expect((await readBackup(text)).payload).toEqual(empty);
    expect(readBackupSync('\ufeff' + text).payload).toEqual(empty);
  });

  it('names line and column of a syntax error, and says when a file was cut short', () => {
    expect(() => parseJsonText('{\n  "format": "trialbook-backup",\n  "x": tru\n}')).toThrow(/line 3, column \d+/);
    expect(() => parseJsonText('{"format": "trialbook-backup", "payload": {')).toThrow(/ends early at line 1|line 1, column/);
    expect(() => parseJsonText('   ')).toThrow(/empty/);
  });

  it('refuses nesting deeper than 64 levels with its line and column, before parsing, at any depth', () => {
    for (const depth of [65, 3000, 12_000, 1_000_000]) {
      const text = '{"format": "trialbook-backup",\n "payload": ' + '['.repeat(depth) + ']'.repeat(depth) + '}';
      // The 65th level opens at line 2, column 13 + 63 (the outer object is level 1).
      expect(() => readBackupSync(text)).toThrow(/nests lists and objects deeper than 64 levels at line 2, column 76; .*Nothing was imported/);
    }
    // Exactly 64 levels pass the nesting check (and fail later, as a payload that is no object).
    const ok = '{"format": "trialbook-backup", "formatVersion": 2, "checksum": {"algorithm": "SHA-256", "value": "' + '0'.repeat(64) + '"}, "payload": ' + '['.repeat(63) + ']'.repeat(63) + '}';
    expect(() => readBackupSync(ok)).toThrow(/^checksum: the payload does not match/);
  });

  it('refuses a file above MAX_BACKUP_BYTES before parsing it, on both reading paths', async () => {
    const { MAX_BACKUP_BYTES } = await import('../../../src/io/backup/backup-size.ts');
    const text = (await writeBackup(empty, header)).padEnd(MAX_BACKUP_BYTES + 1, ' ');
    expect(() => readBackupSync(text)).toThrow(/^This backup file is 128\.0 MB; Trialbook reads backups of up to 128 MB/);
    await expect(readBackup(text)).rejects.toThrow(/Nothing was imported/);
    // Counted in UTF-8 bytes: 50 million euro signs are 150 million bytes.
    expect(() => readBackupSync('\u20ac'.repeat(50_000_000))).toThrow(/^This backup file is 143\.1 MB/);
  });

  it('refuses to write a backup above MAX_BACKUP_BYTES, which no device could import', async () => {
    // 1,400 revisions sharing one 100,000-character note: 140 MB of canonical text (invented).
    const note = 'n'.repeat(100_000);
    const revisions = Array.from({ length: 1400 }, (_, i) => ({ id: `r${i}`, notes: note })) as never[];
    await expect(writeBackup({ studies: [], revisions }, header, portableDigest)).rejects.toThrow(/^This backup would be 133\.\d MB; .*Nothing was written/);
    await expect(writeBackup({ studies: [], revisions }, header)).rejects.toThrow(/^This backup would be/);
  }, 60_000);

  it('refuses what is not a Trialbook backup, and a newer format version', async () => {
    expect(() => readBackupSync('[1,2]')).toThrow(/not a Trialbook backup/);
    expect(() => readBackupSync('{"format":"other"}')).toThrow(/format: needs "trialbook-backup"/);
    const doc = JSON.parse(await writeBackup(empty, header));
    expect(() => readBackupSync(JSON.stringify({ ...doc, formatVersion: BACKUP_VERSION + 1 }))).toThrow(
      new RegExp(`format version ${BACKUP_VERSION + 1}, written by a newer Trialbook.*Update Trialbook`),
    );
    expect(() => readBackupSync(JSON.stringify({ ...doc, formatVersion: 0 }))).toThrow(/formatVersion: needs a whole number from 1/);
    expect(() => readBackupSync(JSON.stringify({ ...doc, counts: { ...doc.counts, revisions: 3 } }))).toThrow(/counts.revisions: the file says 3, but its payload holds 0/);
  });

  it('migrates an older version step by step (with a stand-in step), and refuses a version nobody wrote', () => {
    const calls: number[] = [];
    const older = { format: 'trialbook-backup', formatVersion: BACKUP_VERSION - 1, payload: { studies: [], runs: [] } };
    const steps = {
      [BACKUP_VERSION - 1]: (d: Record<string, unknown>) => {
        calls.push(d.formatVersion as number);
        const p = d.payload as { studies: unknown[]; runs: unknown[] };
        return { ...d, payload: { studies: p.studies, revisions: p.runs } };
      },
    };
    const migrated = migrateBackup(older, steps);
    expect(calls).toEqual([BACKUP_VERSION - 1]);
    expect(migrated).toEqual({ format: 'trialbook-backup', formatVersion: BACKUP_VERSION, payload: { studies: [], revisions: [] } });
    expect(() => migrateBackup({ ...older, formatVersion: 0 })).toThrow(/version 0 is not one Trialbook ever wrote/);
  });
});

describe('parseJsonText on a file of another kind (RFC 8259: a JSON text starts with a value)', () => {
  it('says a CSV or other file is not a backup, naming how it starts, and points at the break in a damaged one', () => {
    expect(() => parseJsonText('hello,world\n1,2\n')).toThrow(/The file is not a Trialbook backup: .*starts with "hello,world\\n". A CSV of runs or any other file cannot be imported here/);
    expect(() => parseJsonText('  \nrun,A,B')).toThrow(/not a Trialbook backup/);
    // A file that starts like JSON and breaks later is a damaged backup: line and column, as before.
    expect(() => parseJsonText('{"format": x}')).toThrow(/is not valid JSON at line 1, column 12/);
    expect(() => parseJsonText('[1, 2')).toThrow(/ends early/);
  });
});

describe('jsonErrorOffset', () => {
  it('finds where a text first breaks the JSON grammar (RFC 8259)', async () => {
    const { jsonErrorOffset } = await import('../../../src/io/backup/json-error.ts');
    expect(jsonErrorOffset('{"a": tru}')).toBe(9);
    expect(jsonErrorOffset('{"a": 1,,}')).toBe(8);
    expect(jsonErrorOffset('[1, 2')).toBe(5);
    expect(jsonErrorOffset('{"a": "x\\q"}')).toBe(9);
    expect(jsonErrorOffset('01')).toBe(1);
    expect(jsonErrorOffset('{"a": [1, {"b": null}]} ')).toBe(-1);
  });
  it('locates an error under 100,000 levels of nesting without recursion', async () => {
    const { jsonErrorOffset } = await import('../../../src/io/backup/json-error.ts');
    const deep = '['.repeat(50_000) + '{"a":'.repeat(50_000);
    expect(jsonErrorOffset(deep + 'x')).toBe(deep.length);
    expect(jsonErrorOffset(deep + '1' + '}'.repeat(50_000) + ']'.repeat(50_000))).toBe(-1);
  });
  it('agrees with JSON.parse on which texts are JSON', async () => {
    const { jsonErrorOffset } = await import('../../../src/io/backup/json-error.ts');
    const fc = (await import('fast-check')).default;
    fc.assert(
      fc.property(fc.json(), fc.nat(), fc.string({ maxLength: 3 }), (json, cut, junk) => {
        const broken = json.slice(0, cut % (json.length + 1)) + junk;
        let ok = true;
        try {
          JSON.parse(broken);
        } catch {
          ok = false;
        }
        expect(jsonErrorOffset(broken) === -1).toBe(ok);
      }),
      { numRuns: 2000 },
    );
  });
});
