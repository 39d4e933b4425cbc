import { test, expect } from '@playwright/test';

// The built web app manifest has what an installed app needs on Android and iPhone: names,
// colors, standalone display, start URL inside the scope, PNG icons of the sizes Android asks
// for (192 and 512 px, W3C Web App Manifest and Chrome's install criteria; from memory) with a
// maskable one, and the iPhone's own tags (apple-touch-icon of 180 px, Apple's Safari web
// content guide; from memory).

/** Width and height from a PNG's IHDR chunk (PNG specification, section 11.2.2). */
function pngSize(bytes: Buffer): [number, number] {
  expect(bytes.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  expect(bytes.toString('ascii', 12, 16)).toBe('IHDR');
  return [bytes.readUInt32BE(16), bytes.readUInt32BE(20)];
}

type Icon = { src: string; sizes: string; type: string; purpose?: string };

test('the manifest names the app, its colors, display, start URL, scope and icons', async ({ page, request, baseURL }) => {
  await page.goto('/');
  const href = await page.locator('link[rel="manifest"]').getAttribute('href');
  const manifestUrl = new URL(href!, baseURL).href;
  const res = await request.get(manifestUrl);
  expect(res.ok()).toBe(true);
  const m = (await res.json()) as Record<string, unknown> & { icons: Icon[] };
  expect(m.name).toBe('Trialbook');
  expect(typeof m.short_name === 'string' && m.short_name.length > 0 && m.short_name.length <= 12).toBe(true); // fits under a home-screen icon (common practice)
  expect(m.display).toBe('standalone');
  for (const key of ['theme_color', 'background_color'] as const) expect(m[key]).toMatch(/^#[0-9a-f]{6}$/i);
  expect(m.theme_color).toBe(await page.locator('meta[name="theme-color"]').getAttribute('content'));
  const scope = new URL(m.scope as string, manifestUrl).href;
  const start = new URL(m.start_url as string, manifestUrl).href;
  expect(start.startsWith(scope)).toBe(true);
  expect(new URL(start).origin).toBe(new URL(baseURL!).origin);

  // Every icon is served with its type, and a PNG's pixels match its declared size.
  const png = m.icons.filter((i) => i.type === 'image/png');
  for (const icon of m.icons) {
    const r = await request.get(new URL(icon.src, manifestUrl).href);
    expect(r.ok(), icon.src).toBe(true);
    expect(r.headers()['content-type']).toContain(icon.type);
    if (icon.type === 'image/png') {
      const [w, h] = pngSize(await r.body());
      expect(`${w}x${h}`, icon.src).toBe(icon.sizes);
    }
  }
  const sizes = (purpose: string) => png.filter((i) => (i.purpose ?? 'any').split(' ').includes(purpose)).map((i) => i.sizes);
  expect(sizes('any')).toEqual(expect.arrayContaining(['192x192', '512x512']));
  expect(sizes('maskable')).toEqual(expect.arrayContaining(['512x512']));
});

test('the page carries the iPhone home-screen tags and its touch icon', async ({ page, request, baseURL }) => {
  await page.goto('/');
  await expect(page.locator('meta[name="apple-mobile-web-app-capable"]')).toHaveAttribute('content', 'yes');
  await expect(page.locator('meta[name="apple-mobile-web-app-title"]')).toHaveAttribute('content', 'Trialbook');
  await expect(page.locator('meta[name="apple-mobile-web-app-status-bar-style"]')).toHaveAttribute('content', /^(default|black|black-translucent)$/);
  const touch = await page.locator('link[rel="apple-touch-icon"]').getAttribute('href');
  const r = await request.get(new URL(touch!, baseURL).href);
  expect(r.ok()).toBe(true);
  const body = await r.body();
  expect(pngSize(body)).toEqual([180, 180]);
  // The iPhone shows transparency as black, so the touch icon must be opaque: test/tools/make-icons.test.ts checks every pixel.
  expect(touch).toBe('/icons/apple-touch-icon-180.png');
});
