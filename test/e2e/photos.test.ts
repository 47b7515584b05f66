import { mkdirSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { apiAs } from '../support/api-client';
import { PHONE, WIDE, baseUrl, openBrowser, signInAsDemo, shootWhole } from '../support/browser';
import { drawPng } from '../support/images';
import { waitForMail } from '../support/mail';

mkdirSync('test-results/screenshots', { recursive: true });


/** A fresh collector with one keeper, made through the served app's API. */
async function collectorWithKeeper(label: string) {
  const email = `${label}-${randomUUID().slice(0, 8)}@strapsift.test`;
  const password = 'photo-test-pass-1';
  const registered = await fetch(`${baseUrl()}/api/auth/register`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password, displayName: 'Photo Tester' }),
  });
  expect(registered.status).toBe(201);
  const call = await apiAs(email, password);
  const keeper = await call<{ id: string; digits: string }>('/keepers', {
    method: 'POST',
    body: JSON.stringify({ serial: 'ML 24242424 C', series: '2017A', grade: 64, estimatedValueCents: 2500, notes: 'kept in the blue album' }),
  });
  expect(keeper.status).toBe(201);
  return { email, password, call, keeper: keeper.body };
}

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

describe('Invitations and the data card', () => {
  it('when an invitee opens the mailed link signed out and creates an account, then they come back to it and join the hunt', async () => {
    const owner = await collectorWithKeeper('e2e-owner');
    const hunt = await owner.call<{ id: string }>('/hunts', {
      method: 'POST',
      body: JSON.stringify({ title: 'Invite test box', source: 'Larkspur Valley Credit Union', denomination: 1, plannedStraps: 2 }),
    });
    const invitee = `e2e-invitee-${randomUUID().slice(0, 8)}@strapsift.test`;
    // The owner sends the invitation from the hunt page.
    const ownerBrowser = await openBrowser(WIDE);
    try {
      const { page } = ownerBrowser;
      await signInAsDemo(page, { email: owner.email, password: owner.password });
      await page.goto(`${baseUrl()}/hunts/${hunt.body.id}`);
      await page.getByTestId('invite-email').fill('not an address');
      await page.getByTestId('invite-send').click();
      await page.getByText(/Invite by e-mail.*must be an e-mail address/).waitFor();
      await page.getByTestId('invite-email').fill(invitee);
      await page.getByTestId('invite-send').click();
      await page.getByText(`Invitation sent to ${invitee}. The link works once, for 14 days.`).waitFor();
      await page.getByRole('listitem').filter({ hasText: invitee }).waitFor();
      await page.getByTestId('crew-section').screenshot({ path: 'test-results/screenshots/hunt-invite-wide.png' });
    } finally {
      await ownerBrowser.close();
    }
    const mail = await waitForMail(invitee, /invites you/);
    const link = /(http:\/\/\S+\/invite\/[A-Za-z0-9_-]{43})/.exec(mail.text ?? '')![1]!;
    expect(link.startsWith(baseUrl())).toBe(true);

    const browser = await openBrowser(PHONE);
    try {
      const { page } = browser;
      await page.goto(link);
      await page.getByTestId('invite-summary').waitFor();
      await expect(page.getByTestId('invite-summary').textContent()).resolves.toContain('“Invite test box”');
      await page.screenshot({ path: 'test-results/screenshots/invite-signed-out-phone.png' });
      await page.getByTestId('invite-create').click();
      await page.waitForURL(/\/create-account\?next=/);
      await page.getByTestId('create-name').fill('Invited Hunter');
      await page.getByTestId('create-email').fill(invitee);
      await page.getByTestId('create-password').fill('invited-pass-123');
      await page.getByTestId('create-submit').click();
      await page.waitForURL(/\/invite\//);
      await page.getByTestId('invite-accept').click();
      await page.waitForURL(new RegExp(`/hunts/${hunt.body.id}$`));
      await page.getByTestId('crew-list').getByText('Invited Hunter').waitFor();
    } finally {
      await browser.close();
    }
  });

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
