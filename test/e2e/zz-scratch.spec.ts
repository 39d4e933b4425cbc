import { test } from '@playwright/test';
test('scratch quota', async ({ page, context, baseURL }) => {
  await page.goto('/harness/');
  const origin = new URL(baseURL!).origin;
  const cdp = await context.newCDPSession(page);
  console.log(await page.evaluate(() => navigator.storage.estimate()));
  for (const o of [origin + '/', origin]) {
    const res = await cdp.send('Storage.overrideQuotaForOrigin', { origin: o, quotaSize: 1 }).catch((e) => String(e));
    console.log(o, res, await page.evaluate(() => navigator.storage.estimate()));
  }
  const b = await context.browser()!.newBrowserCDPSession();
  console.log(await b.send('Storage.overrideQuotaForOrigin', { origin, quotaSize: 1 } as never).catch((e) => String(e)));
  console.log('browser', await page.evaluate(() => navigator.storage.estimate()));
  const r = await page.evaluate(async () => {
    const out: string[] = [];
    for (const size of [10, 1000, 100000, 5000000]) {
      out.push(await new Promise<string>((resolve) => {
        const req = indexedDB.open('scratch', 1);
        req.onupgradeneeded = () => req.result.createObjectStore('s');
        req.onsuccess = () => {
          const db = req.result;
          const tx = db.transaction('s', 'readwrite', { durability: 'strict' });
          tx.objectStore('s').put('x'.repeat(size), 'k' + size);
          tx.oncomplete = () => (db.close(), resolve(size + ' ok'));
          tx.onabort = () => (db.close(), resolve(size + ' abort ' + tx.error?.name));
        };
      }));
    }
    return out;
  });
  console.log(r);
});
