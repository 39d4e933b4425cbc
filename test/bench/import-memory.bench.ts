/**
 * Peak memory of the app while it imports a 120 MB backup, in Chromium, on the built app (INVENTED
 * data: test/bench/large-backup.ts, the app's own backup writer, so the file is valid and signed).
 * The import runs as a person starts it: the export screen's file picker, the import worker (read
 * in chunks, checked, merged into IndexedDB), until the screen names the file with its summary.
 * Two figures, sampled every 50 ms from outside the page so that a busy thread cannot hide a peak:
 * - the resident memory of the tab's renderer processes (Linux /proc/PID/status VmRSS), which hold
 *   the page and its dedicated worker: the figure a phone's memory limit meets (the kernel's VmHWM
 *   lags behind the samples here, so it is not used);
 * - the JavaScript heap of the page and of the import worker (DevTools protocol,
 *   Runtime.getHeapUsage on each target), each one's largest sample.
 * Each is printed beside the file size, as a multiple of it. Prints figures; asserts nothing about
 * memory or time (the import itself must succeed).
 */
import { test, expect, chromium } from '@playwright/test';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { benchBackup } from './large-backup.ts';

const TARGET_MB = 120;
const SAMPLE_MS = 50;

/** The file: revisions over 10 logged runs, their count scaled from a sample of 1,000 to TARGET_MB. */
async function backupOfSize(mb: number): Promise<string> {
  const sample = (await benchBackup(1000, 10)).length;
  return benchBackup(Math.round((mb * 2 ** 20 * 1000) / sample), 10);
}

function status(pid: number): string {
  try {
    return readFileSync(`/proc/${pid}/status`, 'utf8');
  } catch {
    return '';
  }
}
const kb = (text: string, field: string) => Number(new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(text)?.[1] ?? 0) * 1024;

/** The renderer processes of the browser whose command line names `profile` (its descendants with --type=renderer). */
function renderers(profile: string): number[] {
  const procs = readdirSync('/proc').filter((d) => /^\d+$/.test(d)).map(Number);
  const cmd = new Map<number, string>();
  const parent = new Map<number, number>();
  for (const pid of procs) {
    try {
      cmd.set(pid, readFileSync(`/proc/${pid}/cmdline`, 'utf8').replace(/\0/g, ' '));
      parent.set(pid, Number(/^PPid:\s+(\d+)/m.exec(status(pid))?.[1] ?? 0));
    } catch {
      // gone meanwhile
    }
  }
  const browser = procs.find((p) => (cmd.get(p) ?? '').includes(`--user-data-dir=${profile}`) && !(cmd.get(p) ?? '').includes('--type='));
  if (browser === undefined) return [];
  const isUnder = (p: number): boolean => {
    for (let q = parent.get(p); q !== undefined && q > 1; q = parent.get(q)) if (q === browser) return true;
    return false;
  };
  return procs.filter((p) => (cmd.get(p) ?? '').includes('--type=renderer') && isUnder(p));
}

test('peak memory of a 120 MB import', async ({ baseURL }, info) => {
  test.setTimeout(600_000);
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-import-bench-'));
  const profile = join(dir, 'profile');
  const file = join(dir, 'invented-bench-backup.json');
  const text = await backupOfSize(TARGET_MB);
  writeFileSync(file, text);
  const bytes = Buffer.byteLength(text);
  const use = info.project.use;
  const context = await chromium.launchPersistentContext(profile, { ...use.launchOptions, baseURL, viewport: use.viewport, deviceScaleFactor: use.deviceScaleFactor, isMobile: use.isMobile, hasTouch: use.hasTouch });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto('/#/export');
    await expect(page.getByText('Choose a backup file')).toBeVisible();
    const cdp = await context.newCDPSession(page);
    // The worker's own heap through the DevTools protocol (non-flat child sessions of the page's).
    let workerSession: string | null = null;
    const pending = new Map<number, (v: { usedSize: number }) => void>();
    let nextId = 1;
    cdp.on('Target.attachedToTarget', (e: { sessionId: string; targetInfo: { type: string } }) => {
      if (e.targetInfo.type === 'worker') workerSession = e.sessionId;
    });
    cdp.on('Target.receivedMessageFromTarget', (e: { message: string }) => {
      const m = JSON.parse(e.message) as { id?: number; result?: { usedSize: number } };
      if (m.id !== undefined && m.result) pending.get(m.id)?.(m.result), pending.delete(m.id);
    });
    const workerAttach = await cdp.send('Target.setAutoAttach', { autoAttach: true, waitForDebuggerOnStart: false, flatten: false }).then(() => true, () => false);
    const workerHeap = (): Promise<number | null> => {
      if (!workerSession) return Promise.resolve(null);
      const id = nextId++;
      return new Promise((resolve) => {
        pending.set(id, (r) => resolve(r.usedSize));
        void cdp.send('Target.sendMessageToTarget', { sessionId: workerSession!, message: JSON.stringify({ id, method: 'Runtime.getHeapUsage' }) }).catch(() => resolve(null));
        setTimeout(() => resolve(null), 2000);
      });
    };

    await cdp.send('HeapProfiler.collectGarbage');
    const pids = renderers(profile);
    const rssBefore = pids.reduce((s, p) => s + kb(status(p), 'VmRSS'), 0);
    let pageHeapPeak = 0;
    let workerHeapPeak = 0;
    let rssPeak = 0;
    let running = true;
    const sampler = (async () => {
      while (running) {
        const [ph, wh] = await Promise.all([cdp.send('Runtime.getHeapUsage').then((r) => r.usedSize, () => 0), workerHeap()]);
        pageHeapPeak = Math.max(pageHeapPeak, ph);
        workerHeapPeak = Math.max(workerHeapPeak, wh ?? 0);
        rssPeak = Math.max(rssPeak, pids.reduce((s, p) => s + kb(status(p), 'VmRSS'), 0));
        await new Promise((r) => setTimeout(r, SAMPLE_MS));
      }
    })();
    const t0 = Date.now();
    await page.locator('input[type="file"]').setInputFiles(file);
    await expect(page.getByText('invented-bench-backup.json:')).toBeVisible({ timeout: 540_000 });
    const seconds = (Date.now() - t0) / 1000;
    running = false;
    await sampler;
    const mb = (x: number) => `${(x / 2 ** 20).toFixed(0)} MB`;
    const times = (x: number) => `${(x / bytes).toFixed(1)}x the file`;
    console.log(
      [
        `import memory benchmark (Chromium, built app, export screen's file picker and the import worker; INVENTED ${mb(bytes)} backup)`,
        `  import to the screen's summary: ${seconds.toFixed(1)} s`,
        `  renderer resident memory (${pids.length} process${pids.length === 1 ? '' : 'es'}): before ${mb(rssBefore)}; largest sample ${mb(rssPeak)}, ${mb(rssPeak - rssBefore)} above before = ${times(rssPeak - rssBefore)}`,
        `  JavaScript heap, largest sample: page ${mb(pageHeapPeak)}; import worker ${workerAttach && workerHeapPeak > 0 ? `${mb(workerHeapPeak)} = ${times(workerHeapPeak)}` : 'not reachable through the DevTools protocol'}`,
      ].join('\n'),
    );
  } finally {
    await context.close();
    rmSync(dir, { recursive: true, force: true });
  }
});
