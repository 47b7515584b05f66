import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { config } from '../../server/config';
import { authResponse } from '../../shared/contracts/auth';
import { memberList } from '../../shared/contracts/crew';
import { huntList } from '../../shared/contracts/hunts';
import { inviteAccepted, inviteList, invitePreview, inviteView, mailSent } from '../../shared/contracts/invites';
import { openTestDataSource } from '../support/database';
import { createHunt, postBatch, registerUser, scanOf } from '../support/api';
import { mailsTo, waitForMail } from '../support/mail';
import type { DataSource } from 'typeorm';

// These tests use the app as it runs: mail goes over SMTP through nodemailer to the catcher the test
// script started, which writes each message as an .eml file into MAIL_DIR; the tests read them back.
let dataSource: DataSource;
let app: Express;

beforeAll(async () => {
  dataSource = await openTestDataSource();
  // Its own namespace of limits, and X-Forwarded-For from loopback believed, as openTestApi does.
  app = createApp({ dataSource, trustedProxies: ['loopback'], limitNamespace: `test-${randomUUID()}` });
});
afterAll(async () => {
  await dataSource.destroy();
});

const publicUrl = () => config().PUBLIC_URL.replace(/\/$/, '');

function linkIn(text: string, path: string): string {
  const match = new RegExp(`${publicUrl().replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}${path}([A-Za-z0-9_%-]+)`).exec(text);
  if (!match) throw new Error(`no ${path} link in: ${text}`);
  return decodeURIComponent(match[1]!);
}

describe('password reset by mail', () => {
  it('when a reset is asked for, then a mail with text and HTML parts carries a one-hour link that resets the password once', async () => {
    const user = await registerUser(app, 'mail-reset');

    await request(app).post('/api/auth/forgot').send({ email: user.email }).expect(202);
    const mail = await waitForMail(user.email, /reset/i);

    expect(mail.subject).toBe('Reset your Strapsift password');
    expect(mail.from?.text).toContain('no-reply@strapsift.test');
    expect(mail.text).toContain('within 60 minutes');
    const token = linkIn(mail.text ?? '', '/reset-password\\?token=');
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(mail.html).toContain(`${publicUrl()}/reset-password?token=${token}`);
    expect(mail.html).toContain('<a href=');

    const reset = await request(app).post('/api/auth/reset').send({ token, password: 'a-brand-new-pass' });
    expect(reset.status).toBe(200);
    expect(authResponse.parse(reset.body).user.email).toBe(user.email);
    expect((await request(app).post('/api/auth/login').send({ email: user.email, password: 'a-brand-new-pass' })).status).toBe(200);
    expect((await request(app).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(401);
    const again = await request(app).post('/api/auth/reset').send({ token, password: 'yet-another-pass' });
    expect(again.status).toBe(400);
    expect(again.body.error.fields.token).toMatch(/expired or was already used/);
  });

  it('when no account has the e-mail, then the answer is the same 202 and no mail is sent', async () => {
    const nobody = `nobody-${Date.now()}@strapsift.test`;
    const response = await request(app).post('/api/auth/forgot').send({ email: nobody });
    expect(response.status).toBe(202);
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(await mailsTo(nobody)).toEqual([]);
  });
});

describe('crew invitations by mail', () => {
  it('when the owner invites an address with no account, then the invitee creates one through the link and joins the hunt as crew', async () => {
    const owner = await registerUser(app, 'mail-owner');
    const hunt = await createHunt(app, owner, { title: 'Saturday $2 box' });
    const invitee = `invitee-${Date.now()}@strapsift.test`;

    const created = await request(app).post(`/api/hunts/${hunt.id}/invites`).set(owner.auth).send({ email: invitee.toUpperCase() });
    expect(created.status).toBe(201);
    expect(inviteView.parse(created.body).email).toBe(invitee);
    const mail = await waitForMail(invitee, /invites you/);
    expect(mail.subject).toBe('Test mail-owner invites you to a Strapsift hunt');
    expect(mail.text).toContain('“Saturday $2 box”');
    const token = linkIn(mail.text ?? '', '/invite/');
    expect(mail.html).toContain(`${publicUrl()}/invite/${token}`);

    // The accept page, before anyone signs in.
    const preview = invitePreview.parse((await request(app).get(`/api/invites/${token}`).expect(200)).body);
    expect(preview).toMatchObject({ huntTitle: 'Saturday $2 box', invitedBy: 'Test mail-owner', email: invitee, status: 'open' });
    expect((await request(app).post(`/api/invites/${token}/accept`)).status).toBe(401);

    // Creating the account, then accepting with it.
    const registered = await request(app).post('/api/auth/register').send({ email: invitee, password: 'crew-joins-1', displayName: 'Invited Crew' });
    const session = authResponse.parse(registered.body);
    const auth = { Authorization: `Bearer ${session.token}` };
    const accepted = inviteAccepted.parse((await request(app).post(`/api/invites/${token}/accept`).set(auth).expect(200)).body);

    expect(accepted).toEqual({ huntId: hunt.id, alreadyMember: false });
    const members = memberList.parse((await request(app).get(`/api/hunts/${hunt.id}/members`).set(owner.auth)).body);
    expect(members.items.map((m) => [m.displayName, m.role])).toEqual([
      ['Test mail-owner', 'owner'],
      ['Invited Crew', 'crew'],
    ]);
    const theirs = huntList.parse((await request(app).get('/api/hunts').set(auth)).body);
    expect(theirs.items.map((h) => [h.id, h.role])).toEqual([[hunt.id, 'crew']]);
    await postBatch(app, { ...owner, auth } as never, [scanOf(hunt.id, '24682468')]).then((r) => expect(r.body.stored).toHaveLength(1));
    expect(invitePreview.parse((await request(app).get(`/api/invites/${token}`)).body).status).toBe('accepted');
    expect(inviteList.parse((await request(app).get(`/api/hunts/${hunt.id}/invites`).set(owner.auth)).body).items).toEqual([]);
  });

  it('when an existing user signs in and accepts, then they join; the link then works for nobody else, and again for them', async () => {
    const owner = await registerUser(app, 'mail-owner2');
    const friend = await registerUser(app, 'mail-friend');
    const other = await registerUser(app, 'mail-other');
    const hunt = await createHunt(app, owner);
    await request(app).post(`/api/hunts/${hunt.id}/invites`).set(owner.auth).send({ email: friend.email }).expect(201);
    const token = linkIn((await waitForMail(friend.email, /invites you/)).text ?? '', '/invite/');

    const first = await request(app).post(`/api/invites/${token}/accept`).set(friend.auth);
    const second = await request(app).post(`/api/invites/${token}/accept`).set(other.auth);
    const repeat = await request(app).post(`/api/invites/${token}/accept`).set(friend.auth);

    expect(first.status).toBe(200);
    expect(second.status).toBe(410);
    expect(second.body.error.code).toBe('invite_used');
    expect(inviteAccepted.parse(repeat.body)).toEqual({ huntId: hunt.id, alreadyMember: true });
    expect((await request(app).get(`/api/hunts/${hunt.id}`).set(other.auth)).status).toBe(404);
  });

  it('when invitations are listed, withdrawn, mistyped or sent by crew or strangers, then only the owner manages them and each mistake has its answer', async () => {
    const owner = await registerUser(app, 'mail-owner3');
    const crew = await registerUser(app, 'mail-crew3');
    const stranger = await registerUser(app, 'mail-stranger3');
    const hunt = await createHunt(app, owner);
    await request(app).post(`/api/hunts/${hunt.id}/members`).set(owner.auth).send({ email: crew.email }).expect(201);
    const pending = inviteView.parse(
      (await request(app).post(`/api/hunts/${hunt.id}/invites`).set(owner.auth).send({ email: `pending-${Date.now()}@strapsift.test` }).expect(201)).body,
    );
    const token = linkIn((await waitForMail(pending.email, /invites you/)).text ?? '', '/invite/');

    expect(inviteList.parse((await request(app).get(`/api/hunts/${hunt.id}/invites`).set(owner.auth)).body).items.map((i) => i.id)).toEqual([pending.id]);
    expect((await request(app).get(`/api/hunts/${hunt.id}/invites`).set(crew.auth)).status).toBe(403);
    expect((await request(app).get(`/api/hunts/${hunt.id}/invites`).set(stranger.auth)).status).toBe(404);
    expect((await request(app).post(`/api/hunts/${hunt.id}/invites`).set(crew.auth).send({ email: 'x@strapsift.test' })).status).toBe(403);
    expect((await request(app).post(`/api/hunts/${hunt.id}/invites`).set(stranger.auth).send({ email: 'x@strapsift.test' })).status).toBe(404);
    const bad = await request(app).post(`/api/hunts/${hunt.id}/invites`).set(owner.auth).send({ email: 'not an address' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('email');
    expect((await request(app).post(`/api/hunts/${hunt.id}/invites`).set(owner.auth).send({ email: crew.email })).status).toBe(409);
    expect((await request(app).get('/api/invites/short')).status).toBe(400);
    expect((await request(app).get(`/api/invites/${'x'.repeat(43)}`)).status).toBe(404);

    await request(app).delete(`/api/hunts/${hunt.id}/invites/${pending.id}`).set(owner.auth).expect(204);

    expect((await request(app).get(`/api/invites/${token}`)).status).toBe(404);
    expect((await request(app).post(`/api/invites/${token}/accept`).set(stranger.auth)).status).toBe(404);
    expect((await request(app).delete(`/api/hunts/${hunt.id}/invites/${pending.id}`).set(owner.auth)).status).toBe(404);
  });
});

describe('POST /api/hunts/:id/summary-mail', () => {
  it('when the owner closes a hunt and asks for its summary, then a mail to their own address lists its figures and best finds, without values', async () => {
    const owner = await registerUser(app, 'mail-summary');
    const hunt = await createHunt(app, owner, { title: 'Closing week' });
    await postBatch(app, owner, [scanOf(hunt.id, '12121212', { pulled: true }), scanOf(hunt.id, '48205731'), scanOf(hunt.id, '77777777', { strap: 2 })]);
    await request(app).post(`/api/hunts/${hunt.id}/close`).set(owner.auth).expect(200);

    const sent = mailSent.parse((await request(app).post(`/api/hunts/${hunt.id}/summary-mail`).set(owner.auth).expect(200)).body);
    const mail = await waitForMail(owner.email, /summary/);

    expect(sent).toEqual({ sent: true, to: owner.email });
    expect(mail.subject).toBe('Strapsift hunt summary: Closing week');
    expect(mail.text).toMatch(/Notes searched\s+3/);
    expect(mail.text).toMatch(/Straps\s+2/);
    expect(mail.text).toMatch(/Pulled\s+1/);
    expect(mail.text).toContain('77777777');
    // Chance expects 3 × 9 / 99,999,999 ≈ 0.00000027 solids in three notes.
    expect(mail.text).toMatch(/solid\s+1 \(chance expects under 0\.000001\)/);
    expect(mail.text).toMatch(/binary\s+1 \(chance expects 0\.0003\)/);
    expect(mail.html).toContain('12121212');
    expect(mail.text).toContain(`${publicUrl()}/hunts/${hunt.id}`);
    expect(mail.text).toMatch(/Denomination\s+\$1/);
    expect(mail.text).not.toMatch(/value|worth|cents/i);
  });

  it('when crew or a stranger ask, then 403 and 404, and no mail goes out', async () => {
    const owner = await registerUser(app, 'mail-summary-owner');
    const crew = await registerUser(app, 'mail-summary-crew');
    const stranger = await registerUser(app, 'mail-summary-stranger');
    const hunt = await createHunt(app, owner);
    await request(app).post(`/api/hunts/${hunt.id}/members`).set(owner.auth).send({ email: crew.email }).expect(201);

    expect((await request(app).post(`/api/hunts/${hunt.id}/summary-mail`).set(crew.auth)).status).toBe(403);
    expect((await request(app).post(`/api/hunts/${hunt.id}/summary-mail`).set(stranger.auth)).status).toBe(404);
    expect((await request(app).post('/api/hunts/nope/summary-mail').set(owner.auth)).status).toBe(400);
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(await mailsTo(crew.email)).toEqual([]);
    expect(await mailsTo(stranger.email)).toEqual([]);
  });
});
