// Lighthouse (12, pinned in package.json) on the built app in its default mobile mode
// (simulated slow 4G and a 4x slower CPU), in Debian's chromium, served from dist/ by
// `vite preview` as a person's static host would. Prints each run's figures and the medians
// beside the targets; asserts nothing (scores move a few points run to run).
//   npm run build && node test/bench/lighthouse.mjs [--runs N]   (port: TRIALBOOK_BENCH_PORT, else TRIALBOOK_TEST_PORT, else 4173)
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { findChromium } from '../tools/find-chromium.mjs';

const repo = fileURLToPath(new URL('../..', import.meta.url));
const runsArg = process.argv.indexOf('--runs');
const RUNS = runsArg > 0 ? Number(process.argv[runsArg + 1]) : 5;
if (!Number.isInteger(RUNS) || RUNS < 1 || RUNS > 50) {
  console.error(`lighthouse: --runs needs a whole number from 1 to 50, got "${process.argv[runsArg + 1]}"`);
  process.exit(2);
}
const PORT = Number(process.env.TRIALBOOK_BENCH_PORT ?? process.env.TRIALBOOK_TEST_PORT ?? 4173);
if (!existsSync(`${repo}dist/index.html`)) {
  console.error('lighthouse: needs the built app in dist/ (run npm run build first)');
  process.exit(2);
}
const chromePath = findChromium();
if (!chromePath) {
  console.error('lighthouse: needs Chromium (set CHROME_PATH, or install Debian\'s chromium package)');
  process.exit(2);
}

const server = spawn('node_modules/.bin/vite', ['preview', '--host', '127.0.0.1', '--port', String(PORT), '--strictPort'], { cwd: repo, stdio: ['ignore', 'pipe', 'inherit'] });
const url = `http://127.0.0.1:${PORT}/`;

async function waitForServer() {
  for (let i = 0; i < 100; i++) {
    if (server.exitCode !== null) throw new Error(`vite preview stopped (exit ${server.exitCode}); is port ${PORT} in use?`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`vite preview did not answer at ${url}`);
}

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

let chrome;
try {
  await waitForServer();
  chrome = await chromeLauncher.launch({
    chromePath,
    chromeFlags: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const rows = [];
  let version = '';
  for (let i = 0; i < RUNS; i++) {
    const { lhr } = await lighthouse(url, { port: chrome.port, output: 'json', logLevel: 'error', onlyCategories: ['performance'] });
    if (lhr.runtimeError) throw new Error(`Lighthouse: ${lhr.runtimeError.code}: ${lhr.runtimeError.message}`);
    const a = lhr.audits;
    version = lhr.lighthouseVersion;
    rows.push({
      perf: Math.round(lhr.categories.performance.score * 100),
      lcp: a['largest-contentful-paint'].numericValue,
      tbt: a['total-blocking-time'].numericValue,
      cls: a['cumulative-layout-shift'].numericValue,
      fcp: a['first-contentful-paint'].numericValue,
    });
    const r = rows[i];
    console.log(`  run ${i + 1}: performance ${r.perf}, LCP ${(r.lcp / 1000).toFixed(2)} s, TBT ${r.tbt.toFixed(0)} ms, CLS ${r.cls.toFixed(3)}, FCP ${(r.fcp / 1000).toFixed(2)} s`);
  }
  const m = (k) => median(rows.map((r) => r[k]));
  console.log(
    [
      `Lighthouse ${version} mobile (simulated throttling), built app at ${url}, median of ${RUNS} runs:`,
      `  performance ${m('perf')}   (target at least 98)`,
      `  largest contentful paint ${(m('lcp') / 1000).toFixed(2)} s   (target at most 1.5 s)`,
      `  total blocking time ${m('tbt').toFixed(0)} ms   (target at most 50 ms)`,
      `  cumulative layout shift ${m('cls').toFixed(3)}   (target 0)`,
      `  first contentful paint ${(m('fcp') / 1000).toFixed(2)} s`,
    ].join('\n'),
  );
} finally {
  await chrome?.kill();
  server.kill();
}
