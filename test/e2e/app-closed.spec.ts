import { test, expect, type Page } from '@playwright/test';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';

// Closed and honest: the deployed folder holds the app and nothing else; the page's content
// security policy is in force; a whole working session (plan, log, analyze, predict, export,
// import) asks nothing of any other origin and breaks no rule of the policy.
const dist = fileURLToPath(new URL('../../dist/', import.meta.url));

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => (statSync(join(dir, name)).isDirectory() ? files(join(dir, name)) : [relative(dist, join(dir, name))]));
}

/** The directives the policy must hold at least (the list), each with its sources. */
const REQUIRED: Record<string, string[]> = {
  'default-src': ["'self'"],
  'script-src': ["'self'"],
  'style-src': ["'self'"],
  'img-src': ["'self'", 'data:', 'blob:'],
  'connect-src': ["'self'"],
  'worker-src': ["'self'"],
  'manifest-src': ["'self'"],
  'object-src': ["'none'"],
  'base-uri': ["'self'"],
  'form-action': ["'self'"],
};

function policyOf(html: string): Map<string, string[]> {
  const m = html.match(/<meta\s+http-equiv="Content-Security-Policy"\s+content="([^"]+)"/);
  expect(m, 'a Content-Security-Policy meta element in index.html').not.toBeNull();
  return new Map(m![1].split(';').map((d) => d.trim().split(/\s+/)).filter((p) => p[0] !== '').map(([name, ...sources]) => [name, sources]));
}

test('the deployed folder holds the app only: no store test page, no source maps', () => {
  const all = files(dist);
  expect(all).toContain('index.html');
  expect(all).toContain('sw.js');
  expect(all.filter((f) => /harness/i.test(f))).toEqual([]);
  expect(all.filter((f) => f.endsWith('.map'))).toEqual([]);
  for (const f of all.filter((f) => f.endsWith('.js'))) expect(readFileSync(join(dist, f), 'utf8'), f).not.toMatch(/sourceMappingURL=/);
  // The service worker precaches exactly the deployed files it serves, none of them the test page.
  const sw = readFileSync(join(dist, 'sw.js'), 'utf8');
  const precached = [...sw.matchAll(/url:"([^"]+)"/g)].map((m) => m[1]);
  expect(precached.length).toBeGreaterThan(5);
  for (const url of precached) expect(existsSync(join(dist, url)), url).toBe(true);
  expect(precached.filter((u) => /harness/i.test(u))).toEqual([]);
});

test('index.html carries the content security policy and no inline script', () => {
  const html = readFileSync(join(dist, 'index.html'), 'utf8');
  const policy = policyOf(html);
  for (const [name, sources] of Object.entries(REQUIRED)) expect(policy.get(name), name).toEqual(sources);
  for (const sources of policy.values()) expect(sources.filter((s) => /unsafe|\*|^https?:$/.test(s))).toEqual([]);
  const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/g)];
  expect(scripts.length).toBeGreaterThan(0);
  for (const [, attrs, body] of scripts) {
    expect(attrs).toMatch(/\bsrc="\/assets\/[^"]+\.js"/);
    expect(body.trim()).toBe('');
  }
  expect(html).not.toMatch(/\son[a-z]+=/i); // no inline event handlers
  expect(html).not.toMatch(/<style\b|\sstyle=/i); // no inline styles
});

test('the policy is in force: an injected inline script, an inline style and a request to another origin are all blocked', async ({ page, baseURL }) => {
  const violations: string[] = [];
  await page.exposeBinding('reportViolation', (_s, v: string) => void violations.push(v));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => (window as unknown as { reportViolation(v: string): void }).reportViolation(e.effectiveDirective));
  });
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(/Trialbook/);
  // The app itself ran (its script is 'self') without one violation.
  expect(violations).toEqual([]);

  const ran = await page.evaluate(async () => {
    const w = window as unknown as { inlineRan?: boolean };
    const s = document.createElement('script');
    s.textContent = 'window.inlineRan = true';
    document.head.append(s);
    const box = document.createElement('div');
    box.innerHTML = '<p id="styled" style="color: rgb(255, 0, 0)">x</p>';
    document.body.append(box);
    await new Promise((r) => setTimeout(r, 50));
    return { inline: w.inlineRan === true, color: getComputedStyle(document.getElementById('styled')!).color };
  });
  expect(ran.inline).toBe(false);
  expect(ran.color).not.toBe('rgb(255, 0, 0)');
  // Another origin: the same server under another address, so only the policy can refuse it.
  const other = baseURL!.replace('127.0.0.1', 'localhost');
  const fetched = await page.evaluate((url) => fetch(url).then(() => 'answered', () => 'refused'), `${other}/manifest.webmanifest`);
  expect(fetched).toBe('refused');
  await expect.poll(() => [...new Set(violations)].sort()).toEqual(['connect-src', 'script-src-elem', 'style-src-attr']);
});

async function phoneSession(page: Page) {
  // Plan a study: two factors, full factorial of four runs.
  await page.getByRole('link', { name: 'Plan a new study' }).click();
  await page.getByLabel('Title', { exact: true }).fill('Origin check trial (invented)');
  await page.getByLabel('Factor A name').fill('Pressure');
  await page.getByLabel('Factor A low').fill('2');
  await page.getByLabel('Factor A high').fill('3');
  await page.getByLabel('Factor B name').fill('Time');
  await page.getByLabel('Factor B low').fill('10');
  await page.getByLabel('Factor B high').fill('20');
  await page.getByLabel('Response 1 name').fill('Thickness');
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page.locator('.run-card')).toHaveCount(4);
  // Log a run.
  await page.locator('.run-card[data-run="1"]').getByRole('link', { name: 'Log run 1' }).click();
  await page.getByRole('textbox', { name: 'Thickness reading' }).fill('70.5');
  await page.getByRole('button', { name: 'Save run 1' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 1');
  // Analyze the demo study, with its charts.
  await page.goto('/');
  await page.getByRole('link', { name: 'Open Invented demo: powder-coating cure trial' }).click();
  const studyUrl = page.url();
  await page.goto(`${studyUrl}/analysis`);
  await expect(page.getByRole('list', { name: 'Effects on Film thickness' }).locator('li').first()).toBeVisible();
  await expect(page.getByRole('img', { name: /Residual against run order/ }).locator('canvas').first()).toBeVisible();
  // Predict.
  await page.goto(`${studyUrl}/predict`);
  await expect(page.getByTestId('predicted-value')).toHaveText(/µm$/);
  // Export both files, then import the backup again.
  await page.goto(`${studyUrl}/export`);
  const [json] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download backup (JSON)' }).click()]);
  const [csv] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
  expect(readFileSync((await csv.path())!, 'utf8')).toContain('Oven temperature (°C) actual');
  await page.goto('/#/export');
  await page.locator('input[type="file"]').setInputFiles({ name: 'again.json', mimeType: 'application/json', buffer: readFileSync((await json.path())!) });
  await expect(page.getByRole('status')).toContainText('Nothing new');
}

test('a whole session (plan, log, analyze, predict, export, import) stays on the origin', async ({ page, context, baseURL }) => {
  const origin = new URL(baseURL!).origin;
  const requests: string[] = [];
  // Every request of the context: the page's, and the service worker's own fetches.
  let fromWorker = 0;
  context.on('request', (r) => {
    requests.push(r.url());
    if (r.serviceWorker()) fromWorker++;
  });
  const violations: string[] = [];
  await page.exposeBinding('reportViolation', (_s, v: string) => void violations.push(v));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => (window as unknown as { reportViolation(v: string): void }).reportViolation(`${e.effectiveDirective} ${e.blockedURI}`));
  });
  await page.goto('/');
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 10_000 });
  await phoneSession(page);

  expect(requests.length).toBeGreaterThan(10);
  expect(fromWorker, 'the service worker\'s own fetches are recorded too').toBeGreaterThan(0);
  const away = requests.filter((u) => !u.startsWith('blob:') && !u.startsWith('data:') && new URL(u).origin !== origin);
  expect(away).toEqual([]);
  expect(violations).toEqual([]);
});
