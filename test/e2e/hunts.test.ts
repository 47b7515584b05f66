import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiAs } from '../support/api-client';
import { PHONE, WIDE, baseUrl, openBrowser, signInAsDemo, shootWhole } from '../support/browser';

mkdirSync('test-results/screenshots', { recursive: true });


type Call = Awaited<ReturnType<typeof apiAs>>;
const demo = () => apiAs('demo@strapsift.test', 'sift-demo-2026');

/** A hunt of the test's own, with notes logged through the API as a device would send them. */
async function huntWithNotes(call: Call, title: string): Promise<string> {
  const created = await call<{ id: string }>('/hunts', {
    method: 'POST',
    body: JSON.stringify({ title, source: 'Larkspur Valley CU, Mill Street branch', denomination: 1, plannedStraps: 2 }),
  });
  expect(created.status).toBe(201);
  const huntId = created.body.id;
  const now = Date.now();
  const notes: Array<{ strap: number; serial: string; pulled?: boolean }> = [
    { strap: 1, serial: 'MB 12344321 A', pulled: true },
    { strap: 1, serial: 'MB 31740598 A' },
    { strap: 1, serial: 'MB 66120934 A', pulled: true },
    { strap: 1, serial: 'MB 55155155 A' },
    { strap: 1, serial: 'MB 20481357 A' },
    { strap: 2, serial: 'MB 70707070 B' },
    { strap: 2, serial: 'MB 19283746 B' },
  ];
  const batch = await call<{ stored: string[] }>('/scans/batch', {
    method: 'POST',
    body: JSON.stringify({
      scans: notes.map((note, index) => ({
        id: randomUUID(),
        huntId,
        strap: note.strap,
        serial: note.serial,
        pulled: note.pulled ?? false,
        scannedAt: new Date(now - (notes.length - index) * 4000).toISOString(),
      })),
    }),
  });
  expect(batch.body.stored).toHaveLength(notes.length);
  return huntId;
}

async function openHuntsTab(page: Page): Promise<void> {
  await page.getByTestId('tab-hunts').click();
  await page.waitForURL(/\/hunts$/);
}

describe.each([
  ['phone', PHONE],
  ['wide', WIDE],
] as const)('Hunts on a %s screen', (name, viewport) => {
  it('when the list opens, then the demo hunts show their figures, and a hunt page shows its sheet, hits, tally and crew', async () => {
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await openHuntsTab(page);
      const list = page.getByTestId(name === 'wide' ? 'hunt-table' : 'hunt-cards');
      await list.waitFor();
      await expect(list.textContent()).resolves.toContain('$1 brick split with Tobiah');
      await shootWhole(page, `test-results/screenshots/hunts-list-${name}.png`);

      await page.getByRole('button', { name: /\$1 brick split with Tobiah/ }).first().click();
      await page.waitForURL(/\/hunts\/[0-9a-f-]{36}$/);
      await page.getByTestId('strap-sheet').waitFor();
      await page.getByTestId('hits-table').waitFor();
      await page.getByTestId('hunt-chance-table').waitFor();
      await expect(page.getByTestId('crew-list').textContent()).resolves.toContain('Tobiah Marsh');
      await expect(page.getByTestId('hits-table').textContent()).resolves.toContain('00000417');
      await shootWhole(page, `test-results/screenshots/hunt-page-${name}.png`);
      // The same page in the dark theme (it follows the system's scheme by default).
      await page.emulateMedia({ colorScheme: 'dark' });
      await page.waitForTimeout(200);
      await shootWhole(page, `test-results/screenshots/hunt-page-dark-${name}.png`);
    } finally {
      await browser.close();
    }
  });

  it("when a strap's swapped-in count is edited and saved, then the change is there after a reload, and the printed sheet is the sheet alone", async () => {
    const call = await demo();
    const huntId = await huntWithNotes(call, `Strap edit ${name} ${Date.now()}`);
    const browser = await openBrowser(viewport);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/hunts/${huntId}`);
      await page.getByTestId('strap-sheet').waitFor();
      await expect(page.getByTestId('strap-back-1').textContent()).resolves.toBe('98');
      await expect(page.getByTestId('hits-table').textContent()).resolves.toContain('MB 12344321 A');

      await page.getByTestId('strap-edit-1').click();
      await page.getByTestId('strap-swapped-1').fill('x');
      await page.getByTestId('strap-save-1').click();
      await page.getByText('Swapped in must be a whole number').waitFor();
      await page.getByTestId('strap-swapped-1').fill('2');
      await expect(page.getByTestId('strap-preview-1').textContent()).resolves.toBe('Goes back with 100 notes: complete');
      await shootWhole(page, `test-results/screenshots/hunt-strap-editing-${name}.png`);
      await page.getByTestId('strap-save-1').click();
      await page.getByTestId('strap-form-1').waitFor({ state: 'detached' });
      await expect(page.getByTestId('strap-back-1').textContent()).resolves.toBe('100');

      await page.reload();
      await page.getByTestId('strap-sheet').waitFor();
      await expect(page.getByTestId('strap-back-1').textContent()).resolves.toBe('100');
      await expect(page.getByTestId('strap-totals').textContent()).resolves.toContain('2 swapped in');
      const sheet = await call<{ straps: Array<{ number: number; swappedIn: number; complete: boolean }> }>(`/hunts/${huntId}/straps`);
      expect(sheet.body.straps[0]).toMatchObject({ number: 1, swappedIn: 2, complete: true });
      await shootWhole(page, `test-results/screenshots/hunt-strap-saved-${name}.png`);

      // Paper: the sheet alone, no tab bar, no buttons.
      await page.emulateMedia({ media: 'print' });
      await expect(page.getByTestId('printable-sheet').isVisible()).resolves.toBe(true);
      await expect(page.getByTestId(name === 'wide' ? 'side-rail' : 'tab-bar').isVisible()).resolves.toBe(false);
      await expect(page.getByTestId('print-sheet').isVisible()).resolves.toBe(false);
      await expect(page.getByTestId('printable-totals').textContent()).resolves.toBe('2 straps · 200 notes going back · 2 of 2 complete');
      const printed = (await page.getByTestId('printable-sheet').textContent()) ?? '';
      expect(printed).toContain("Teller's initials");
      expect(printed).not.toContain('12344321');
      await page.screenshot({ path: `test-results/screenshots/hunt-print-${name}.png`, fullPage: true });
      await page.emulateMedia({ media: 'screen' });
    } finally {
      await browser.close();
    }
  });
});

describe('Hunts: crew, closing and deleting', () => {
  it('when the owner adds and removes crew, closes the hunt and deletes it, then each asks first and the list follows', async () => {
    const call = await demo();
    const title = `Crew and close ${Date.now()}`;
    const huntId = await huntWithNotes(call, title);
    const browser = await openBrowser(WIDE);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/hunts/${huntId}`);
      await page.getByTestId('crew-list').waitFor();

      await page.getByTestId('crew-email').fill('not an address');
      await page.getByTestId('crew-add').click();
      await page.getByText(/Add crew by e-mail .+/).waitFor();
      await page.getByTestId('crew-email').fill('crew@strapsift.test');
      await page.getByTestId('crew-add').click();
      await page.getByTestId('crew-list').getByText('Tobiah Marsh').waitFor();
      await page.getByLabel('Remove Tobiah Marsh from the crew').click();
      await page.getByTestId('crew-confirm').waitFor();
      // The dialog fades in; the shot waits for it to settle.
      await page.waitForTimeout(500);
      await page.screenshot({ path: 'test-results/screenshots/hunt-crew-confirm-wide.png' });
      await page.getByTestId('crew-confirm-confirm').click();
      await page.getByTestId('crew-list').getByText('Tobiah Marsh').waitFor({ state: 'detached' });
      const members = await call<{ items: unknown[] }>(`/hunts/${huntId}/members`);
      expect(members.body.items).toHaveLength(1);

      await page.getByTestId('close-hunt').click();
      await page.getByTestId('hunt-confirm-cancel').click();
      await expect(call<{ status: string }>(`/hunts/${huntId}`).then((r) => r.body.status)).resolves.toBe('open');
      await page.getByTestId('close-hunt').click();
      await page.getByTestId('hunt-confirm-confirm').click();
      await page.getByTestId('close-hunt').waitFor({ state: 'detached' });
      await page.getByLabel('Status: closed').first().waitFor();
      await expect(call<{ status: string }>(`/hunts/${huntId}`).then((r) => r.body.status)).resolves.toBe('closed');

      await page.getByTestId('delete-hunt').click();
      await page.getByTestId('hunt-confirm').waitFor();
      await page.waitForTimeout(500);
      await page.screenshot({ path: 'test-results/screenshots/hunt-delete-confirm-wide.png' });
      await page.getByTestId('hunt-confirm-confirm').click();
      await page.waitForURL(/\/hunts$/);
      await page.getByTestId('hunt-table').waitFor();
      await expect(page.getByTestId('hunt-table').textContent()).resolves.not.toContain(title);
      await expect(call(`/hunts/${huntId}`).then((r) => r.status)).resolves.toBe(404);
    } finally {
      await browser.close();
    }
  });

  it('when the owner learns the series and that the notes are new and in sequence after starting, then the details are saved and shown after a reload', async () => {
    const call = await demo();
    const huntId = await huntWithNotes(call, `Details later ${Date.now()}`);
    const browser = await openBrowser(PHONE);
    const { page } = browser;
    try {
      await signInAsDemo(page);
      await page.goto(`${baseUrl()}/hunts/${huntId}`);
      await expect(page.getByTestId('hunt-details').textContent()).resolves.toContain('circulated, in no order');
      await page.getByTestId('edit-details').click();
      await page.getByTestId('details-series').fill('2017a');
      await page.getByTestId('details-in-sequence').getByText('New, in sequence').click();
      await page.getByTestId('save-details').click();
      await page.getByText('Saved. Readings and the chance figures use the new details.').waitFor();
      const saved = await call<{ series: string | null; inSequence: boolean; source: string }>(`/hunts/${huntId}`);
      expect(saved.body).toMatchObject({ series: '2017A', inSequence: true, source: 'Larkspur Valley CU, Mill Street branch' });
      await page.reload();
      const details = await page.getByTestId('hunt-details').textContent();
      expect(details).toContain('new, in sequence');
      expect(details).toContain('2017A');
    } finally {
      await browser.close();
    }
  });

  it('when crew open the shared hunt, then they can square straps but not close or delete it', async () => {
    const browser = await openBrowser(PHONE);
    const { page } = browser;
    try {
      await signInAsDemo(page, { email: 'crew@strapsift.test', password: 'crew-demo-2026' });
      await openHuntsTab(page);
      await page.getByRole('button', { name: /\$1 brick split with Tobiah/ }).first().click();
      await page.getByTestId('manage-section').waitFor();
      await expect(page.getByTestId('manage-section').textContent()).resolves.toContain('You are crew in Wren Halloway');
      await expect(page.getByTestId('delete-hunt').count()).resolves.toBe(0);
      await expect(page.getByTestId('close-hunt').count()).resolves.toBe(0);
      await expect(page.getByTestId('edit-details').count()).resolves.toBe(0);
      await expect(page.getByLabel(/^Remove .* from the crew$/).count()).resolves.toBe(0);
      await page.getByTestId('strap-edit-6').waitFor();
      await shootWhole(page, 'test-results/screenshots/hunt-crew-view-phone.png');
    } finally {
      await browser.close();
    }
  });
});
