import { IsNull, type DataSource } from 'typeorm';
import { PATTERN_NAMES, read } from '../../../shared/engine';
import type { ShareLinkView, SharedKeeper, ShareStatus } from '../../../shared/contracts/share';
import { notFound } from '../../lib/errors';
import { hashSecretToken, newSecretToken } from '../../lib/secret-token';
import { KeeperEntity } from '../keepers/keeper.entity';
import { PhotoEntity } from '../photos/photo.entity';
import type { PhotoBytes, PhotosService } from '../photos/photos.service';
import { ShareLinkEntity } from './share-link.entity';

/**
 * Read-only links to one keeper. A keeper has at most one live link: making a new one revokes the old,
 * so the owner always knows which link is out there.
 */
export class ShareService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly photos: PhotosService,
    private readonly publicUrl: () => string,
  ) {}

  private links() {
    return this.dataSource.getRepository(ShareLinkEntity);
  }

  private async ownedKeeper(userId: string, keeperId: string): Promise<void> {
    if (!(await this.dataSource.getRepository(KeeperEntity).exists({ where: { id: keeperId, userId } }))) throw notFound('No such keeper');
  }

  async status(userId: string, keeperId: string): Promise<ShareStatus> {
    await this.ownedKeeper(userId, keeperId);
    const live = await this.links().findOne({ where: { keeperId, userId, revokedAt: IsNull() } });
    return { active: live ? { id: live.id, createdAt: live.createdAt.toISOString() } : null };
  }

  async create(userId: string, keeperId: string): Promise<ShareLinkView> {
    await this.ownedKeeper(userId, keeperId);
    const token = newSecretToken();
    const link = await this.dataSource.transaction(async (manager) => {
      await manager.query(`UPDATE share_links SET revoked_at = now() WHERE keeper_id = $1 AND user_id = $2 AND revoked_at IS NULL`, [keeperId, userId]);
      const repo = manager.getRepository(ShareLinkEntity);
      return repo.save(repo.create({ keeperId, userId, tokenHash: hashSecretToken(token), revokedAt: null }));
    });
    return { id: link.id, createdAt: link.createdAt.toISOString(), url: `${this.publicUrl().replace(/\/$/, '')}/share/${token}` };
  }

  /** Revoking twice, or with no link out, is not an error: the result is the same, no live link. */
  async revoke(userId: string, keeperId: string): Promise<void> {
    await this.ownedKeeper(userId, keeperId);
    await this.dataSource.query(`UPDATE share_links SET revoked_at = now() WHERE keeper_id = $1 AND user_id = $2 AND revoked_at IS NULL`, [keeperId, userId]);
  }

  private async liveKeeper(token: string): Promise<KeeperEntity> {
    const link = await this.links().findOne({ where: { tokenHash: hashSecretToken(token) } });
    if (!link || link.revokedAt) throw notFound('This share link does not exist or was withdrawn');
    const keeper = await this.dataSource.getRepository(KeeperEntity).findOne({ where: { id: link.keeperId, userId: link.userId } });
    if (!keeper) throw notFound('This share link does not exist or was withdrawn');
    return keeper;
  }

  /** The note as a stranger may see it: no owner, value, status, notes, dates or hunt. */
  async view(token: string): Promise<SharedKeeper> {
    const keeper = await this.liveKeeper(token);
    const reading = read(keeper.serial, { star: keeper.star });
    const odds = reading.ok ? reading.odds.patterns : [];
    const photo = await this.sharedPhoto(keeper.id);
    const base = `/api/share/${token}/photos`;
    return {
      serial: keeper.serial,
      digits: keeper.digits,
      prefix: keeper.prefix,
      suffix: keeper.suffix,
      star: keeper.star,
      series: keeper.series,
      district: keeper.district,
      facility: keeper.facility,
      denomination: keeper.denomination,
      grade: keeper.grade,
      patterns: odds.map(({ id, oneIn }) => ({ id, name: PATTERN_NAMES[id], oneIn: Number.isFinite(oneIn) ? oneIn : null })),
      // One side only, and only its small copy: TRADE.md's caution on reproductions of currency.
      photos: photo
        ? [{ id: photo.id, side: photo.side, url: `${base}/${photo.id}/thumb`, thumbUrl: `${base}/${photo.id}/thumb`, width: photo.width, height: photo.height }]
        : [],
    };
  }

  /** The one photo a share link shows: the front when there is one, else the back. */
  private async sharedPhoto(keeperId: string): Promise<PhotoEntity | null> {
    const photos = await this.dataSource.getRepository(PhotoEntity).find({ where: { keeperId }, order: { side: 'DESC' } });
    return photos.find((p) => p.side === 'front') ?? photos[0] ?? null;
  }

  /** Only the shared side, and only small, whichever address is asked for: the full-size photo stays the owner's. */
  async photo(token: string, photoId: string, _thumb: boolean): Promise<PhotoBytes> {
    const keeper = await this.liveKeeper(token);
    const photo = await this.sharedPhoto(keeper.id);
    if (!photo || photo.id !== photoId) throw notFound('No such photo');
    return this.photos.read(photo, true);
  }
}
