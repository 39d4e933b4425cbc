/**
 * Time to write the CSV export of a study with 10,000 logged runs, in Chromium (the phone's
 * engine): studyCsv and the benchmark's invented runs (csv-runs.ts, the same as the Node figure of
 * csv-export.ts), bundled by Vite for a blank page. Prints the median and spread over 21 exports
 * after 3 warm-up ones; asserts nothing about time.
 */
import { test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';

const TARGET_MS = 300;
const RUNS = 10_000;
const WARMUP = 3;
const ROUNDS = 21;

test('CSV export of 10,000 runs in Chromium', async ({ page }) => {
  test.setTimeout(180_000);
  const out = await build({
    configFile: false,
    logLevel: 'silent',
    build: { write: false, minify: true, lib: { entry: fileURLToPath(new URL('./csv-export-page.ts', import.meta.url)), formats: ['iife'], name: 'csvBenchPage' } },
  });
  const chunk = (Array.isArray(out) ? out[0] : out) as { output: { type: string; code?: string }[] };
  const code = chunk.output.find((o) => o.type === 'chunk')!.code!;
  const backup = JSON.parse(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8'));
  const study = backup.payload.studies[0];
  await page.setContent('<!doctype html><title>CSV export benchmark</title>');
  await page.addScriptTag({ content: code });
  const r = await page.evaluate(
    ([s, n, w, k]) => (globalThis as unknown as { csvBench: (...a: unknown[]) => { times: number[]; chars: number } }).csvBench(s, n, w, k),
    [study, RUNS, WARMUP, ROUNDS] as const,
  );
  const t = [...r.times].sort((a, b) => a - b);
  const q = (f: number) => t[Math.round((t.length - 1) * f)];
  const ms = (x: number) => `${x.toFixed(1)} ms`;
  console.log(
    [
      `CSV export benchmark (Chromium, studyCsv bundled for a blank page, ${RUNS} invented logged runs over ${study.design.runs.length} planned runs)`,
      `  export ${RUNS} runs: median ${ms(q(0.5))} (target at most ${TARGET_MS} ms), quartiles ${ms(q(0.25))} to ${ms(q(0.75))}, min ${ms(t[0])}, max ${ms(t[t.length - 1])} over ${ROUNDS} exports; ${(r.chars / 1e6).toFixed(2)} M characters`,
    ].join('\n'),
  );
});
