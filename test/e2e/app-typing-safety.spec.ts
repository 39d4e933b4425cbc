import { test, expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync } from '../../src/io/backup/backup.ts';

// Typing is never lost and never silently chosen: two tabs on one run, the browser clearing the
// site's data under an open form, and a slipped digit in an actual setting.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const study = readBackupSync(fixtureText).payload.studies[0];
const runForm = (n: number) => `/#/study/${study.id}/run/${n}`;
const gloss = (page: Page) => page.getByRole('textbox', { name: 'Gloss reading' });
const kept = 'Not saved yet (typing kept as a draft)';

test('two tabs on one run: a save in the first keeps the second tab\'s typing, and both saves are kept as changed in two places', async ({ page, context }) => {
  await page.goto(runForm(3));
  await expect(gloss(page)).toBeVisible();
  const other = await context.newPage();
  await other.goto(runForm(3));
  await gloss(page).fill('75.1');
  await expect(page.getByRole('status')).toHaveText(kept);
  await gloss(other).fill('76.2');
  await expect(other.getByRole('status')).toHaveText(kept);
  // The first tab types last, so the run's one draft holds its typing when it saves.
  await page.getByRole('textbox', { name: 'Notes' }).fill('first tab');
  await expect(page.getByRole('status')).toHaveText(kept);
  await page.getByRole('button', { name: 'Save run 3' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 3');

  // The second tab's typing comes back after its reload.
  await other.reload();
  await expect(gloss(other)).toHaveValue('76.2');
  await expect(other.getByText('Your earlier typing was kept and is back. It is not saved yet.')).toBeVisible();
  await other.getByRole('button', { name: 'Save run 3' }).click();
  await expect(other.getByRole('status')).toHaveText('Saved ✓ run 3');
  await expect(other.getByText('This run was changed elsewhere after the form opened. Both revisions are kept in its history.')).toBeVisible();

  // The run has two current revisions: marked on the form with both values, and on the sheet.
  await other.reload();
  const note = other.getByRole('group', { name: 'Run 3 has 2 current revisions' });
  await expect(note).toContainText('changed in two places on one device');
  await expect(note).toContainText('Gloss 76.2 GU');
  await expect(note).toContainText('Gloss 75.1 GU');
  await other.getByRole('button', { name: /History/ }).click();
  await expect(other.getByText('Changed in two places on this device (two tabs or windows) from the same revision; both kept.').first()).toBeVisible();
  await expect(other.getByText('Changed on two devices')).toHaveCount(0);
  await other.getByRole('button', { name: 'Back to the form' }).click();

  await page.goto(`/#/study/${study.id}`);
  const card = page.locator('.run-card[data-run="3"]');
  await expect(card.getByRole('group', { name: 'Run 3 has 2 current revisions' })).toContainText('Gloss 75.1 GU');

  // Keeping one on the phone makes it a new revision; the mark goes, every revision stays.
  const usedNow = await note.locator('li').first().textContent();
  const keepOther = usedNow!.includes('76.2') ? '75.1' : '76.2';
  await note.getByRole('button', { name: 'Keep this one instead' }).click();
  await expect(other.getByRole('group', { name: /current revisions/ })).toHaveCount(0);
  await expect(gloss(other)).toHaveValue(keepOther);
  await expect(other.getByText('4 revisions kept')).toBeVisible();
});

test('three tabs on one run: each keeps its own typing across reloads, none takes over another\'s, and a form says which typing waits elsewhere', async ({ page, context }) => {
  const tabs = [page, await context.newPage(), await context.newPage()];
  const typed = ['75.1', '76.2', '77.3'];
  for (const tab of tabs) {
    await tab.goto(runForm(5));
    await expect(gloss(tab)).toBeVisible();
  }
  // Each tab types; the third tab types last (it took over the second tab's draft before).
  for (const [i, tab] of tabs.entries()) {
    await gloss(tab).fill(typed[i]);
    await expect(tab.getByRole('status')).toHaveText(kept);
  }
  // Tab 3 also changes a setting: the summary elsewhere names it, and only it of the settings.
  await tabs[2].getByRole('textbox', { name: 'Oven temperature' }).fill('183');
  await expect(tabs[2].getByRole('status')).toHaveText(kept);
  await tabs[0].getByRole('button', { name: 'Save run 5' }).click();
  await expect(tabs[0].getByRole('status')).toHaveText('Saved ✓ run 5');

  // A reload of tab 2 finds tab 2's typing (not tab 3's), and says tab 3's typing waits.
  await tabs[1].reload();
  await expect(gloss(tabs[1])).toHaveValue('76.2');
  await expect(tabs[1].getByText('Your earlier typing was kept and is back. It is not saved yet.')).toBeVisible();
  const waiting2 = tabs[1].getByRole('group', { name: 'Typing from another tab' });
  await expect(waiting2).toContainText('Gloss: 77.3');
  await expect(waiting2).toContainText('Oven temperature: 183 °C');
  await expect(waiting2).not.toContainText('Line speed');
  await expect(waiting2).not.toContainText('76.2');
  // Taking other typing would replace this form's own: it waits for a save or a discard.
  await expect(waiting2.getByRole('button', { name: 'Use this typing here' })).toBeDisabled();
  await tabs[1].getByRole('button', { name: 'Save run 5' }).click();
  await expect(tabs[1].getByRole('status')).toHaveText('Saved ✓ run 5');

  // Tab 3's typing is still its own after a reload.
  await tabs[2].reload();
  await expect(gloss(tabs[2])).toHaveValue('77.3');
  await expect(tabs[2].getByRole('group', { name: /Typing from/ })).toHaveCount(0);

  // A fourth tab opens the saved run, is told of tab 3's typing, and the person picks it.
  const fourth = await context.newPage();
  await fourth.goto(runForm(5));
  const waiting4 = fourth.getByRole('group', { name: 'Typing from another tab' });
  await expect(waiting4).toContainText('Gloss: 77.3');
  await expect(gloss(fourth)).not.toHaveValue('77.3');
  await waiting4.getByRole('button', { name: 'Use this typing here' }).click();
  await expect(gloss(fourth)).toHaveValue('77.3');
  await expect(fourth.getByRole('status')).toHaveText(kept);
  await expect(fourth.getByRole('group', { name: /Typing from/ })).toHaveCount(0);
  // Tab 3 still holds its typing: nothing was taken away from it.
  await tabs[2].reload();
  await expect(gloss(tabs[2])).toHaveValue('77.3');
  // Pictures to look at, when asked for (TRIALBOOK_SHOTS names a folder outside the repository).
  const shots = process.env.TRIALBOOK_SHOTS;
  for (const [w, h] of shots ? ([[390, 844], [360, 740]] as const) : []) {
    await tabs[1].setViewportSize({ width: w, height: h });
    await tabs[1].goto(runForm(5));
    await tabs[1].getByRole('group', { name: /Typing from/ }).scrollIntoViewIfNeeded();
    await tabs[1].screenshot({ path: `${shots}/other-typing-${w}.png` });
  }
});

test('the browser clearing the site\'s data under an open form: said plainly, typing kept on screen and downloadable, no demo seeded again', async ({ page, context, baseURL }) => {
  await page.goto(runForm(3));
  await gloss(page).fill('75.1');
  await expect(page.getByRole('status')).toHaveText(kept);

  const cdp = await context.newCDPSession(page);
  await cdp.send('Storage.clearDataForOrigin', { origin: new URL(baseURL!).origin, storageTypes: 'all' });

  const alert = page.locator('.records-gone');
  await expect(alert).toContainText("The browser removed this device's Trialbook records");
  await expect(page.getByText('updated in another tab')).toHaveCount(0);
  await expect(page.getByRole('status')).not.toHaveText(kept);
  await expect(gloss(page)).toHaveValue('75.1');
  // More typing stays on screen; nothing claims it is kept as a draft.
  await page.getByRole('textbox', { name: 'Notes' }).fill('typed after the clearing');
  await expect(page.getByRole('status')).not.toHaveText(kept);
  await expect(page.getByText('Export a backup now')).toHaveCount(0);

  const [download] = await Promise.all([page.waitForEvent('download'), alert.getByRole('button', { name: 'Download what is on this screen' }).click()]);
  expect(download.suggestedFilename()).toMatch(/^trialbook-typing-invented-demo-powder-coating-cure-trial-run-3\.json$/);
  const typed = JSON.parse(readFileSync((await download.path())!, 'utf8'));
  expect(typed.run).toBe(3);
  expect(typed.notes).toBe('typed after the clearing');
  expect(typed.readings.find((r: { response: string }) => r.response === 'Gloss').readings).toBe('75.1');
  expect(Object.keys(typed)).not.toContain('payload'); // only what is on screen, not the study's records

  // After a reload the empty store is not taken for a first start.
  await page.goto('/');
  await expect(page.getByText("The browser removed this device's Trialbook records: this device held studies before")).toBeVisible();
  await expect(page.getByRole('link', { name: `Open ${study.title}` })).toHaveCount(0);
});

test('an actual setting far outside the planned range: strong warning naming the run, a question before saving, marked on the sheet and in the analysis', async ({ page }) => {
  await page.goto(runForm(3));
  const temp = page.getByRole('textbox', { name: 'Oven temperature' });
  await temp.fill('1600');
  // (1600 - 180) / 20 = 71 coded units (by hand, range 160 to 200).
  const warning = 'Run 3: Oven temperature 1600 °C is far outside the planned range 160 to 200 °C (coded 71); check it for a typing slip';
  await expect(page.locator('.far-outside')).toContainText(warning);
  await page.getByRole('button', { name: 'Save run 3' }).click();
  const ask = page.getByRole('alertdialog', { name: 'Save a setting far outside the plan?' });
  await expect(ask).toContainText(warning);
  await expect(ask).toBeInViewport();
  await expect(page.getByRole('status')).not.toContainText('Saved');
  await ask.getByRole('button', { name: 'Correct it' }).click();
  await expect(ask).toHaveCount(0);
  // Back at the setting in question, ready to be typed again.
  await expect(temp).toBeFocused();
  await expect(temp).toBeInViewport();
  await expect(page.getByRole('status')).not.toContainText('Saved');
  await page.reload();
  await expect(page.getByText('1 revision kept')).toBeVisible(); // nothing was saved

  await page.getByRole('button', { name: 'Save run 3' }).click();
  await page.getByRole('alertdialog').getByRole('button', { name: /Yes, it was run at this setting/ }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 3');

  await page.goto(`/#/study/${study.id}`);
  await expect(page.locator('.run-card[data-run="3"] .far-note')).toContainText(warning);
  await page.goto(`/#/study/${study.id}/analysis`);
  await expect(page.locator('.warnings')).toContainText(warning);
});

test('a history of 2,500 revisions opens in pages of the newest, and older pages come on request', async ({ page }) => {
  const { writeBackup } = await import('../../src/io/backup/backup.ts');
  const { randomUUID } = await import('node:crypto');
  const backup = readBackupSync(fixtureText);
  const first = backup.payload.revisions.find((r) => r.plannedRun === 3)!;
  const revisions = [...backup.payload.revisions];
  let prev = first;
  for (let i = 1; i < 2500; i++) {
    // Invented edits: the gloss reading stepped by 0.1 each time.
    const next = { ...prev, id: randomUUID(), rev: prev.rev + 1, parents: [prev.id], restoredFrom: null, readings: [prev.readings[0], [Math.round((70 + i * 0.1) * 10) / 10]] };
    revisions.push(next);
    prev = next;
  }
  const text = await writeBackup({ studies: backup.payload.studies, revisions }, { device: backup.device, exportedAt: backup.exportedAt, scope: 'all' });
  await page.route('**/demo-study.json', (route) => route.fulfill({ status: 200, contentType: 'application/json', body: text }));
  await page.goto(runForm(3));
  await expect(page.getByText('2500 revisions kept')).toBeVisible({ timeout: 20_000 });
  const started = Date.now();
  await page.getByRole('button', { name: 'History (2500 revisions)' }).click();
  await expect(page.locator('.history-item')).toHaveCount(20);
  const opened = Date.now() - started;
  await expect(page.locator('.history-item').first()).toHaveAttribute('data-revision', '2500');
  await page.getByRole('button', { name: 'Show 20 older revisions (2480 not shown)' }).click();
  await expect(page.locator('.history-item')).toHaveCount(40);
  await expect(page.locator('.history-item').last()).toHaveAttribute('data-revision', '2461');
  const back = Date.now();
  await page.getByRole('button', { name: 'Back to the form' }).click();
  await expect(gloss(page)).toBeVisible();
  // A figure, never a pass mark (timings on a shared machine).
  console.log(`history of 2500 revisions: opened in ${opened} ms, back to the form in ${Date.now() - back} ms`);
});

test('an import is read, checked and merged in a worker: it names a run edited on two devices, and a file above the size limit is refused unread', async ({ page }) => {
  const { writeBackup } = await import('../../src/io/backup/backup.ts');
  const { MAX_BACKUP_BYTES } = await import('../../src/io/backup/size-limit.ts');
  const { mkdtempSync, rmSync, openSync, ftruncateSync, closeSync } = await import('node:fs');
  const { tmpdir } = await import('node:os');
  const { join } = await import('node:path');
  const backup = readBackupSync(fixtureText);
  const first = backup.payload.revisions.find((r) => r.plannedRun === 3)!;
  // Invented edits of run 3 on two devices from its first revision.
  const editA = { ...first, id: '00000000-0000-4000-8000-00000000000a', rev: 2, device: '00000000-0000-4000-8000-0000000000d1', parents: [first.id], readings: [[68.7], [75.5]] };
  const editB = { ...first, id: '00000000-0000-4000-8000-00000000000b', rev: 2, device: '00000000-0000-4000-8000-0000000000d2', parents: [first.id], readings: [[68.7], [71.9]] };
  const text = await writeBackup({ studies: backup.payload.studies, revisions: [...backup.payload.revisions, editA, editB] }, { device: backup.device, exportedAt: backup.exportedAt, scope: 'all' });

  const workers: string[] = [];
  page.on('worker', (w) => workers.push(w.url()));
  await page.goto('/#/export');
  await expect(page.locator('.card')).toHaveCount(1);
  await page.locator('input[type="file"]').setInputFiles({ name: 'two-devices.json', mimeType: 'application/json', buffer: Buffer.from(text) });
  await expect(page.getByRole('status')).toContainText(`1 run was changed on two devices; both revisions are kept in its history: run 3 of "${study.title}"`);
  expect(workers.some((u) => /import-worker/.test(u))).toBe(true);
  await page.goto(`/#/study/${study.id}`);
  await expect(page.locator('.run-card[data-run="3"]').getByRole('group', { name: 'Run 3 has 2 current revisions' })).toContainText('Gloss 75.5 GU');
  await page.goto(`/#/study/${study.id}/analysis`);
  await expect(page.locator('.warnings')).toContainText('Run 3 has 2 current revisions');

  // A sparse file one byte above the limit: refused by its size, before any of it is read.
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-big-'));
  try {
    const big = join(dir, 'too-big.json');
    const fd = openSync(big, 'w');
    ftruncateSync(fd, MAX_BACKUP_BYTES + 1);
    closeSync(fd);
    await page.goto('/#/export');
    workers.length = 0;
    await page.locator('input[type="file"]').setInputFiles(big);
    await expect(page.getByRole('alert')).toContainText('This backup file is 128.0 MB; Trialbook reads backups of up to 128 MB (134,217,728 bytes)');
    expect(workers).toEqual([]);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
