import { mkdirSync, writeFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiAs } from '../support/api-client';
import { PHONE, WIDE, openBrowser, signInAsDemo } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });

async function startHunt(page: Page, title: string): Promise<void> {
  await page.getByTestId('hunt-chooser').waitFor();
  await page.getByTestId('hunt-title').fill(title);
  await page.getByTestId('hunt-source').fill('Larkspur Valley CU, Mill Street branch');
  await page.getByTestId('start-hunt').click();
  await page.getByTestId('keypad').waitFor();
  await expect.poll(() => page.getByTestId('strap-progress').textContent()).toMatch(/strap 1 · 0 of 100/);
}

async function tapSerial(page: Page, digits: string): Promise<void> {
  for (const digit of digits) await page.getByTestId(`key-${digit}`).click();
}

async function huntIdByTitle(call: Awaited<ReturnType<typeof apiAs>>, title: string): Promise<string> {
  const { body } = await call<{ items: { id: string; title: string }[] }>('/hunts?limit=200');
  const hunt = body.items.find((item) => item.title === title);
  if (!hunt) throw new Error(`hunt ${title} not found`);
  return hunt.id;
}

describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('Sift on a %s screen', (name, viewport) => {
  it('when notes are typed on the keys and the keyboard, logged, and some logged offline across a reload, then the server holds each exactly once', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    const title = `Sift check ${name} ${Date.now()}`;
    try {
      await signInAsDemo(page);
      const switcher = page.getByTestId('switch-hunt');
      if (await switcher.isVisible().catch(() => false)) await switcher.click();
      await startHunt(page, title);

      // On-screen keys: a radar.
      await tapSerial(page, '12344321');
      await page.getByLabel('Pattern: radar').waitFor();
      await page.screenshot({ path: `test-results/screenshots/sift-radar-${name}.png` });
      await page.getByTestId('key-log').click();

      // Hardware keyboard: one digit from a binary.
      await page.keyboard.type('55155516');
      const misses = page.getByTestId('reading-near-misses');
      await misses.waitFor();
      await expect(misses.textContent()).resolves.toMatch(/one digit from a binary: 8th → [15]/);
      await page.screenshot({ path: `test-results/screenshots/sift-near-miss-${name}.png` });
      await page.keyboard.press('Enter');

      for (const serial of ['31740598', '20481357', '66120934']) {
        await page.keyboard.type(serial);
        await page.keyboard.press('Enter');
      }
      await expect.poll(() => page.getByTestId('strap-progress').textContent()).toMatch(/strap 1 · 5 of 100/);

      // The network goes away: three more notes, then a reload while still offline.
      await page.route('**/api/**', (route) => route.abort('internetdisconnected'));
      for (const serial of ['70707070', '19283746', '88812345']) {
        await page.keyboard.type(serial);
        await page.keyboard.press('Enter');
      }
      await page.getByTestId('sync-text').filter({ hasText: /waiting|Offline|Saving/ }).waitFor();
      await page.reload();
      await page.getByTestId('keypad').waitFor();
      await expect.poll(() => page.getByTestId('strap-progress').textContent()).toMatch(/strap 1 · 8 of 100/);
      await page.screenshot({ path: `test-results/screenshots/sift-offline-${name}.png` });

      await page.unroute('**/api/**');
      await page.getByTestId('sync-badge').click();
      await page.getByTestId('sync-text').filter({ hasText: 'All saved' }).waitFor({ timeout: 30_000 });

      const call = await apiAs('demo@strapsift.test', 'sift-demo-2026');
      const huntId = await huntIdByTitle(call, title);
      const { body } = await call<{ items: { digits: string }[] }>(`/hunts/${huntId}/scans?limit=200`);
      expect(body.items.map((scan) => scan.digits).sort()).toEqual(
        ['12344321', '55155516', '31740598', '20481357', '66120934', '70707070', '19283746', '88812345'].sort(),
      );
    } finally {
      await browser.close();
    }
  });

  it('when the app was opened once and the device then goes offline, then a reload still types and reads a serial', async () => {
    const browser = await openBrowser(viewport);
    const { page, context } = browser;
    try {
      await signInAsDemo(page);
      // The worker installs on the first visit and controls the page from the next load on.
      await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
      await page.reload();
      await page.waitForFunction(() => navigator.serviceWorker.controller != null, null, { timeout: 30_000 });
      const switcher = page.getByTestId('switch-hunt');
      if (!(await switcher.isVisible().catch(() => false))) await startHunt(page, `Offline check ${name} ${Date.now()}`);

      await context.setOffline(true);
      await page.reload();
      await page.getByTestId('keypad').waitFor({ timeout: 30_000 });
      await page.keyboard.type('00000777');
      await page.getByLabel('Pattern: low').waitFor();
      await page.screenshot({ path: `test-results/screenshots/sift-cold-offline-${name}.png` });
      await context.setOffline(false);
    } finally {
      await browser.close();
    }
  });
});

describe('Sift paint timing', () => {
  it('when the eighth digit is pressed 100 times, then the median paint is within one 16 ms frame (figures saved for docs/PERFORMANCE.md)', async () => {
    const browser = await openBrowser(WIDE);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      const switcher = page.getByTestId('switch-hunt');
      if (!(await switcher.isVisible().catch(() => false))) await startHunt(page, `Timing ${Date.now()}`);
      await page.keyboard.type('1234432');
      const durations: number[] = [];
      for (let press = 0; press < 100; press++) {
        await page.keyboard.press(String(press % 10));
        await page.waitForFunction((n) => performance.getEntriesByName('sift:reading-painted').length >= n, press + 1);
        await page.keyboard.press('Backspace');
      }
      durations.push(...(await page.evaluate(() => performance.getEntriesByName('sift:reading-painted').map((entry) => entry.duration))));
      durations.sort((a, b) => a - b);
      const median = durations[Math.floor(durations.length / 2)];
      const p95 = durations[Math.floor(durations.length * 0.95)];
      writeFileSync('test-results/sift-paint.json', JSON.stringify({ presses: durations.length, medianMs: median, p95Ms: p95 }, null, 2));
      expect(durations).toHaveLength(100);
      // The budget in docs/PERFORMANCE.md: the reading paints within one 60 Hz frame (16 ms), at the median.
      expect(median).toBeGreaterThan(0);
      expect(median).toBeLessThanOrEqual(16);
    } finally {
      await browser.close();
    }
  });
});
