import type { DataSource, EntityManager } from 'typeorm';
import { DEFAULT_WEIGHTS, completeWeights } from '../../../shared/engine';
import type { WatchPattern, WeightTable } from '../../../shared/engine';
import type {
  CreateWeightTableRequest,
  ReplaceWeightTableRequest,
  WeightTableList,
  WeightTableValues,
  WeightTableView,
} from '../../../shared/contracts/weights';
import { HttpError, conflict, notFound } from '../../lib/errors';
import { WeightTableEntity } from './weight-table.entity';

export const DEFAULT_TABLE_NAME = 'Standard';
const MAX_TABLES = 20;

/** What the engine needs besides the serial to score a note for one user. */
export interface ReadingContext {
  weights: WeightTable;
  watch: WatchPattern[];
}

/** A plain, mutable copy of the engine's frozen defaults, fit for a jsonb column. */
export function defaultWeights(): WeightTable {
  return JSON.parse(JSON.stringify(DEFAULT_WEIGHTS)) as WeightTable;
}

function toView(table: WeightTableEntity): WeightTableView {
  return {
    id: table.id,
    name: table.name,
    active: table.active,
    // A table saved before a pattern existed shows (and scores) with that pattern's default weight.
    weights: completeWeights(table.weights) as WeightTableValues,
    createdAt: table.createdAt.toISOString(),
    updatedAt: table.updatedAt.toISOString(),
  };
}

function isUniqueViolation(error: unknown): boolean {
  return (error as { code?: string }).code === '23505';
}

export class WeightsService {
  constructor(private readonly dataSource: DataSource) {}

  private tables(manager: EntityManager = this.dataSource.manager) {
    return manager.getRepository(WeightTableEntity);
  }

  /**
   * Gives a user the engine's default table, active, unless they have a table already. Safe to call
   * twice at once: the unique indexes let one insert through and the other does nothing.
   */
  async ensureDefault(userId: string, manager: EntityManager = this.dataSource.manager): Promise<void> {
    await manager.query(
      `INSERT INTO weight_tables (user_id, name, active, weights)
       SELECT $1, $2, true, $3::jsonb
        WHERE NOT EXISTS (SELECT 1 FROM weight_tables WHERE user_id = $1)
       ON CONFLICT DO NOTHING`,
      [userId, DEFAULT_TABLE_NAME, JSON.stringify(defaultWeights())],
    );
  }

  /** The active table and the watch patterns: what every reading made for this user is scored with. */
  async readingContext(userId: string, manager: EntityManager = this.dataSource.manager): Promise<ReadingContext> {
    const [tables, watch] = await Promise.all([
      manager.query(`SELECT weights FROM weight_tables WHERE user_id = $1 AND active`, [userId]) as Promise<Array<{ weights: WeightTable }>>,
      manager.query(`SELECT pattern FROM watch_patterns WHERE user_id = $1 ORDER BY created_at, id`, [userId]) as Promise<
        Array<{ pattern: WatchPattern }>
      >,
    ]);
    return { weights: completeWeights(tables[0]?.weights ?? defaultWeights()), watch: watch.map((row) => row.pattern) };
  }

  /** The active table alone, for figures that only need its low limit or threshold. */
  async activeWeights(userId: string): Promise<WeightTable> {
    const rows: Array<{ weights: WeightTable }> = await this.dataSource.query(`SELECT weights FROM weight_tables WHERE user_id = $1 AND active`, [userId]);
    return completeWeights(rows[0]?.weights ?? defaultWeights());
  }

  async list(userId: string): Promise<WeightTableList> {
    await this.ensureDefault(userId);
    const tables = await this.tables().find({ where: { userId }, order: { createdAt: 'ASC', id: 'ASC' } });
    return { items: tables.map(toView), defaults: defaultWeights() as WeightTableValues };
  }

  private async owned(manager: EntityManager, userId: string, id: string): Promise<WeightTableEntity> {
    const table = await this.tables(manager).findOne({ where: { id, userId } });
    if (!table) throw notFound('No such weight table');
    return table;
  }

  async create(userId: string, request: CreateWeightTableRequest): Promise<WeightTableView> {
    await this.ensureDefault(userId);
    return this.dataSource.transaction(async (manager) => {
      // Locks the user's tables so a concurrent activate cannot leave two active.
      const existing = await manager.query(`SELECT id FROM weight_tables WHERE user_id = $1 FOR UPDATE`, [userId]);
      if (existing.length >= MAX_TABLES) throw new HttpError(409, 'limit', `You can keep up to ${MAX_TABLES} weight tables; delete one first`);
      if (request.activate) await manager.query(`UPDATE weight_tables SET active = false WHERE user_id = $1 AND active`, [userId]);
      try {
        const saved = await this.tables(manager).save(
          this.tables(manager).create({
            userId,
            name: request.name,
            active: request.activate === true,
            weights: (request.weights ?? defaultWeights()) as WeightTable,
          }),
        );
        return toView(saved);
      } catch (error) {
        if (isUniqueViolation(error)) throw conflict('You already have a weight table with that name');
        throw error;
      }
    });
  }

  async replace(userId: string, id: string, request: ReplaceWeightTableRequest): Promise<WeightTableView> {
    const table = await this.owned(this.dataSource.manager, userId, id);
    table.name = request.name;
    table.weights = request.weights as WeightTable;
    try {
      return toView(await this.tables().save(table));
    } catch (error) {
      if (isUniqueViolation(error)) throw conflict('You already have a weight table with that name');
      throw error;
    }
  }

  async activate(userId: string, id: string): Promise<WeightTableView> {
    return this.dataSource.transaction(async (manager) => {
      await manager.query(`SELECT id FROM weight_tables WHERE user_id = $1 FOR UPDATE`, [userId]);
      const table = await this.owned(manager, userId, id);
      if (!table.active) {
        await manager.query(`UPDATE weight_tables SET active = false WHERE user_id = $1 AND active`, [userId]);
        await manager.query(`UPDATE weight_tables SET active = true, updated_at = now() WHERE id = $1`, [id]);
      }
      return toView(await this.owned(manager, userId, id));
    });
  }

  async remove(userId: string, id: string): Promise<void> {
    const table = await this.owned(this.dataSource.manager, userId, id);
    if (table.active) throw conflict('This is your active weight table; activate another one before deleting it');
    await this.tables().delete({ id, userId });
  }
}
