import { randomUUID } from 'node:crypto';
import { mkdirSync, statSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { PHONE, WIDE, baseUrl, openBrowser, shootWhole, signInAsDemo } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });

describe('the full archive on You', () => {
  it('when the demo collector downloads the archive and a new account restores it, then the preview, the progress and the outcome are shown', async () => {
    const phone = await openBrowser(PHONE);
    const wide = await openBrowser(WIDE);
    try {
      const { page } = phone;
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/you`);
      await page.getByTestId('archive-export-card').getByText(/hunts, .* notes, .* keepers and .* photos/).waitFor();
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('archive-export').click()]);
      expect(download.suggestedFilename()).toMatch(/^strapsift-archive-\d{4}-\d{2}-\d{2}\.zip$/);
      const path = await download.path();
      expect(statSync(path).size).toBeGreaterThan(10_000);
      await page.getByText(/^Saved strapsift-archive-.*\.zip/).waitFor();
      await shootWhole(page, 'test-results/screenshots/you-archive-phone.png');

      // A new account restores it, on the wide screen.
      const account = { email: `restorer-${randomUUID().slice(0, 8)}@strapsift.test`, password: 'restore-the-log-1' };
      const created = await fetch(`${baseUrl()}/api/auth/register`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ ...account, displayName: 'Restorer' }),
      });
      expect(created.status).toBe(201);
      await signInAsDemo(wide.page, account);
      await wide.page.goto(`${baseUrl()}/you`);
      const [chooser] = await Promise.all([wide.page.waitForEvent('filechooser'), wide.page.getByTestId('archive-choose').click()]);
      await chooser.setFiles(path);
      await wide.page.getByTestId('archive-counts').waitFor();
      // The demo's hunts still belong to the demo collector here, so they come back as copies of one's own.
      await wide.page.getByText('These hunts come back as your own').waitFor();
      await shootWhole(wide.page, 'test-results/screenshots/you-archive-preview-wide.png');
      await wide.page.getByTestId('archive-restore').click();
      await wide.page.getByText('Restored', { exact: true }).waitFor({ timeout: 90_000 });
      await expect(wide.page.getByText(/notes: [\d,]+ added/).textContent()).resolves.toMatch(/notes: [1-9][\d,]* added/);
      await shootWhole(wide.page, 'test-results/screenshots/you-archive-restored-wide.png');
    } finally {
      await phone.close();
      await wide.close();
    }
  });
});
