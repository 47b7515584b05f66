import type { KeeperSummary } from '../../../shared/contracts/keepers';
import type { PhotoView } from '../../../shared/contracts/photos';
import { idsOf } from '../../lib/patterns';
import type { KeeperEntity } from './keeper.entity';

/** Photos of a keeper, as the photo feature answers them; lists use their thumbnails. */
export interface KeeperPhotos {
  listFor(keeperIds: readonly string[]): Promise<Map<string, PhotoView[]>>;
}

export const noPhotos: KeeperPhotos = { listFor: async () => new Map() };

function thumbOf(photos: readonly PhotoView[] | undefined): string | null {
  return photos?.find((photo) => photo.side === 'front')?.thumbUrl ?? photos?.[0]?.thumbUrl ?? null;
}

/** A stored keeper as the API answers it in lists. */
export function toSummary(keeper: KeeperEntity, photos?: readonly PhotoView[]): KeeperSummary {
  return {
    id: keeper.id,
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
    originalPaper: keeper.originalPaper,
    starRunSize: keeper.starRunSize,
    estimatedValueCents: keeper.estimatedValueCents,
    status: keeper.status,
    notes: keeper.notes,
    patterns: idsOf(keeper.patternMask),
    points: Number(keeper.points),
    huntId: keeper.huntId,
    scanId: keeper.scanId,
    foundAt: keeper.foundAt.toISOString(),
    createdAt: keeper.createdAt.toISOString(),
    updatedAt: keeper.updatedAt.toISOString(),
    thumbUrl: thumbOf(photos),
  };
}
