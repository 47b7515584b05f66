import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { collectorWithKeeper } from '../support/api-client';
import { PHONE, WIDE, baseUrl, openBrowser, signInAsDemo, shootWhole } from '../support/browser';
import { drawPng } from '../support/images';

mkdirSync('test-results/screenshots', { recursive: true });


/** Whether an <img> in the element finished loading with real pixels. */
async function imageLoaded(page: Page, testId: string): Promise<boolean> {
  await page.getByTestId(testId).waitFor();
  return page.waitForFunction(
    (id) => {
      const img = document.querySelector(`[data-testid="${id}"] img`) as HTMLImageElement | null;
      return !!img && img.complete && img.naturalWidth > 0;
    },
    testId,
    { timeout: 15_000 },
  ).then(() => true);
}

describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('Photos and share links on a %s screen', (name, viewport) => {
  it('when a front photo is attached with the file chooser, then the keeper page and list show it, and a share link shows it signed out until withdrawn', async () => {
    const { email, password, keeper } = await collectorWithKeeper(`e2e-photo-${name}`);
    const browser = await openBrowser(viewport);
    const visitor = await openBrowser(viewport);
    try {
      const { page } = browser;
      await signInAsDemo(page, { email, password });
      await page.goto(`${baseUrl()}/keepers/${keeper.id}`);
      await page.getByTestId('keeper-photos').waitFor();
      await expect(page.getByTestId('keeper-photos').textContent()).resolves.toContain('18 U.S.C. § 504');

      // expo-image-picker opens the browser's file chooser; the test answers it with a drawn picture.
      const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('photo-add-front').click()]);
      await chooser.setFiles({ name: 'front.png', mimeType: 'image/png', buffer: drawPng(470, 200, 5) });
      expect(await imageLoaded(page, 'photo-front')).toBe(true);
      await expect(page.getByTestId('photo-add-front').textContent()).resolves.toBe('Replace front');
      await shootWhole(page, `test-results/screenshots/keeper-photos-${name}.png`);

      // The list shows the thumbnail.
      await page.goto(`${baseUrl()}/keepers`);
      expect(await imageLoaded(page, `keeper-thumb-${keeper.digits}`)).toBe(true);
      await page.screenshot({ path: `test-results/screenshots/keepers-thumbnails-${name}.png` });

      // Share the note, open the link signed out.
      await page.goto(`${baseUrl()}/keepers/${keeper.id}`);
      await page.getByTestId('share-create').click();
      const url = (await page.getByTestId('share-url').textContent())!.trim();
      expect(url).toMatch(new RegExp(`^${baseUrl()}/share/[A-Za-z0-9_-]{43}$`));
      await page.getByTestId('share-card').screenshot({ path: `test-results/screenshots/share-card-${name}.png` });

      await visitor.page.goto(url);
      await visitor.page.getByTestId('shared-serial').waitFor();
      await expect(visitor.page.getByTestId('shared-serial').textContent()).resolves.toBe('ML 24242424 C');
      expect(await imageLoaded(visitor.page, 'shared-photo-front')).toBe(true);
      const shown = (await visitor.page.getByTestId('shared-keeper').textContent()) ?? '';
      expect(shown).toContain('repeater');
      expect(shown).toContain('2017A');
      for (const secret of ['Photo Tester', email, '25.00', 'blue album']) expect(shown).not.toContain(secret);
      await shootWhole(visitor.page, `test-results/screenshots/share-page-${name}.png`);

      // Withdrawn: the same address now shows nothing.
      await page.getByTestId('share-revoke').click();
      await page.getByTestId('share-confirm-confirm').click();
      await page.getByText('Not shared.').waitFor();
      await visitor.page.reload();
      await visitor.page.getByText('This link does not exist, or its owner withdrew it.').waitFor();
      await expect(visitor.page.getByTestId('shared-keeper').count()).resolves.toBe(0);
    } finally {
      await browser.close();
      await visitor.close();
    }
  });
});
