import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config';
import { createObjectStore, type ObjectStore } from '../../server/lib/object-store';
import { keeperDetail, keeperList } from '../../shared/contracts/keepers';
import { PHOTO_MAX_BYTES, photoList, photoView } from '../../shared/contracts/photos';
import { drawJpeg, drawPng, drawWebp } from '../support/images';
import { missingId, openTestApi, registerUser, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
/** The same object store the app writes to (the s3rver fake the test script started), read directly. */
let store: ObjectStore;

beforeAll(async () => {
  api = await openTestApi();
  store = createObjectStore(config());
});
afterAll(async () => {
  await api.close();
});

async function keeperOf(user: TestUser, serial = '12121212'): Promise<string> {
  const response = await request(api.app).post('/api/keepers').set(user.auth).send({ serial, grade: 58 }).expect(201);
  return keeperDetail.parse(response.body).id;
}

function upload(user: TestUser, keeperId: string, side: string, bytes: Buffer, name = 'front.png', contentType = 'image/png') {
  return request(api.app).post(`/api/keepers/${keeperId}/photos`).set(user.auth).field('side', side).attach('photo', bytes, { filename: name, contentType });
}

/** supertest collects image bodies as Buffers only when told to. */
function getBytes(path: string, auth?: Record<string, string>) {
  const call = request(api.app).get(path);
  if (auth) call.set(auth);
  return call.buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (chunk: Buffer) => chunks.push(chunk));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
}

describe('POST /api/keepers/:id/photos', () => {
  it('when a PNG front and a JPEG back are uploaded, then both are stored in the object store and served back to the owner', async () => {
    const owner = await registerUser(api.app, 'photos');
    const keeperId = await keeperOf(owner);

    const front = await upload(owner, keeperId, 'front', drawPng(400, 170, 3));
    const back = await upload(owner, keeperId, 'back', await drawJpeg(4), 'back.jpg', 'image/jpeg');

    expect(front.status).toBe(201);
    expect(back.status).toBe(201);
    const frontView = photoView.parse(front.body);
    expect(frontView).toMatchObject({ keeperId, side: 'front', contentType: 'image/png', width: 400, height: 170 });
    expect(photoView.parse(back.body)).toMatchObject({ side: 'back', contentType: 'image/jpeg' });
    const keys = await store.list(`users/${owner.id}/`);
    expect(keys).toHaveLength(4); // two photos and their thumbnails
    expect(keys.every((key) => key.startsWith(`users/${owner.id}/keepers/${keeperId}/`))).toBe(true);

    const bytes = await getBytes(frontView.url, owner.auth);
    expect(bytes.status).toBe(200);
    expect(bytes.headers['content-type']).toBe('image/png');
    expect(bytes.headers['cache-control']).toContain('private');
    expect(await sharp(bytes.body as Buffer).metadata()).toMatchObject({ format: 'png', width: 400, height: 170 });
    const thumb = await getBytes(frontView.thumbUrl, owner.auth);
    expect(thumb.headers['content-type']).toBe('image/jpeg');
    const thumbMeta = await sharp(thumb.body as Buffer).metadata();
    expect(thumbMeta.width).toBe(320);
    expect(thumbMeta.height).toBe(136);
    const again = await request(api.app).get(frontView.url).set(owner.auth).set('If-None-Match', bytes.headers.etag as string);
    expect(again.status).toBe(304);
  });

  it('when photos exist, then the keeper page lists them front first and the keeper list carries the front thumbnail', async () => {
    const owner = await registerUser(api.app, 'photos-list');
    const keeperId = await keeperOf(owner, '45454545');
    const back = photoView.parse((await upload(owner, keeperId, 'back', await drawWebp(5), 'b.webp', 'image/webp').expect(201)).body);
    const front = photoView.parse((await upload(owner, keeperId, 'front', drawPng(300, 130, 6)).expect(201)).body);

    const detail = keeperDetail.parse((await request(api.app).get(`/api/keepers/${keeperId}`).set(owner.auth).expect(200)).body);
    const list = keeperList.parse((await request(api.app).get('/api/keepers').set(owner.auth).expect(200)).body);
    const photos = photoList.parse((await request(api.app).get(`/api/keepers/${keeperId}/photos`).set(owner.auth).expect(200)).body);

    expect(detail.photos.map((photo) => photo.side)).toEqual(['front', 'back']);
    expect(back.contentType).toBe('image/webp');
    expect(detail.thumbUrl).toBe(front.thumbUrl);
    expect(list.items.find((keeper) => keeper.id === keeperId)?.thumbUrl).toBe(front.thumbUrl);
    expect(photos.items.map((photo) => photo.id)).toEqual([front.id, back.id]);
  });

  it('when a side is uploaded again, then the new photo replaces the old one and the old bytes leave the store', async () => {
    const owner = await registerUser(api.app, 'photos-replace');
    const keeperId = await keeperOf(owner);
    const first = photoView.parse((await upload(owner, keeperId, 'front', drawPng(200, 100, 1)).expect(201)).body);
    const second = photoView.parse((await upload(owner, keeperId, 'front', drawPng(240, 100, 2)).expect(201)).body);

    expect(second.id).not.toBe(first.id);
    expect((await request(api.app).get(first.url).set(owner.auth)).status).toBe(404);
    expect((await getBytes(second.url, owner.auth)).status).toBe(200);
    expect(await store.list(`users/${owner.id}/`)).toHaveLength(2);
  });

  it('when a JPEG carries EXIF data such as a location, then the stored photo has none of it', async () => {
    const owner = await registerUser(api.app, 'photos-exif');
    const keeperId = await keeperOf(owner);
    const tagged = await sharp(drawPng(320, 140, 7))
      .withExif({ IFD0: { Copyright: 'Secret Street 12', ImageDescription: 'home safe' } })
      .jpeg()
      .toBuffer();
    expect((await sharp(tagged).metadata()).exif).toBeDefined();

    const stored = photoView.parse((await upload(owner, keeperId, 'front', tagged, 'x.jpg', 'image/jpeg').expect(201)).body);
    const served = await getBytes(stored.url, owner.auth);

    const meta = await sharp(served.body as Buffer).metadata();
    expect(meta.format).toBe('jpeg');
    expect(meta.exif).toBeUndefined();
    expect((served.body as Buffer).includes(Buffer.from('Secret Street'))).toBe(false);
  });
});

describe('POST /api/keepers/:id/photos refuses', () => {
  it('when the bytes are not JPEG, PNG or WebP whatever the name and type say, then 400 names the photo field and nothing is stored', async () => {
    const owner = await registerUser(api.app, 'photos-type');
    const keeperId = await keeperOf(owner);
    const text = await upload(owner, keeperId, 'front', Buffer.from('just some text pretending'), 'front.png', 'image/png');
    const gif = await upload(owner, keeperId, 'front', Buffer.from('GIF89a\x01\x00\x01\x00\x00\x00\x00;', 'binary'), 'front.jpg', 'image/jpeg');
    const broken = await upload(owner, keeperId, 'front', Buffer.concat([drawPng(100, 50).subarray(0, 40), Buffer.alloc(200, 7)]));

    expect(text.status).toBe(400);
    expect(text.body.error).toMatchObject({ code: 'unsupported_type', fields: { photo: expect.stringContaining('JPEG, PNG or WebP') } });
    expect(gif.status).toBe(400);
    expect(gif.body.error.code).toBe('unsupported_type');
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('unreadable_image');
    expect(await store.list(`users/${owner.id}/`)).toEqual([]);
  });

  it('when the file is over 10 MB, then 413 says the limit', async () => {
    const owner = await registerUser(api.app, 'photos-size');
    const keeperId = await keeperOf(owner);
    const huge = Buffer.concat([drawPng(10, 10), Buffer.alloc(PHOTO_MAX_BYTES, 1)]);

    const response = await upload(owner, keeperId, 'front', huge);

    expect(response.status).toBe(413);
    expect(response.body.error).toMatchObject({ code: 'too_large', message: 'A photo must be at most 10 MB' });
    expect(await store.list(`users/${owner.id}/`)).toEqual([]);
  });

  it('when the side or the file is missing or wrong, then 400 names the field', async () => {
    const owner = await registerUser(api.app, 'photos-fields');
    const keeperId = await keeperOf(owner);
    const noSide = await request(api.app).post(`/api/keepers/${keeperId}/photos`).set(owner.auth).attach('photo', drawPng(), 'a.png');
    const badSide = await upload(owner, keeperId, 'top', drawPng());
    const noFile = await request(api.app).post(`/api/keepers/${keeperId}/photos`).set(owner.auth).field('side', 'front');
    const wrongField = await request(api.app).post(`/api/keepers/${keeperId}/photos`).set(owner.auth).field('side', 'front').attach('picture', drawPng(), 'a.png');
    const json = await request(api.app).post(`/api/keepers/${keeperId}/photos`).set(owner.auth).send({ side: 'front' });

    expect(noSide.status).toBe(400);
    expect(noSide.body.error.fields).toHaveProperty('side');
    expect(badSide.status).toBe(400);
    expect(badSide.body.error.fields.side).toBe('must be front or back');
    expect(noFile.status).toBe(400);
    expect(noFile.body.error.fields).toHaveProperty('photo');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.fields).toHaveProperty('picture');
    expect(json.status).toBe(400);
  });

  it('when the keeper is another user’s, missing or not an id, then 404, 404 and 400; signed out, 401', async () => {
    const owner = await registerUser(api.app, 'photos-owner');
    const stranger = await registerUser(api.app, 'photos-stranger');
    const keeperId = await keeperOf(owner);
    const photo = photoView.parse((await upload(owner, keeperId, 'front', drawPng()).expect(201)).body);

    expect((await upload(stranger, keeperId, 'back', drawPng())).status).toBe(404);
    expect((await upload(owner, missingId(), 'back', drawPng())).status).toBe(404);
    expect((await upload(owner, 'nope', 'back', drawPng())).status).toBe(400);
    expect((await request(api.app).post(`/api/keepers/${keeperId}/photos`).field('side', 'back').attach('photo', drawPng(), 'a.png')).status).toBe(401);
    expect((await request(api.app).get(photo.url).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get(photo.thumbUrl).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get(photo.url)).status).toBe(401);
    expect((await request(api.app).delete(photo.url).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get(`/api/keepers/${keeperId}/photos`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get(`/api/keepers/${keeperId}/photos/not-an-id`).set(owner.auth)).status).toBe(400);
    expect(await store.list(`users/${stranger.id}/`)).toEqual([]);
    expect(await store.list(`users/${owner.id}/`)).toHaveLength(2);
  });
});

describe('DELETE photos, keepers and accounts', () => {
  it('when a photo is deleted, then its row and bytes are gone and fetching it answers 404', async () => {
    const owner = await registerUser(api.app, 'photos-delete');
    const keeperId = await keeperOf(owner);
    const photo = photoView.parse((await upload(owner, keeperId, 'front', drawPng()).expect(201)).body);

    await request(api.app).delete(photo.url).set(owner.auth).expect(204);

    expect((await request(api.app).get(photo.url).set(owner.auth)).status).toBe(404);
    expect((await request(api.app).delete(photo.url).set(owner.auth)).status).toBe(404);
    expect(await store.list(`users/${owner.id}/`)).toEqual([]);
    expect(keeperDetail.parse((await request(api.app).get(`/api/keepers/${keeperId}`).set(owner.auth)).body).photos).toEqual([]);
  });

  it('when a keeper is deleted, then its photos leave the object store and the other keeper keeps its own', async () => {
    const owner = await registerUser(api.app, 'photos-keeper-delete');
    const going = await keeperOf(owner, '11112222');
    const staying = await keeperOf(owner, '33334444');
    await upload(owner, going, 'front', drawPng()).expect(201);
    await upload(owner, going, 'back', drawPng()).expect(201);
    await upload(owner, staying, 'front', drawPng()).expect(201);

    await request(api.app).delete(`/api/keepers/${going}`).set(owner.auth).expect(204);

    const keys = await store.list(`users/${owner.id}/`);
    expect(keys).toHaveLength(2);
    expect(keys.every((key) => key.includes(staying))).toBe(true);
  });

  it('when an account is deleted, then every photo it stored is removed from the object store, and another account’s stay', async () => {
    const leaving = await registerUser(api.app, 'photos-leaving');
    const staying = await registerUser(api.app, 'photos-staying');
    const a = await keeperOf(leaving, '12341234');
    const b = await keeperOf(leaving, '56785678');
    const c = await keeperOf(staying, '90909090');
    await upload(leaving, a, 'front', drawPng()).expect(201);
    await upload(leaving, b, 'back', await drawJpeg(), 'b.jpg', 'image/jpeg').expect(201);
    await upload(staying, c, 'front', drawPng()).expect(201);
    expect(await store.list(`users/${leaving.id}/`)).toHaveLength(4);

    await request(api.app).delete('/api/me').set(leaving.auth).expect(204);

    expect(await store.list(`users/${leaving.id}/`)).toEqual([]);
    expect(await api.dataSource.query('SELECT id FROM photos WHERE user_id = $1', [leaving.id])).toEqual([]);
    expect(await store.list(`users/${staying.id}/`)).toHaveLength(2);
  });
});
