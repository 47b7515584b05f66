import { mkdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { collectorWithKeeper } from '../support/api-client';
import { PHONE, WIDE, openBrowser, signInAsDemo, shootWhole } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });

describe('Importing an old log on the You screen', () => {
  it('when a log is chosen on the You screen, then each bad row says why, and the good rows import with progress', async () => {
    const { email, password } = await collectorWithKeeper('e2e-import');
    const log = ['serial,date,pulled,note', 'MB 12121212 A,2026-10-04,yes,first strap', '1234,2026-10-04,,', '48205731,10/05/2026,no,', '77777777,2026-02-30,,'].join('\n');
    for (const [name, viewport] of [
      ['phone', PHONE],
      ['wide', WIDE],
    ] as const) {
      const browser = await openBrowser(viewport);
      try {
        const { page } = browser;
        await signInAsDemo(page, { email, password });
        await page.getByTestId('tab-you').click();
        await page.getByTestId('import-card').waitFor();
        const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('import-choose').click()]);
        await chooser.setFiles({ name: 'old-log.csv', mimeType: 'text/csv', buffer: Buffer.from(log) });
        await page.getByTestId('import-verdict').waitFor();
        await expect(page.getByTestId('import-verdict').textContent()).resolves.toBe('2 rows are ready, 2 have problems and are left out.');
        const problems = (await page.getByTestId('import-problems').textContent()) ?? '';
        expect(problems).toContain('line 3 · 1234 — serial:');
        expect(problems).toContain('line 5 · 77777777 — date: “2026-02-30” is not a date');
        await shootWhole(page, `test-results/screenshots/you-import-${name}.png`);
        await page.getByTestId('import-run').click();
        await page.getByText(name === 'phone' ? /2 new notes · 1 new keeper/ : /0 new notes · 2 already in Strapsift/).waitFor();
        await expect(page.getByTestId('import-progress').textContent()).resolves.toBe('2 of 2 rows sent');
      } finally {
        await browser.close();
      }
    }
  });
});
