import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { augment } from '../../src/cli/commands/augment.ts';
import { readBackupSync } from '../../src/io/backup/backup.ts';
import { selectStudy, studyRuns } from '../../src/io/backup/select-study.ts';
import { canonicalJson } from '../../src/core/records/canonical-json.ts';
import { fixturePath } from '../helpers/fixtures.ts';

// The demo backup (invented data): a 2^3 with 3 center runs, logged.
const demo = fixturePath('trialbook-demo-backup.json');
const TITLE = 'Invented demo: powder-coating cure trial';

describe('augment', () => {
  it('adds the axial block to the same study and keeps every original record unchanged', async () => {
    const before = readBackupSync(readFileSync(demo, 'utf8'));
    const text = await augment.run([demo, '--study', TITLE, '--axial', '--seed', '5']);
    const after = readBackupSync(text); // the record checks and the checksum
    // Every original study and revision is there, unchanged, and no study is added
    expect(after.payload.studies).toHaveLength(before.payload.studies.length);
    for (const s of before.payload.studies) expect(canonicalJson(after.payload.studies.find((x) => x.id === s.id))).toBe(canonicalJson(s));
    expect(after.payload.revisions).toHaveLength(before.payload.revisions.length);
    for (const r of before.payload.revisions) expect(canonicalJson(after.payload.revisions.find((x) => x.id === r.id))).toBe(canonicalJson(r));
    const own = before.payload.studies.find((s) => s.title === TITLE)!;
    const blocks = (after.payload.blocks ?? []).filter((b) => b.studyId === own.id);
    expect(blocks).toHaveLength(1);
    expect(blocks[0].purpose).toBe('axial');
    // The note says what the augmented design can estimate (a 2^3 full factorial + axial block: the full second-order model)
    expect(blocks[0].note).toMatch(/can estimate the full second-order model/);
    const plan = selectStudy(after, TITLE);
    expect(plan.id).toBe(own.id);
    expect(plan.design.runs.slice(0, own.design.runs.length)).toEqual(own.design.runs);
    const added = plan.design.runs.slice(own.design.runs.length);
    // 2k = 6 axial runs and as many center runs as the study had (3)
    expect(added.filter((r) => r.kind === 'axial')).toHaveLength(6);
    expect(added.filter((r) => r.kind === 'center')).toHaveLength(3);
    expect(added.map((r) => r.run)).toEqual(Array.from({ length: 9 }, (_, i) => own.design.runs.length + 1 + i));
    expect(new Set(added.map((r) => r.originBlock))).toEqual(new Set([Math.max(...own.design.runs.map((r) => r.block)) + 1]));
    // Box and Hunter (1957) alpha for nc = 8, nc0 = 3, ns = 6, ns0 = 3: sqrt(3 (1 + 3/6) / (1 + 3/8))
    const alpha = Math.max(...added.flatMap((r) => r.coded.map(Math.abs)));
    expect(alpha).toBeCloseTo(Math.sqrt((3 * 1.5) / (1 + 3 / 8)), 12);
    // The logged runs are the same records (reused, not copied)
    expect(studyRuns(after, own.id).map((r) => r.id)).toEqual(studyRuns(before, own.id).map((r) => r.id));
  });

  it('--out writes a new file and never overwrites one; --summary says what was added', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'trialbook-augment-'));
    const out = join(dir, 'augmented.json');
    const msg = await augment.run([demo, '--study', TITLE, '--axial', '--seed', '5', '--out', out]);
    expect(msg).toMatch(/Written to/);
    expect(existsSync(out)).toBe(true);
    const first = readFileSync(out, 'utf8');
    await expect(augment.run([demo, '--study', TITLE, '--axial', '--out', out])).rejects.toThrow(/already exists \(nothing is overwritten/);
    expect(readFileSync(out, 'utf8')).toBe(first);
    const summary = await augment.run([demo, '--study', TITLE, '--axial', '--seed', '5', '--summary']);
    expect(summary).toMatch(/6 axial runs at ±1.809/);
    expect(summary).toMatch(/rated limits/);
  });

  it('refuses what it cannot do, writing nothing', async () => {
    await expect(augment.run([demo, '--study', TITLE])).rejects.toThrow(/--axial/);
    await expect(augment.run([demo, '--axial'])).rejects.toThrow(/--study/);
    await expect(augment.run([demo, '--study', 'No such', '--axial'])).rejects.toThrow(/no study with the id or name "No such"/);
    const dir = mkdtempSync(join(tmpdir(), 'trialbook-augment-'));
    const once = join(dir, 'once.json');
    writeFileSync(once, await augment.run([demo, '--study', TITLE, '--axial', '--seed', '1']));
    await expect(augment.run([once, '--study', TITLE, '--axial'])).rejects.toThrow(/already has axial runs/);
    await expect(augment.run([demo, '--study', TITLE, '--axial', '--center-runs', 'two'])).rejects.toThrow('--center-runs needs a whole number, got "two"');
  });
});
