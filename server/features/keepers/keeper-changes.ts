import { read } from '../../../shared/engine';
import type { UpdateKeeperRequest } from '../../../shared/contracts/keepers';
import type { KeeperEntity } from './keeper.entity';
import { unreadable } from './keeper-reading';

/**
 * Applies a hunter's edit to a stored keeper, field by field (a field left out stays as it was).
 * A new serial must parse, and its prefix names the district unless the edit names one too.
 */
export function applyChanges(keeper: KeeperEntity, change: UpdateKeeperRequest): void {
  if (change.serial !== undefined) {
    const reading = read(change.serial);
    if (!reading.ok) throw unreadable(reading.error.message);
    keeper.serial = change.serial;
    if (change.district === undefined && reading.district) keeper.district = reading.district;
  }
  if (change.star !== undefined) keeper.star = change.star;
  if (change.series !== undefined) keeper.series = change.series;
  if (change.district !== undefined) keeper.district = change.district;
  if (change.facility !== undefined) keeper.facility = change.facility;
  if (change.denomination !== undefined) keeper.denomination = change.denomination;
  if (change.grade !== undefined) keeper.grade = change.grade;
  if (change.originalPaper !== undefined) keeper.originalPaper = change.originalPaper;
  if (change.starRunSize !== undefined) keeper.starRunSize = change.starRunSize;
  if (change.estimatedValueCents !== undefined) keeper.estimatedValueCents = change.estimatedValueCents;
  if (change.status !== undefined) keeper.status = change.status;
  if (change.notes !== undefined) keeper.notes = change.notes || null;
  if (change.foundAt !== undefined) keeper.foundAt = new Date(change.foundAt);
}
