import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { scrubUrl } from '../../server/lib/logger';
import { keeperDetail } from '../../shared/contracts/keepers';
import { photoView } from '../../shared/contracts/photos';
import { shareLinkView, shareStatus, sharedKeeper } from '../../shared/contracts/share';
import { drawPng } from '../support/images';
import { missingId, openTestApi, registerUser, type TestApi, type TestUser } from '../support/api';

let api: TestApi;

beforeAll(async () => {
  api = await openTestApi();
});
afterAll(async () => {
  await api.close();
});

async function privateKeeper(owner: TestUser) {
  const created = await request(api.app)
    .post('/api/keepers')
    .set(owner.auth)
    .send({ serial: 'MB 12121212 A', series: '2017A', grade: 64, estimatedValueCents: 4500, notes: 'from the Mill Street teller', status: 'kept' })
    .expect(201);
  const keeper = keeperDetail.parse(created.body);
  await request(api.app).post(`/api/keepers/${keeper.id}/photos`).set(owner.auth).field('side', 'front').attach('photo', drawPng(), 'f.png').expect(201);
  return keeper;
}

const tokenOf = (url: string) => url.split('/share/')[1]!;

describe('share links', () => {
  it('when the owner shares a keeper, then anyone with the link sees the note and its photos, and nothing about the owner', async () => {
    const owner = await registerUser(api.app, 'share-owner');
    const keeper = await privateKeeper(owner);

    const created = await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(owner.auth);
    expect(created.status).toBe(201);
    const link = shareLinkView.parse(created.body);
    const token = tokenOf(link.url!);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/); // 256 random bits
    expect(link.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/share\//);

    const page = await request(api.app).get(`/api/share/${token}`);
    expect(page.status).toBe(200);
    expect(page.headers['cache-control']).toBe('no-store');
    const shared = sharedKeeper.parse(page.body);
    expect(shared).toMatchObject({ serial: 'MB 12121212 A', digits: '12121212', series: '2017A', district: 'B', grade: 64, star: false });
    expect(shared.patterns.map((p) => p.id)).toEqual(['repeater', 'super-repeater', 'binary']);
    expect(shared.patterns[0]!.oneIn).toBeCloseTo(10001, 0); // 9,999 repeaters in 99,999,999 serials
    expect(Object.keys(page.body).sort()).toEqual(
      ['denomination', 'digits', 'district', 'facility', 'grade', 'patterns', 'photos', 'prefix', 'serial', 'series', 'star', 'suffix'].sort(),
    );
    const text = JSON.stringify(page.body);
    for (const secret of [owner.email, 'Test share-owner', '4500', 'Mill Street', owner.id, keeper.id, 'kept']) expect(text).not.toContain(secret);
    expect(shared.photos).toHaveLength(1);
    const photo = await request(api.app).get(shared.photos[0]!.url);
    expect(photo.status).toBe(200);
    // Only the small copy leaves through a share link (TRADE.md: a shared picture should be small and one-sided).
    expect(photo.headers['content-type']).toBe('image/jpeg');
    expect((await request(api.app).get(shared.photos[0]!.thumbUrl)).headers['content-type']).toBe('image/jpeg');
    expect((await request(api.app).get(`${shared.photos[0]!.url.replace(/\/thumb$/, '')}`)).headers['content-type']).toBe('image/jpeg');

    const status = shareStatus.parse((await request(api.app).get(`/api/keepers/${keeper.id}/share`).set(owner.auth)).body);
    expect(status.active?.id).toBe(link.id);
    expect(status.active?.url).toBeUndefined();
    const stored: Array<{ token_hash: string }> = await api.dataSource.query('SELECT token_hash FROM share_links WHERE id = $1', [link.id]);
    expect(stored[0]!.token_hash).not.toContain(token);
  });

  it('when a keeper has a front and a back photo, then the link shows the front alone, and the back cannot be fetched through it', async () => {
    const owner = await registerUser(api.app, 'share-one-side');
    const keeper = await privateKeeper(owner);
    const back = await request(api.app).post(`/api/keepers/${keeper.id}/photos`).set(owner.auth).field('side', 'back').attach('photo', drawPng(), 'b.png').expect(201);
    const token = tokenOf(shareLinkView.parse((await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(owner.auth)).body).url!);
    const shared = sharedKeeper.parse((await request(api.app).get(`/api/share/${token}`)).body);
    expect(shared.photos.map((p) => p.side)).toEqual(['front']);
    const backId = photoView.parse(back.body).id;
    expect((await request(api.app).get(`/api/share/${token}/photos/${backId}`)).status).toBe(404);
    expect((await request(api.app).get(`/api/share/${token}/photos/${backId}/thumb`)).status).toBe(404);
  });

  it('when the link is revoked, then the page and its photos answer 404; a new link replaces the old one', async () => {
    const owner = await registerUser(api.app, 'share-revoke');
    const keeper = await privateKeeper(owner);
    const first = tokenOf(shareLinkView.parse((await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(owner.auth).expect(201)).body).url!);
    const shared = sharedKeeper.parse((await request(api.app).get(`/api/share/${first}`).expect(200)).body);

    await request(api.app).delete(`/api/keepers/${keeper.id}/share`).set(owner.auth).expect(204);

    expect((await request(api.app).get(`/api/share/${first}`)).status).toBe(404);
    expect((await request(api.app).get(shared.photos[0]!.url)).status).toBe(404);
    expect(shareStatus.parse((await request(api.app).get(`/api/keepers/${keeper.id}/share`).set(owner.auth)).body).active).toBeNull();
    await request(api.app).delete(`/api/keepers/${keeper.id}/share`).set(owner.auth).expect(204);

    const second = tokenOf(shareLinkView.parse((await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(owner.auth).expect(201)).body).url!);
    const third = tokenOf(shareLinkView.parse((await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(owner.auth).expect(201)).body).url!);
    expect((await request(api.app).get(`/api/share/${second}`)).status).toBe(404);
    expect((await request(api.app).get(`/api/share/${third}`)).status).toBe(200);

    await request(api.app).delete(`/api/keepers/${keeper.id}`).set(owner.auth).expect(204);
    expect((await request(api.app).get(`/api/share/${third}`)).status).toBe(404);
  });

  it('when someone else’s keeper, a photo of another keeper or a malformed token is asked for, then 404 or 400', async () => {
    const owner = await registerUser(api.app, 'share-a');
    const stranger = await registerUser(api.app, 'share-b');
    const keeper = await privateKeeper(owner);
    const other = await privateKeeper(owner);
    const otherPhoto = photoView.parse((await request(api.app).get(`/api/keepers/${other.id}/photos`).set(owner.auth)).body.items[0]);
    const token = tokenOf(shareLinkView.parse((await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(owner.auth).expect(201)).body).url!);

    expect((await request(api.app).post(`/api/keepers/${keeper.id}/share`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).delete(`/api/keepers/${keeper.id}/share`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get(`/api/keepers/${keeper.id}/share`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).post(`/api/keepers/${missingId()}/share`).set(owner.auth)).status).toBe(404);
    expect((await request(api.app).post(`/api/keepers/${keeper.id}/share`)).status).toBe(401);
    expect((await request(api.app).get(`/api/share/${token}/photos/${otherPhoto.id}`)).status).toBe(404);
    expect((await request(api.app).get(`/api/share/${token}/photos/nope`)).status).toBe(400);
    expect((await request(api.app).get('/api/share/too-short')).status).toBe(400);
    expect((await request(api.app).get(`/api/share/${'A'.repeat(43)}`)).status).toBe(404);
  });

  it('when a share or invitation address is logged, then its token is replaced', () => {
    const token = 'Q'.repeat(43);
    expect(scrubUrl(`/api/share/${token}/photos/1`)).toBe('/api/share/[redacted]/photos/1');
    expect(scrubUrl(`/share/${token}`)).toBe('/share/[redacted]');
    expect(scrubUrl(`/api/invites/${token}/accept`)).toBe('/api/invites/[redacted]/accept');
    expect(scrubUrl(`/reset-password?token=${token}`)).toBe('/reset-password?token=[redacted]');
    expect(scrubUrl(`/x?a=1&token=${token}&b=2`)).toBe('/x?a=1&token=[redacted]&b=2');
    expect(scrubUrl('/api/keepers?limit=5')).toBe('/api/keepers?limit=5');
  });
});
