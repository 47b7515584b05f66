import { describe, expect, it } from 'vitest';
import { apiAs, newCollector } from '../support/api-client';
import { WIDE, openBrowser, signInAsDemo } from '../support/browser';

/** 100 different serials, none of them a pattern the test would need to think about. */
const SERIALS = Array.from({ length: 100 }, (_, i) => String(31_740_598 + i * 7_919).padStart(8, '0'));

describe('Sift typed at full speed on a desk keyboard', () => {
  // The first keys of a new hunt arrive before its strap count exists (the strap sheet is still on its
  // way), and later keys arrive while a note is still being saved: both once lost notes on a busy machine.
  it('when a new hunter types 100 notes with Enter after each as fast as the keyboard sends them, then the page throws nothing and all 100 are stored', async () => {
    const browser = await openBrowser(WIDE);
    const { page } = browser;
    const pageErrors: string[] = [];
    page.on('pageerror', (error) => pageErrors.push(error.message));
    try {
      const account = await newCollector('fast-typist');
      await signInAsDemo(page, account);
      // A first hunt needs no source: one tap starts it.
      await page.getByTestId('start-hunt').click();
      await page.getByTestId('keypad').waitFor();

      // A keyboard does not wait for the page: the keys are queued from inside the page at the hunter's
      // pace (9 keys a note, 13 notes a second) and the page works through them as fast as it can. The
      // test driver's own key presses wait for each round trip and manage only about 5 notes a second.
      const KEY_GAP_MS = 1000 / (13 * 9);
      await page.evaluate(
        ([serials, gap]) =>
          new Promise<void>((resolve) => {
            const keys = serials.flatMap((serial) => [...serial, 'Enter']);
            keys.forEach((key, i) =>
              setTimeout(() => {
                document.body.dispatchEvent(new KeyboardEvent('keydown', { key, bubbles: true, cancelable: true }));
                if (i === keys.length - 1) resolve();
              }, i * gap),
            );
          }),
        [SERIALS, KEY_GAP_MS] as const,
      );

      await page.getByTestId('sync-text').filter({ hasText: 'All saved' }).waitFor({ timeout: 60_000 });
      // Give any frame scheduled by the last keys time to run before judging the page.
      await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
      expect(pageErrors).toEqual([]);

      const call = await apiAs(account.email, account.password);
      const { body: hunts } = await call<{ items: { id: string }[] }>('/hunts?limit=10');
      expect(hunts.items).toHaveLength(1);
      const { body } = await call<{ items: { digits: string }[] }>(`/hunts/${hunts.items[0]!.id}/scans?limit=200`);
      expect(body.items.map((scan) => scan.digits).sort()).toEqual([...SERIALS].sort());
    } finally {
      await browser.close();
    }
  });
});
