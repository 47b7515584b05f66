import { mkdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseSerial, sweep, type ParsedSerial } from '@shared/engine';
import { sweepCsv } from '../../src/features/sweep/sweep-csv';
import { apiAs } from '../support/api-client';
import { PHONE, WIDE, openBrowser, signInAsDemo, shootWhole } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });


describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('Sweep on a %s screen', (name, viewport) => {
  it('when a bundle is swept and exported and a strap is hunted, then the table, the CSV file and the new hunt agree', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.getByTestId('tab-hunts').click();
      await page.getByTestId('open-sweep').click();
      await page.waitForURL(/\/sweep$/);

      // A typo is named in the engine's words, and the text stays for fixing.
      await page.getByTestId('sweep-serial').fill('LG 5839 512 A');
      await page.getByTestId('sweep-run').click();
      await page.getByText('First serial A serial has 8 digits; this has 7.').waitFor();
      await expect(page.getByTestId('sweep-serial').inputValue()).resolves.toBe('LG 5839 512 A');

      // The demo's $2 bundle came in sequence from 58395120 and holds one repeater, 58395839.
      await page.getByTestId('sweep-serial').fill('LG 58395120 A');
      await page.getByLabel('How many: Bundle · 1,000').click();
      await page.getByTestId('sweep-run').click();
      const expected = sweep('58395120', 1000);
      await page.getByTestId('sweep-headline').waitFor();
      expect(expected.hits.map((hit) => hit.serial)).toEqual(['58395839']);
      await expect(page.getByTestId('sweep-headline').textContent()).resolves.toBe('1 find in 1,000 notes, 58395120 to 58396119');
      const row = page.getByTestId('sweep-table').getByRole('row').nth(1);
      await expect(row.getByRole('cell').allTextContents()).resolves.toEqual(
        name === 'wide' ? ['LG 58395839 A', '719', '8 · 20', 'repeater'] : ['LG 58395839 A', '719', 'repeater'],
      );
      await shootWhole(page, `test-results/screenshots/sweep-bundle-${name}.png`);

      const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('sweep-export').click()]);
      expect(download.suggestedFilename()).toBe('strapsift-sweep-58395120-1000.csv');
      const saved = readFileSync((await download.path())!, 'utf8');
      expect(saved).toBe(sweepCsv(expected, parseSerial('LG 58395120 A') as ParsedSerial));
      await page.getByTestId('sweep-export-note').waitFor();

      // A brick of 3333xxxx is thick with binaries and trinaries: the table pages.
      await page.getByTestId('sweep-serial').fill('33330000');
      await page.getByLabel('How many: Brick · 4,000').click();
      await page.getByTestId('sweep-run').click();
      await page.getByTestId('sweep-headline').filter({ hasText: '4,000 notes' }).waitFor();
      const brick = sweep('33330000', 4000);
      await expect(page.getByTestId('sweep-page').textContent()).resolves.toBe(`Finds 1–100 of ${brick.hits.length.toLocaleString('en-US')}`);
      await page.getByTestId('sweep-next').click();
      await expect(page.getByTestId('sweep-page').textContent()).resolves.toBe(`Finds 101–200 of ${brick.hits.length.toLocaleString('en-US')}`);
      await expect(page.getByTestId('sweep-table').getByRole('row').nth(1).getByRole('cell').first().textContent()).resolves.toBe(brick.hits[100]!.serial);
      await shootWhole(page, `test-results/screenshots/sweep-brick-${name}.png`);

      // One strap, one tap: a hunt of one strap, and Sift opens.
      await page.getByTestId('sweep-serial').fill('LG 58395120 A');
      await page.getByLabel('How many: Strap · 100').click();
      await page.getByTestId('sweep-run').click();
      await page.getByTestId('sweep-headline').filter({ hasText: '100 notes' }).waitFor();
      await page.getByTestId('sweep-start').scrollIntoViewIfNeeded();
      await shootWhole(page, `test-results/screenshots/sweep-strap-${name}.png`);
      await page.getByTestId('sweep-start').click();
      await page.waitForURL(/\/sift$/);
      const call = await apiAs('demo@strapsift.test', 'sift-demo-2026');
      const hunts = await call<{ items: Array<{ title: string; plannedStraps: number; status: string; source: string }> }>('/hunts?limit=200');
      const made = hunts.body.items.filter((hunt) => hunt.title === 'Run from LG 58395120 A');
      expect(made.length).toBeGreaterThanOrEqual(1);
      expect(made[0]).toMatchObject({ plannedStraps: 1, status: 'open', source: 'New notes in sequence' });
      // Sift opens on the new hunt itself, ready for its first note.
      await page.getByTestId('switch-hunt').filter({ hasText: 'Run from LG 58395120 A' }).waitFor();
      await page.getByTestId('keypad').waitFor();
      await page.screenshot({ path: `test-results/screenshots/sweep-to-sift-${name}.png` });
    } finally {
      await browser.close();
    }
  });
});
