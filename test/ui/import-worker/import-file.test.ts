import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { InputError } from '../../../src/core/errors.ts';
import { MAX_BACKUP_BYTES } from '../../../src/io/backup/size-limit.ts';
import { listStudies } from '../../../src/store/studies.ts';
import { checkImportSize, importFile } from '../../../src/ui/import-worker/import-file.ts';
import type { ImportProgress } from '../../../src/ui/import-worker/protocol.ts';
import { freshStore } from '../../store/helpers.ts';

const fixtureText = readFileSync(fileURLToPath(new URL('../../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');

describe('importFile', () => {
  it('reads in chunks with progress up to the whole file, checks, then merges', async () => {
    const store = await freshStore();
    const seen: ImportProgress[] = [];
    const report = await importFile(store, new Blob([fixtureText]), (p) => seen.push(p));
    expect(report.studiesAdded).toBe(1);
    expect(seen[0]).toEqual({ stage: 'reading', fraction: 0 });
    const reading = seen.filter((p) => p.stage === 'reading').map((p) => (p as { fraction: number }).fraction);
    expect(reading.at(-1)).toBe(1);
    expect([...reading].sort((a, b) => a - b)).toEqual(reading); // never goes back
    expect(seen.slice(-2).map((p) => p.stage)).toEqual(['checking', 'merging']);
  });

  it('a damaged file changes nothing', async () => {
    const store = await freshStore();
    const damaged = fixtureText.replace('"Invented demo: powder-coating cure trial"', '"Changed title"');
    await expect(importFile(store, new Blob([damaged]), () => undefined)).rejects.toThrow(/checksum/);
    expect(await listStudies(store)).toEqual([]);
  });

  it('degenerate input: a file above the size limit is refused by its size, before any of it is read', async () => {
    expect(() => checkImportSize(MAX_BACKUP_BYTES)).not.toThrow();
    expect(() => checkImportSize(MAX_BACKUP_BYTES + 1)).toThrow(InputError);
    // A stand-in whose size is over the limit and whose reading would fail loudly.
    const huge = { size: MAX_BACKUP_BYTES + 1, stream: () => { throw new Error('read'); } } as unknown as Blob;
    const store = await freshStore();
    await expect(importFile(store, huge, () => undefined)).rejects.toThrow(/This backup file is 128\.0 MB; Trialbook reads backups of up to 128 MB .*Nothing was imported/);
  });
});
