/**
 * The Trialbook backup file: one JSON document holding one study or all of them, with every
 * revision of every logged run (the whole history). Its shape is written down in
 * trialbook-backup.schema.json and backup-format.md beside this file.
 *
 *   { "format": "trialbook-backup", "formatVersion": 2,
 *     "app": { "name": "Trialbook", "version": "0.1.0" },
 *     "exportedAt": "...", "device": "...", "scope": "all" | "study",
 *     "counts": { "studies": 1, "runs": 16, "revisions": 19 },
 *     "checksum": { "algorithm": "SHA-256", "value": "<64 hex digits>" },
 *     "payload": { "studies": [...], "revisions": [...], "blocks": [...] } }
 *
 * `blocks` (planned runs added to a study after its plan: path, foldover, confirmation, axial) is
 * written only when there are some.
 *
 * The checksum is SHA-256 (FIPS 180-4) of the UTF-8 bytes of the canonical JSON of `payload`
 * (src/core/records/canonical-json.ts). Reading checks, in this order: the size (at most
 * MAX_BACKUP_BYTES, backup-size.ts), nesting no deeper than MAX_NESTING, that the text is JSON,
 * the format name, the version (a newer one is refused, an older one migrated), the checksum,
 * then every field (the record checks of src/core/records, the same the store applies on every
 * write).
 */
import { InputError } from '../../core/errors.ts';
import { withAddedBlocks, type AddedBlock } from '../../core/study/added-block.ts';
import type { RunRevision, StudyRecord } from '../../core/study/study.ts';
import { MAX_NESTING } from '../../core/records/canonical-json.ts';
import { canonicalJsonBytes } from '../../core/records/canonical-json-bytes.ts';
import { canonicalSha256 } from '../../core/records/canonical-sha256.ts';
import { checkAddedBlock } from '../../core/records/check-added-block.ts';
import { canonicalJson } from '../../core/records/canonical-json.ts';
import { checkHistories, checkUniqueIds } from '../../core/records/check-histories.ts';
import { checkRevision } from '../../core/records/check-revision.ts';
import { checkStudy } from '../../core/records/check-study.ts';
import { id, int, list, obj, only, text, time } from '../../core/records/field-checks.ts';
import { toHex } from '../../core/records/sha256.ts';
import { utf8Length } from '../../core/records/utf8.ts';
import { defaultDigest, portableDigest, type Digest } from '../digest.ts';
import { APP_NAME, APP_VERSION } from '../app-version.ts';
import { checkBackupSize } from './backup-size.ts';
import { jsonErrorOffset } from './json-error.ts';
import { jsonNestingOffset } from './json-nesting.ts';
import { backupV1ToV2 } from './migrate-v1.ts';

export const BACKUP_FORMAT = 'trialbook-backup';
/** The format version this code writes (version 2: open run kinds, block of origin, lower bound). */
export const BACKUP_VERSION = 2;

export interface BackupPayload {
  readonly studies: readonly StudyRecord[];
  readonly revisions: readonly RunRevision[];
  /** Planned runs added to the studies after their plans (path, foldover, confirmation, axial); absent when none. */
  readonly blocks?: readonly AddedBlock[];
}

export interface BackupCounts {
  readonly studies: number;
  /** Logged runs: distinct run ids among the revisions. */
  readonly runs: number;
  readonly revisions: number;
}

export interface Backup {
  readonly format: typeof BACKUP_FORMAT;
  readonly formatVersion: number;
  readonly app: { readonly name: string; readonly version: string };
  readonly exportedAt: string;
  /** Device that wrote the file. */
  readonly device: string;
  /** "all": every study on the device; "study": the studies chosen. */
  readonly scope: 'all' | 'study';
  readonly counts: BackupCounts;
  readonly checksum: { readonly algorithm: 'SHA-256'; readonly value: string };
  readonly payload: BackupPayload;
}

/**
 * Upgrades of older format versions: MIGRATIONS[v] turns a version-v document (already checked
 * for its checksum) into a version v+1 document. Each step comes with a fixture file of its
 * version in test/fixtures (trialbook-backup-v1.json for version 1).
 */
export const MIGRATIONS: Readonly<Record<number, (doc: Record<string, unknown>) => Record<string, unknown>>> = {
  1: backupV1ToV2,
};

/** Counts of a payload. */
export function countPayload(p: BackupPayload): BackupCounts {
  return { studies: p.studies.length, runs: new Set(p.revisions.map((r) => r.runId)).size, revisions: p.revisions.length };
}

const byId = <T extends { id: string }>(a: T, b: T) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

/** The payload in file order: studies and revisions sorted by id, so equal contents give equal files. */
export function sortPayload(p: BackupPayload): BackupPayload {
  const sorted = { studies: [...p.studies].sort(byId), revisions: [...p.revisions].sort(byId) };
  return p.blocks && p.blocks.length > 0 ? { ...sorted, blocks: [...p.blocks].sort(byId) } : sorted;
}

/** The checksum of a payload: SHA-256 of its canonical JSON, as hexadecimal. */
export async function payloadChecksum(payload: unknown, digest: Digest = defaultDigest): Promise<string> {
  return (await payloadDigest(payload, digest)).hex;
}

/** The checksum of a payload and the length of its canonical JSON in bytes. */
async function payloadDigest(payload: unknown, digest: Digest): Promise<{ hex: string; bytes: number }> {
  // The portable digest hashes the canonical text as it is written (64 KiB at a time); any
  // other digest (Web Crypto's) needs the bytes whole, built in typed arrays.
  if (digest === portableDigest) return canonicalSha256(payload);
  const bytes = canonicalJsonBytes(payload);
  return { hex: toHex(await digest(bytes)), bytes: bytes.length };
}

export interface BackupHeader {
  readonly device: string;
  readonly exportedAt: string;
  readonly scope: 'all' | 'study';
}

function assemble(payload: BackupPayload, header: BackupHeader, checksum: string, payloadBytes: number): string {
  // The file holds the canonical payload and more, so a payload above the limit is refused
  // before the file text is made; the text is measured again once made.
  checkBackupSize(payloadBytes, 'export');
  const doc: Backup = {
    format: BACKUP_FORMAT,
    formatVersion: BACKUP_VERSION,
    app: { name: APP_NAME, version: APP_VERSION },
    exportedAt: header.exportedAt,
    device: header.device,
    scope: header.scope,
    counts: countPayload(payload),
    checksum: { algorithm: 'SHA-256', value: checksum },
    payload,
  };
  let textOut: string;
  try {
    textOut = JSON.stringify(doc, null, 1) + '\n';
  } catch (err) {
    // The engine's longest string is far above the limit, so this is a file over it.
    if (err instanceof RangeError) checkBackupSize(Number.POSITIVE_INFINITY, 'export');
    throw err;
  }
  checkBackupSize(utf8Length(textOut), 'export');
  return textOut;
}

/**
 * The backup file text of a payload (sorted by id), with its counts and checksum. Throws
 * InputError when the file would be above MAX_BACKUP_BYTES (which the import refuses).
 */
export async function writeBackup(payload: BackupPayload, header: BackupHeader, digest: Digest = defaultDigest): Promise<string> {
  const sorted = sortPayload(payload);
  const { hex, bytes } = await payloadDigest(sorted, digest);
  return assemble(sorted, header, hex, bytes);
}

/** Line and column (from 1) of a character offset. */
function lineColumn(textIn: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset && i < textIn.length; i++) if (textIn.charCodeAt(i) === 10) (line++, (start = i + 1));
  return { line, column: offset - start + 1 };
}

/** JSON.parse with a message naming line and column. */
export function parseJsonText(textIn: string, what = 'The file'): unknown {
  const body = textIn.charCodeAt(0) === 0xfeff ? textIn.slice(1) : textIn;
  if (body.trim() === '') throw new InputError(`${what} is empty; a Trialbook backup is a JSON document`);
  // Before any parse or walk: nesting deeper than any record needs is refused where it starts.
  const deep = jsonNestingOffset(body, MAX_NESTING);
  if (deep >= 0) {
    const { line, column } = lineColumn(body, deep);
    throw new InputError(`${what} nests lists and objects deeper than ${MAX_NESTING} levels at line ${line}, column ${column}; a Trialbook backup needs fewer than 10, so the file is damaged or was not made by Trialbook. Nothing was imported.`);
  }
  try {
    return JSON.parse(body);
  } catch {
    const at = jsonErrorOffset(body);
    const { line, column } = lineColumn(body, at < 0 ? body.length : at);
    if (at >= body.length || at < 0) {
      throw new InputError(`${what} is not valid JSON: it ends early at line ${line}, column ${column}; it may have been cut short`);
    }
    const near = JSON.stringify(body.slice(at, at + 12));
    // Wrong from the first character: another kind of file (a CSV, a picture), not a damaged backup.
    const first = body.search(/\S/);
    if (at === first && body[first] !== '{' && body[first] !== '[') {
      throw new InputError(`${what} is not a Trialbook backup: a backup is a JSON document that starts with "{", and this file starts with ${near}. A CSV of runs or any other file cannot be imported here. Nothing was imported.`);
    }
    throw new InputError(`${what} is not valid JSON at line ${line}, column ${column} (near ${near})`);
  }
}

function head(doc: Record<string, unknown>): { version: number } {
  if (doc.format !== BACKUP_FORMAT) {
    throw new InputError(`format: needs "${BACKUP_FORMAT}" (a Trialbook backup), got ${typeof doc.format === 'string' ? JSON.stringify(doc.format.slice(0, 40)) : 'nothing'}`);
  }
  const v = doc.formatVersion;
  if (typeof v !== 'number' || !Number.isSafeInteger(v) || v < 1) {
    throw new InputError(`formatVersion: needs a whole number from 1, got ${JSON.stringify(v) ?? 'nothing'}`);
  }
  if (v > BACKUP_VERSION) {
    throw new InputError(`This backup has format version ${v}, written by a newer Trialbook; this one reads versions up to ${BACKUP_VERSION}. Update Trialbook, then import the file again. Nothing was imported.`);
  }
  return { version: v };
}

/** Brings an older document up to the current version, one step at a time. */
export function migrateBackup(doc: Record<string, unknown>, migrations = MIGRATIONS): Record<string, unknown> {
  let d = doc;
  let v = d.formatVersion as number;
  while (v < BACKUP_VERSION) {
    const step = migrations[v];
    if (!step) throw new InputError(`formatVersion: version ${v} is not one Trialbook ever wrote (it reads 1 to ${BACKUP_VERSION})`);
    d = step(d);
    v += 1;
    d = { ...d, formatVersion: v };
  }
  return d;
}

/** Checks the fields of a current-version document (after its checksum matched). */
export function checkBackup(doc: Record<string, unknown>): Backup {
  only(doc, 'file', ['format', 'formatVersion', 'app', 'exportedAt', 'device', 'scope', 'counts', 'checksum', 'payload']);
  const app = obj(doc.app, 'app');
  const payloadObj = obj(doc.payload, 'payload');
  only(payloadObj, 'payload', ['studies', 'revisions', 'blocks']);
  const studies = list(payloadObj.studies, 'payload.studies', 10_000).map((s, i) => checkStudy(s, `payload.studies[${i}]`));
  checkUniqueIds(studies, 'payload.studies', 'study');
  const ownMap = new Map(studies.map((s) => [s.id, s]));
  const blocks = payloadObj.blocks === undefined ? [] : list(payloadObj.blocks, 'payload.blocks', 100_000).map((b, i) => checkAddedBlock(b, `payload.blocks[${i}]`, ownMap));
  checkUniqueIds(blocks, 'payload.blocks', 'block');
  // Revisions are checked against each study's whole plan, its added blocks' runs included.
  const studyMap = new Map(studies.map((s) => [s.id, withAddedBlocks(s, blocks)]));
  const revisions = list(payloadObj.revisions, 'payload.revisions', 10_000_000).map((r, i) => checkRevision(r, `payload.revisions[${i}]`, studyMap));
  checkHistories(revisions, 'payload.revisions');
  const payload: BackupPayload = blocks.length > 0 ? { studies, revisions, blocks } : { studies, revisions };
  const countsObj = obj(doc.counts, 'counts');
  const counts = countPayload(payload);
  for (const k of ['studies', 'runs', 'revisions'] as const) {
    const n = int(countsObj[k], `counts.${k}`, 0);
    if (n !== counts[k]) throw new InputError(`counts.${k}: the file says ${n}, but its payload holds ${counts[k]}; the file is incomplete or was changed`);
  }
  const checksum = obj(doc.checksum, 'checksum');
  const scope = doc.scope === 'all' || doc.scope === 'study' ? doc.scope : undefined;
  if (!scope) throw new InputError(`scope: needs "all" or "study", got ${JSON.stringify(doc.scope) ?? 'nothing'}`);
  return {
    format: BACKUP_FORMAT,
    formatVersion: doc.formatVersion as number,
    app: { name: text(app.name, 'app.name'), version: text(app.version, 'app.version') },
    exportedAt: time(doc.exportedAt, 'exportedAt'),
    device: id(doc.device, 'device'),
    scope,
    counts,
    checksum: { algorithm: 'SHA-256', value: checksum.value as string },
    payload,
  };
}

function checksumOf(doc: Record<string, unknown>): string {
  const c = obj(doc.checksum, 'checksum');
  if (c.algorithm !== 'SHA-256') throw new InputError(`checksum.algorithm: needs "SHA-256", got ${JSON.stringify(c.algorithm) ?? 'nothing'}`);
  if (typeof c.value !== 'string' || !/^[0-9a-f]{64}$/.test(c.value)) throw new InputError(`checksum.value: needs 64 lower-case hexadecimal digits, got ${JSON.stringify(c.value)?.slice(0, 80) ?? 'nothing'}`);
  return c.value;
}

function checkChecksum(found: string, expected: string): void {
  if (found !== expected) {
    throw new InputError('checksum: the payload does not match the checksum written at export, so the file was changed or damaged after it was made. Nothing was imported.');
  }
}

function headOf(doc: unknown): Record<string, unknown> {
  if (typeof doc !== 'object' || doc === null || Array.isArray(doc)) throw new InputError('The file is JSON but not a Trialbook backup: it needs an object at the top');
  const d = doc as Record<string, unknown>;
  head(d);
  return d;
}

/** Reads a backup file: size, JSON, format, version (migrating older ones), checksum, every field. */
export async function readBackup(textIn: string, digest: Digest = defaultDigest): Promise<Backup> {
  checkBackupSize(utf8Length(textIn), 'import');
  const doc = headOf(parseJsonText(textIn));
  const expected = checksumOf(doc);
  if (doc.payload === undefined) throw new InputError('payload: needs an object, got nothing');
  checkChecksum(await payloadChecksum(doc.payload, digest), expected);
  return checkBackup(migrateBackup(doc));
}

/** readBackup without waiting: the same checks with the small SHA-256 (for the command line). */
export function readBackupSync(textIn: string): Backup {
  checkBackupSize(utf8Length(textIn), 'import');
  const doc = headOf(parseJsonText(textIn));
  const expected = checksumOf(doc);
  if (doc.payload === undefined) throw new InputError('payload: needs an object, got nothing');
  checkChecksum(canonicalSha256(doc.payload).hex, expected);
  return checkBackup(migrateBackup(doc));
}

export { portableDigest };
