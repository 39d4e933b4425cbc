// The one test command (npm test): type check, unit tests, the first screen's size budget, browser tests, then the plain closing
// line "N passed, N failed" with the real counts of both test runners.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const out = mkdtempSync(join(tmpdir(), 'trialbook-test-'));
let passed = 0;
let failed = 0;
let broken = false;

function step(title, cmd, args, env = {}) {
  console.log(`\n== ${title}: ${cmd} ${args.join(' ')}`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return r.status === 0;
}

if (!step('type check', 'npm', ['run', '--silent', 'typecheck'])) {
  failed += 1;
  broken = true;
  console.log('type check failed (counted as one failure)');
}

const unitJson = join(out, 'unit.json');
const unitOk = step('unit tests', 'npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${unitJson}`]);
if (existsSync(unitJson)) {
  const r = JSON.parse(readFileSync(unitJson, 'utf8'));
  passed += r.numPassedTests;
  failed += r.numFailedTests;
  if (!unitOk && r.numFailedTests === 0) (failed += 1), (broken = true);
} else {
  failed += 1;
  broken = true;
}

// The first screen's JavaScript budget (60 KB gzip), from the bundler's own chunk graph
// (test/bench/chunk-sizes.ts --check): counted as one test, passed or failed.
if (step('first screen size budget', 'npx', ['tsx', 'test/bench/chunk-sizes.ts', '--check'])) passed += 1;
else failed += 1;

const e2eJson = join(out, 'e2e.json');
const browserOk =
  step('find chromium', 'node', ['test/tools/find-chromium.mjs']) &&
  step('build', 'npm', ['run', '--silent', 'build']) &&
  step('build the store test page', 'npm', ['run', '--silent', 'build:test']) &&
  step('browser tests', 'npx', ['playwright', 'test', '-c', 'test/playwright.config.ts', '--reporter=list,json'], {
    PLAYWRIGHT_JSON_OUTPUT_NAME: e2eJson,
  });
if (existsSync(e2eJson)) {
  const s = JSON.parse(readFileSync(e2eJson, 'utf8')).stats;
  passed += s.expected + s.flaky;
  failed += s.unexpected;
  if (!browserOk && s.unexpected === 0) (failed += 1), (broken = true);
} else {
  failed += 1;
  broken = true;
}

console.log('');
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 || broken ? 1 : 0);
