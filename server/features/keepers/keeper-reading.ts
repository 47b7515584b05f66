import { read } from '../../../shared/engine';
import type { Reading } from '../../../shared/engine';
import { HttpError } from '../../lib/errors';
import { maskOf } from '../../lib/patterns';
import type { ReadingContext } from '../weights/weights.service';
import type { KeeperEntity } from './keeper.entity';

/** What a keeper's reading depends on besides the owner's weights and watch patterns. */
export type NoteFacts = Pick<KeeperEntity, 'serial' | 'star' | 'series' | 'district' | 'facility' | 'denomination' | 'starRunSize'>;

/** The engine's reading of a keeper with its owner's weights and watch list; null when the serial does not parse. */
export function readNote(facts: NoteFacts, context: ReadingContext): Reading | null {
  const reading = read(facts.serial, {
    weights: context.weights,
    watch: context.watch,
    star: facts.star,
    series: facts.series ?? undefined,
    district: facts.district ?? undefined,
    facility: facts.facility ?? undefined,
    denomination: facts.denomination ?? undefined,
    starRunSize: facts.starRunSize,
  });
  return reading.ok ? reading : null;
}

/** A serial the engine refuses is the hunter's mistake: a 400 on the serial field. */
export function unreadable(message: string): HttpError {
  return new HttpError(400, 'invalid', 'Some fields need attention', { serial: message });
}

/** The columns a keeper stores from its reading, so lists sort and filter without reading every serial again. */
export function scoredColumns(reading: Reading): Pick<KeeperEntity, 'digits' | 'prefix' | 'suffix' | 'star' | 'patternMask' | 'points'> {
  return {
    digits: reading.digits,
    prefix: reading.prefix,
    suffix: reading.suffix,
    star: reading.star,
    patternMask: maskOf(reading.patterns),
    points: reading.score.points,
  };
}
