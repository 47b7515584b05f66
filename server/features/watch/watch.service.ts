import type { DataSource } from 'typeorm';
import { WATCH_SYNTAX, parseWatchPattern, watchText } from '../../../shared/engine';
import type { CreateWatchRequest, WatchList, WatchView } from '../../../shared/contracts/watch';
import { HttpError, conflict, notFound } from '../../lib/errors';
import { WatchPatternEntity } from './watch-pattern.entity';

const MAX_PATTERNS = 100;

function toView(row: WatchPatternEntity): WatchView {
  return { id: row.id, text: row.text, label: row.label, pattern: row.pattern, createdAt: row.createdAt.toISOString() };
}

export class WatchService {
  constructor(private readonly dataSource: DataSource) {}

  private patterns() {
    return this.dataSource.getRepository(WatchPatternEntity);
  }

  async list(userId: string): Promise<WatchList> {
    const rows = await this.patterns().find({ where: { userId }, order: { createdAt: 'ASC', id: 'ASC' } });
    return { items: rows.map(toView), syntax: WATCH_SYNTAX };
  }

  /** The engine's parser is the only judge of a pattern, so the keypad and the server agree on what it matches. */
  async create(userId: string, request: CreateWatchRequest): Promise<WatchView> {
    const parsed = parseWatchPattern(request.pattern);
    if (!parsed.ok) throw new HttpError(400, 'invalid', 'That is not a watch pattern', { pattern: parsed.error.message });
    if ((await this.patterns().count({ where: { userId } })) >= MAX_PATTERNS) {
      throw new HttpError(409, 'limit', `You can keep up to ${MAX_PATTERNS} watch patterns; delete one first`);
    }
    const text = watchText(parsed.pattern);
    try {
      const saved = await this.patterns().save(this.patterns().create({ userId, text, label: request.label || null, pattern: parsed.pattern }));
      return toView(saved);
    } catch (error) {
      if ((error as { code?: string }).code === '23505') throw conflict(`You already watch ${text}`);
      throw error;
    }
  }

  async remove(userId: string, id: string): Promise<void> {
    const result = await this.patterns().delete({ id, userId });
    if (!result.affected) throw notFound('No such watch pattern');
  }
}
