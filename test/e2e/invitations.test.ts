import { mkdirSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { collectorWithKeeper } from '../support/api-client';
import { PHONE, WIDE, baseUrl, openBrowser, signInAsDemo } from '../support/browser';
import { waitForMail } from '../support/mail';

mkdirSync('test-results/screenshots', { recursive: true });

describe('Crew invitations in the browser', () => {
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
});
