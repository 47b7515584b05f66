import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { PhotoSide, PhotoView } from '../../../shared/contracts/photos';
import { HttpError, conflict, notFound } from '../../lib/errors';
import { preparePhoto } from '../../lib/image';
import { logger } from '../../lib/logger';
import type { ObjectStore } from '../../lib/object-store';
import { PhotoEntity } from './photo.entity';

/** Every object of a user lives under this prefix, so deleting an account can sweep them all. */
export const userPrefix = (userId: string) => `users/${userId}/`;

const EXTENSION = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

export function toPhotoView(photo: PhotoEntity): PhotoView {
  const base = `/api/keepers/${photo.keeperId}/photos/${photo.id}`;
  return {
    id: photo.id,
    keeperId: photo.keeperId,
    side: photo.side,
    contentType: photo.contentType,
    byteSize: photo.byteSize,
    width: photo.width,
    height: photo.height,
    url: base,
    thumbUrl: `${base}/thumb`,
    createdAt: photo.createdAt.toISOString(),
  };
}

export interface PhotoBytes {
  body: Buffer;
  contentType: string;
  etag: string;
}

/** Per-account photo ceilings. */
export const PHOTO_QUOTA = { photos: 1_000, bytes: 2 * 1024 ** 3 } as const;

export class PhotosService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly store: ObjectStore,
  ) {}

  private photos() {
    return this.dataSource.getRepository(PhotoEntity);
  }

  private async ownedKeeper(userId: string, keeperId: string): Promise<void> {
    const rows: unknown[] = await this.dataSource.query(`SELECT 1 FROM keepers WHERE id = $1 AND user_id = $2`, [keeperId, userId]);
    if (rows.length === 0) throw notFound('No such keeper');
  }

  async list(userId: string, keeperId: string): Promise<PhotoView[]> {
    await this.ownedKeeper(userId, keeperId);
    return (await this.listFor([keeperId])).get(keeperId) ?? [];
  }

  /** Photos of many keepers in one query (keeper pages and lists); front before back. */
  async listFor(keeperIds: readonly string[]): Promise<Map<string, PhotoView[]>> {
    const byKeeper = new Map<string, PhotoView[]>();
    if (keeperIds.length === 0) return byKeeper;
    const photos = await this.photos()
      .createQueryBuilder('p')
      .where('p.keeper_id = ANY(:ids)', { ids: keeperIds })
      .orderBy('p.side', 'DESC')
      .getMany();
    for (const photo of photos) {
      const list = byKeeper.get(photo.keeperId) ?? [];
      list.push(toPhotoView(photo));
      byKeeper.set(photo.keeperId, list);
    }
    return byKeeper;
  }

  /**
   * Stores the bytes first and the row second, then drops the side's previous photo: a failure part-way
   * leaves at worst an unreferenced object under the user's prefix (swept with the account), never a
   * row pointing at nothing.
   */
  async upload(userId: string, keeperId: string, side: PhotoSide, bytes: Buffer): Promise<PhotoView> {
    await this.ownedKeeper(userId, keeperId);
    await this.checkQuota(userId, keeperId, side, bytes.length);
    const prepared = await preparePhoto(bytes);
    const id = randomUUID();
    const folder = `${userPrefix(userId)}keepers/${keeperId}/`;
    const objectKey = `${folder}${id}.${EXTENSION[prepared.contentType]}`;
    const thumbKey = `${folder}${id}-thumb.jpg`;
    await this.store.put(objectKey, prepared.body, prepared.contentType);
    await this.store.put(thumbKey, prepared.thumb, 'image/jpeg');
    const previous = await this.photos().findOne({ where: { keeperId, side } });
    let saved: PhotoEntity;
    try {
      saved = await this.dataSource.transaction(async (manager) => {
        if (previous) await manager.getRepository(PhotoEntity).delete({ id: previous.id });
        return manager.getRepository(PhotoEntity).save(
          manager.getRepository(PhotoEntity).create({
            id,
            keeperId,
            userId,
            side,
            contentType: prepared.contentType,
            byteSize: prepared.body.length,
            width: prepared.width,
            height: prepared.height,
            objectKey,
            thumbKey,
          }),
        );
      });
    } catch (error) {
      await this.store.delete([objectKey, thumbKey]).catch(() => undefined);
      const code = (error as { code?: string }).code;
      // Two uploads of one side racing: the unique index lets one win; the other is told to try again.
      if (code === '23505') throw conflict('Another photo of this side arrived at the same moment; try again');
      // The keeper was deleted while its photo was on the way.
      if (code === '23503') throw notFound('No such keeper');
      throw error;
    }
    if (previous) await this.forget([previous.objectKey, previous.thumbKey]);
    return toPhotoView(saved);
  }

  /** The bytes of the owner's photo (or its thumbnail). */
  /**
   * Generous per-account ceilings (two photos a keeper for hundreds of keepers): past them the answer is a
   * 413 saying which. A new photo of a side that already has one replaces it, so it is not counted twice.
   */
  private async checkQuota(userId: string, keeperId: string, side: PhotoSide, incoming: number): Promise<void> {
    const [usage] = (await this.dataSource.query(
      `SELECT count(*)::int AS photos, COALESCE(sum(byte_size), 0)::float8 AS bytes
         FROM photos WHERE user_id = $1 AND NOT (keeper_id = $2 AND side = $3)`,
      [userId, keeperId, side],
    )) as Array<{ photos: number; bytes: number }>;
    if ((usage?.photos ?? 0) + 1 > PHOTO_QUOTA.photos) {
      throw new HttpError(413, 'quota_exceeded', `Your account holds ${PHOTO_QUOTA.photos.toLocaleString('en-US')} photos, the most it can keep; delete some to add more`);
    }
    if ((usage?.bytes ?? 0) + incoming > PHOTO_QUOTA.bytes) {
      throw new HttpError(413, 'quota_exceeded', `Your photos fill the ${PHOTO_QUOTA.bytes / 1024 ** 3} GB your account can keep; delete some to add more`);
    }
  }

  async bytes(userId: string, keeperId: string, photoId: string, thumb: boolean): Promise<PhotoBytes> {
    const photo = await this.photos().findOne({ where: { id: photoId, keeperId, userId } });
    if (!photo) throw notFound('No such photo');
    return this.read(photo, thumb);
  }

  /** The bytes of a photo already known to be visible (through a share link). */
  async read(photo: PhotoEntity, thumb: boolean): Promise<PhotoBytes> {
    const object = await this.store.get(thumb ? photo.thumbKey : photo.objectKey);
    if (!object) throw notFound('No such photo');
    return { body: object.body, contentType: thumb ? 'image/jpeg' : photo.contentType, etag: `"${photo.id}${thumb ? '-t' : ''}"` };
  }

  async remove(userId: string, keeperId: string, photoId: string): Promise<void> {
    const photo = await this.photos().findOne({ where: { id: photoId, keeperId, userId } });
    if (!photo) throw notFound('No such photo');
    await this.photos().delete({ id: photo.id });
    await this.forget([photo.objectKey, photo.thumbKey]);
  }

  /** Before a keeper goes: its rows cascade, its objects must be deleted here. */
  async removeForKeeper(userId: string, keeperId: string): Promise<void> {
    const photos = await this.photos().find({ where: { keeperId, userId } });
    if (photos.length === 0) return;
    await this.store.delete(photos.flatMap((photo) => [photo.objectKey, photo.thumbKey]));
  }

  /** Before an account goes: every object under the user's prefix, referenced or not. */
  async removeAllForUser(userId: string): Promise<number> {
    return this.store.deletePrefix(userPrefix(userId));
  }

  // The row is gone already; an object that could not be deleted now is swept with the account.
  private async forget(keys: string[]): Promise<void> {
    await this.store.delete(keys).catch((error: unknown) => logger.warn({ err: error, keys }, 'photo objects left behind'));
  }
}
