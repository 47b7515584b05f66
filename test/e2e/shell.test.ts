import { mkdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { PHONE, WIDE, baseUrl, openBrowser, signInAsDemo } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });

describe('the app shell in Chromium', () => {
  it('when a phone (390×844) signs in with the demo collector, then the five tabs sit in a bottom bar', async () => {
    const browser = await openBrowser(PHONE);
    try {
      await signInAsDemo(browser.page);
      const bar = browser.page.getByTestId('tab-bar');
      await bar.waitFor();
      for (const tab of ['sift', 'hunts', 'keepers', 'odds', 'you']) {
        await expect(browser.page.getByTestId(`tab-${tab}`).isVisible()).resolves.toBe(true);
      }
      const box = await bar.boundingBox();
      expect(box?.y ?? 0).toBeGreaterThan(PHONE.height - 120);
      expect(await browser.page.getByTestId('side-rail').count()).toBe(0);
      await browser.page.screenshot({ path: 'test-results/screenshots/shell-phone.png' });
    } finally {
      await browser.close();
    }
  });

  it('when a wide screen (1440×900) is signed in, then the tabs sit in a side rail and switch pages', async () => {
    const browser = await openBrowser(WIDE);
    try {
      await signInAsDemo(browser.page);
      const rail = browser.page.getByTestId('side-rail');
      await rail.waitFor();
      const box = await rail.boundingBox();
      expect(box?.x ?? 1).toBe(0);
      expect(box?.height ?? 0).toBeGreaterThan(WIDE.height - 10);
      await browser.page.getByTestId('tab-odds').click();
      await browser.page.waitForURL(/\/odds/);
      await browser.page.getByTestId('tab-sift').click();
      await browser.page.waitForURL(/\/sift/);
      await browser.page.screenshot({ path: 'test-results/screenshots/shell-wide.png' });
    } finally {
      await browser.close();
    }
  });

  it('when a signed-out visitor opens a deep link, then the server returns the app and it shows the sign-in page', async () => {
    const browser = await openBrowser(PHONE);
    try {
      const response = await browser.page.goto(`${baseUrl()}/hunts/some-hunt`);
      expect(response?.status()).toBe(200);
      await browser.page.getByTestId('sign-in-email').waitFor();
      await browser.page.screenshot({ path: 'test-results/screenshots/sign-in-phone.png' });
    } finally {
      await browser.close();
    }
  });
});
