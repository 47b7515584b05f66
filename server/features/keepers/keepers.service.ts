import type { DataSource } from 'typeorm';
import { read } from '../../../shared/engine';
import type { Reading } from '../../../shared/engine';
import type { CreateKeeperRequest, KeeperDetail, KeeperList, KeeperListQuery, UpdateKeeperRequest } from '../../../shared/contracts/keepers';
import { notFound } from '../../lib/errors';
import type { WeightsService } from '../weights/weights.service';
import { KeeperEntity } from './keeper.entity';
import { applyChanges } from './keeper-changes';
import { keeperPage } from './keeper-list';
import { readNote, scoredColumns, unreadable } from './keeper-reading';
import { noPhotos, toSummary, type KeeperPhotos } from './keeper-view';
import { factsOf, loggedNote, newKeeperColumns, typedNote, type KeeperSource } from './new-keeper';

export type BeforeRemoveKeeper = (userId: string, keeperId: string) => Promise<void>;

/**
 * A hunter's keepers: list, read, keep, edit, remove. The pieces live beside it, one job a file:
 * the list query (keeper-list), where a new keeper comes from (new-keeper), edits (keeper-changes),
 * the engine's reading (keeper-reading) and the answer's shape (keeper-view).
 */
export class KeepersService {
  private readonly beforeRemoveHooks: BeforeRemoveKeeper[] = [];

  constructor(
    private readonly dataSource: DataSource,
    private readonly weights: WeightsService,
    private readonly photos: KeeperPhotos = noPhotos,
  ) {}

  /** Data kept outside PostgreSQL (photo bytes in the object store) is cleaned up here. */
  onBeforeRemove(hook: BeforeRemoveKeeper): void {
    this.beforeRemoveHooks.push(hook);
  }

  async list(userId: string, query: KeeperListQuery): Promise<KeeperList> {
    const { ids, nextCursor } = await keeperPage(this.dataSource, userId, query);
    const entities = ids.length ? await this.keepers().findBy(ids.map((id) => ({ id, userId }))) : [];
    const byId = new Map(entities.map((keeper) => [keeper.id, keeper]));
    const photos = await this.photos.listFor(ids);
    return { items: ids.map((id) => toSummary(byId.get(id)!, photos.get(id))), nextCursor };
  }

  async get(userId: string, id: string): Promise<KeeperDetail> {
    const keeper = await this.owned(userId, id);
    const reading = readNote(keeper, await this.weights.readingContext(userId));
    if (!reading) throw new Error(`keeper ${id} holds a serial the engine cannot read`);
    return this.detail(keeper, reading);
  }

  /**
   * From a logged note or typed in. Keeping the same logged note twice returns the first keeper
   * (200 instead of 201), so a retried request never makes two.
   */
  async create(userId: string, request: CreateKeeperRequest): Promise<{ keeper: KeeperDetail; created: boolean }> {
    const context = await this.weights.readingContext(userId);
    let source: KeeperSource;
    if (request.scanId) {
      source = await loggedNote(this.dataSource, userId, request.scanId);
      const existing = await this.keptFrom(userId, request.scanId);
      if (existing) return { keeper: existing, created: false };
    } else {
      source = typedNote(request.serial!);
    }

    const facts = factsOf(source, request);
    const reading = read(facts.serial);
    if (!reading.ok) throw unreadable(reading.error.message);
    // A typed-in serial's prefix names its district unless the hunter said otherwise.
    if (request.district === undefined && facts.district === null) facts.district = reading.district;
    const scored = readNote(facts, context)!;
    try {
      const saved = await this.keepers().save(this.keepers().create(newKeeperColumns(userId, source, facts, scored, request)));
      return { keeper: await this.detail(saved, scored), created: true };
    } catch (error) {
      // Two "keep" taps racing for one note: the unique index lets one through, the other gets it back.
      if ((error as { code?: string }).code === '23505' && request.scanId) {
        const existing = await this.keptFrom(userId, request.scanId);
        if (existing) return { keeper: existing, created: false };
      }
      throw error;
    }
  }

  async update(userId: string, id: string, change: UpdateKeeperRequest): Promise<KeeperDetail> {
    const keeper = await this.owned(userId, id);
    applyChanges(keeper, change);
    const scored = readNote(keeper, await this.weights.readingContext(userId));
    if (!scored) throw unreadable('is not a serial');
    Object.assign(keeper, scoredColumns(scored));
    const saved = await this.keepers().save(keeper);
    return this.detail(saved, scored);
  }

  async remove(userId: string, id: string): Promise<void> {
    await this.owned(userId, id);
    for (const hook of this.beforeRemoveHooks) await hook(userId, id);
    const result = await this.keepers().delete({ id, userId });
    if (!result.affected) throw notFound('No such keeper');
  }

  private keepers() {
    return this.dataSource.getRepository(KeeperEntity);
  }

  private async owned(userId: string, id: string): Promise<KeeperEntity> {
    const keeper = await this.keepers().findOne({ where: { id, userId } });
    if (!keeper) throw notFound('No such keeper');
    return keeper;
  }

  /** The keeper this hunter already made from a logged note, if any. */
  private async keptFrom(userId: string, scanId: string): Promise<KeeperDetail | null> {
    const existing = await this.keepers().findOne({ where: { userId, scanId } });
    return existing ? this.get(userId, existing.id) : null;
  }

  private async detail(keeper: KeeperEntity, reading: Reading): Promise<KeeperDetail> {
    const photos = (await this.photos.listFor([keeper.id])).get(keeper.id) ?? [];
    return { ...toSummary(keeper, photos), reading, photos };
  }
}
