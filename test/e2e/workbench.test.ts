import { mkdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { apiAs } from '../support/api-client';
import { PHONE, WIDE, baseUrl, openBrowser, shootWhole, signInAsDemo } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });

describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('Keepers, Odds, You and Console on a %s screen', (name, viewport) => {
  it('when a keeper is opened, graded and saved, then the grade is still there after a reload', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/keepers`);
      const list = page.getByTestId('keeper-list');
      await list.waitFor();
      await shootWhole(page, `test-results/screenshots/keepers-list-${name}.png`);
      await list.getByRole('link').first().click();
      await page.getByTestId('keeper-form').waitFor();
      const grade = name === 'phone' ? '63' : '58';
      await page.getByTestId('grade-input').fill(grade);
      await page.getByTestId('save-keeper').click();
      await page.getByText('Saved.').waitFor();
      await page.reload();
      await page.getByTestId('keeper-form').waitFor();
      await expect(page.getByTestId('grade-input').inputValue()).resolves.toBe(grade);
      await shootWhole(page, `test-results/screenshots/keeper-page-${name}.png`);
    } finally {
      await browser.close();
    }
  });

  it('when a weight is changed and saved on Odds, then the rarity table and the reload show it', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/odds`);
      await page.getByTestId('rarity-table').waitFor();
      const weight = name === 'phone' ? '11' : '12';
      await page.getByLabel('Weight for solid').fill(weight);
      await page.getByTestId('save-weights').click();
      await page.getByText(/^Saved “/).waitFor();
      await page.reload();
      await page.getByTestId('rarity-table').waitFor();
      await expect(page.getByLabel('Weight for solid').inputValue()).resolves.toBe(weight);
      // A watch pattern typed wrongly is named before anything is sent.
      await page.getByTestId('watch-pattern').fill('1999-02-29');
      await page.getByText(/calendar/i).first().waitFor();
      await shootWhole(page, `test-results/screenshots/odds-${name}.png`);
    } finally {
      await browser.close();
    }
  });

  it('when the profile is saved on You, then it says so and the name stays after a reload', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/you`);
      await page.getByTestId('you-name').fill('Wren Halloway');
      await page.getByTestId('you-save').click();
      await page.getByText('Profile saved.').waitFor();
      await page.reload();
      await expect(page.getByTestId('you-name').inputValue()).resolves.toBe('Wren Halloway');
      await expect(page.getByTestId('delete-account').getAttribute('aria-disabled')).resolves.toBe('true');
      await shootWhole(page, `test-results/screenshots/you-${name}.png`);
    } finally {
      await browser.close();
    }
  });

  it('when the admin disables and re-enables an account in the Console, then its badge follows; a collector is sent away', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page, { email: 'admin@strapsift.test', password: 'console-demo-2026' });
      // The totals on screen are the server's own figures. Browser files in the other lane (e2e-lanes.ts) may
      // register or log notes meanwhile, so the page and the API are read again until one reading of each agrees.
      const admin = await apiAs('admin@strapsift.test', 'console-demo-2026');
      const totalsOnScreen = async () => {
        await page.goto(`${baseUrl()}/console`);
        await page.getByTestId('console-total-keepers').waitFor();
        await page.waitForFunction(() => !document.querySelector('[data-testid="console-total-keepers"]')?.textContent?.includes('…'));
        return Promise.all(['users', 'scans', 'keepers'].map((key) => page.getByTestId(`console-total-${key}`).textContent()));
      };
      const totalsOfApi = async () => {
        const { body: stats } = await admin<{ users: number; scans: number; keepers: number }>('/admin/stats');
        return [`Accounts${stats.users.toLocaleString('en-US')}`, `Notes logged${stats.scans.toLocaleString('en-US')}`, `Keepers${stats.keepers.toLocaleString('en-US')}`];
      };
      let shown: Array<string | null> = [];
      let served: string[] = [];
      for (let attempt = 0; attempt < 5 && (attempt === 0 || shown.some((text, i) => text !== served[i])); attempt++) {
        served = await totalsOfApi();
        shown = await totalsOnScreen();
      }
      expect(shown).toEqual(served);

      // The search narrows the list to the one account, shown with its counts.
      await page.getByTestId('console-search').fill('crew@strapsift');
      const row = page.getByTestId('console-user-crew@strapsift.test');
      await row.waitFor();
      await page.waitForFunction(() => document.querySelectorAll('[data-testid^="console-user-"]').length === 1);
      const { body: found } = await admin<{ items: { email: string; hunts: number; keepers: number }[] }>('/admin/users?query=crew%40strapsift');
      const crew = found.items.find((item) => item.email === 'crew@strapsift.test')!;
      await expect(row.textContent()).resolves.toContain(`crew@strapsift.test · ${crew.hunts} hunts`);
      await expect(row.textContent()).resolves.toContain(`${crew.keepers} keepers`);

      // Disabled on screen means disabled on the server: the account cannot sign in until re-enabled.
      await row.getByLabel('Disable crew@strapsift.test').click();
      await row.getByText('disabled').waitFor();
      await expect(apiAs('crew@strapsift.test', 'crew-demo-2026')).rejects.toThrow(/sign-in failed: 40[13]/);
      await row.getByLabel('Enable crew@strapsift.test').click();
      await row.getByText('active').waitFor();
      await expect(apiAs('crew@strapsift.test', 'crew-demo-2026')).resolves.toBeTypeOf('function');
      await shootWhole(page, `test-results/screenshots/console-${name}.png`);
    } finally {
      await browser.close();
    }
    const collector = await openBrowser(viewport);
    try {
      await signInAsDemo(collector.page);
      await collector.page.goto(`${baseUrl()}/console`);
      await collector.page.waitForURL(/\/you$/);
    } finally {
      await collector.close();
    }
  });
});
