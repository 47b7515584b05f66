import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { PATTERN_IDS } from '../../shared/engine';
import { apiAs } from '../support/api-client';
import { PHONE, WIDE, openBrowser, signInAsDemo, shootWhole } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });


interface Tally {
  notes: number;
  hits: number;
  basis: 'poisson' | 'sequence' | 'mixed';
  caveat: string;
  byHunt: Array<{ title: string }>;
  overTime: Array<{ start: string; notes: number }>;
}

const count = (value: number) => value.toLocaleString('en-US');

describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('Tally on a %s screen', (name, viewport) => {
  it('when opened from Hunts, then per pattern, per hunt and over time agree with the API; new notes show after a reload', async () => {
    const call = await apiAs('demo@strapsift.test', 'sift-demo-2026');
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.getByTestId('tab-hunts').click();
      await page.getByTestId('open-tally').click();
      await page.waitForURL(/\/tally$/);
      await page.getByTestId('tally-notes').waitFor();

      // The default period is the last 12 months, by month.
      const from = new Date(Date.now() - 364 * 24 * 60 * 60 * 1000).toISOString().slice(0, 10);
      const before = (await call<Tally>(`/tally?bucket=month&from=${from}`)).body;
      expect(before.notes).toBeGreaterThan(0);
      await expect(page.getByTestId('tally-notes').getAttribute('aria-label')).resolves.toBe(`Notes searched: ${count(before.notes)}`);
      await expect(page.getByTestId('tally-by-hunt-table').textContent()).resolves.toContain('$1 brick split with Tobiah');
      // A header and one row for each pattern.
      await expect(page.getByTestId('tally-chance-table').getByRole('row').count()).resolves.toBe(PATTERN_IDS.length + 1);
      // The demo mixes a vault bundle in sequence with circulated straps: Tally says what it compares against.
      expect(before.basis).toBe('mixed');
      await expect(page.getByTestId('tally-patterns').textContent()).resolves.toContain(before.caveat);
      await page.getByTestId('tally-over-time-chart').waitFor();
      await shootWhole(page, `test-results/screenshots/tally-${name}.png`);

      // New notes logged elsewhere: a reload counts them.
      const hunt = await call<{ id: string }>('/hunts', {
        method: 'POST',
        body: JSON.stringify({ title: `Tally check ${name} ${Date.now()}`, source: 'Kestrel Plaza drive-up', denomination: 1, plannedStraps: 1 }),
      });
      const serials = ['12344321', '40404040', '31740598', '20481357', '66120934'];
      await call('/scans/batch', {
        method: 'POST',
        body: JSON.stringify({
          scans: serials.map((serial, index) => ({
            id: randomUUID(),
            huntId: hunt.body.id,
            strap: 1,
            serial,
            scannedAt: new Date(Date.now() - (serials.length - index) * 1000).toISOString(),
          })),
        }),
      });
      await page.reload();
      await page.getByTestId('tally-notes').waitFor();
      await expect(page.getByTestId('tally-notes').getAttribute('aria-label')).resolves.toBe(`Notes searched: ${count(before.notes + 5)}`);

      // Weekly buckets.
      await page.getByLabel('Over time: By week').click();
      await page.getByTestId('tally-over-time-table').getByText(/^Week of /).first().waitFor();
      const weekly = (await call<Tally>(`/tally?bucket=week&from=${from}`)).body;
      await expect(page.getByTestId('tally-over-time-table').getByRole('row').count()).resolves.toBe(weekly.overTime.length + 1);

      // Dates typed by hand: a bad one is named and kept; a good pair is applied.
      await page.getByLabel('Period: Dates…').click();
      await page.getByTestId('tally-from').fill('2026-13-01');
      await page.getByTestId('tally-apply').click();
      await page.getByText('From must be a date written 2026-03-01').waitFor();
      await expect(page.getByTestId('tally-from').inputValue()).resolves.toBe('2026-13-01');
      await page.getByTestId('tally-from').fill('2026-10-01');
      await page.getByTestId('tally-to').fill('2026-10-31');
      await page.getByTestId('tally-apply').click();
      const october = (await call<Tally>('/tally?bucket=week&from=2026-10-01&to=2026-10-31')).body;
      await page.getByLabel(`Notes searched: ${count(october.notes)}`).waitFor();
      await expect(page.getByTestId('tally-by-hunt-table').textContent()).resolves.not.toContain('$1 brick split with Tobiah');
      await shootWhole(page, `test-results/screenshots/tally-october-${name}.png`);
    } finally {
      await browser.close();
    }
  });
});
