import { Router, type RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { idParams } from '../../../shared/contracts/common';
import type { MailSent } from '../../../shared/contracts/invites';
import { PATTERN_NAMES } from '../../../shared/engine';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { HttpError } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { oneLine, renderMail, type Mailer } from '../../lib/mail';
import { idsOf } from '../../lib/patterns';
import { parse } from '../../lib/validate';
import { huntAccess, requireOwner } from '../crew/hunt-access';
import type { TallyService } from '../tally/tally.service';
import type { HuntsService } from './hunts.service';

const count = (n: number) => n.toLocaleString('en-US');
const day = (iso: string | null) => (iso ? iso.slice(0, 10) : '—');
/** Expected counts for a few notes are tiny; show them plainly, never as 0.00 or in exponent form. */
const expected = (n: number) => (n >= 0.01 ? n.toFixed(2) : n >= 0.000001 ? String(Number(n.toPrecision(1))) : 'under 0.000001');

/**
 * The hunt's figures by mail, to its owner's own address only (there is no recipient to choose), so the
 * route cannot be used to mail anyone else. No values or amounts: the mail may sit in an inbox for years.
 */
export class HuntSummaryService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly hunts: HuntsService,
    private readonly tally: TallyService,
    private readonly mailer: Mailer,
    private readonly publicUrl: () => string,
  ) {}

  async send(userId: string, huntId: string): Promise<MailSent> {
    requireOwner(await huntAccess(this.dataSource, huntId, userId), 'mail its summary');
    const [hunt, figures, owner, hits] = await Promise.all([
      this.hunts.get(userId, huntId),
      this.tally.hunt(userId, huntId),
      this.dataSource.query(`SELECT email, display_name FROM users WHERE id = $1`, [userId]) as Promise<Array<{ email: string; display_name: string }>>,
      this.dataSource.query(
        `SELECT serial, pattern_mask, points FROM scans WHERE hunt_id = $1 AND points > 0 ORDER BY points DESC, scanned_at, id LIMIT 10`,
        [huntId],
      ) as Promise<Array<{ serial: string; pattern_mask: number; points: number }>>,
    ]);
    const to = owner[0]!.email;
    const patternRows = figures.patterns
      .filter((row) => row.hits > 0)
      .map((row): [string, string] => [row.name, `${count(row.hits)} (chance expects ${expected(row.expected)})`]);
    const body = renderMail(`Hunt summary: ${hunt.title}`, [
      { text: `Hello ${owner[0]!.display_name}, here is how “${hunt.title}” went.` },
      {
        rows: [
          ['Source', hunt.source || 'not given'],
          ['Denomination', `$${hunt.denomination}`],
          ['Started', day(hunt.startedAt)],
          ['Closed', hunt.status === 'closed' ? day(hunt.closedAt) : 'still open'],
          ['Straps', count(hunt.strapCount)],
          ['Notes searched', count(hunt.notesSearched)],
          ['Finds', `${count(hunt.hits)} (${figures.perThousand.toFixed(1)} per 1,000)`],
          ['Pulled', count(hunt.pulled)],
          ['Crew', hunt.memberCount > 1 ? `${hunt.memberCount - 1} besides you` : 'just you'],
        ],
      },
      ...(patternRows.length ? [{ text: 'Finds by pattern, against what chance predicts for as many notes:' }, { rows: patternRows }] : []),
      ...(hits.length
        ? [
            { text: 'Best finds:' },
            {
              rows: hits.map((row): [string, string] => [
                row.serial,
                `${idsOf(row.pattern_mask).map((id) => PATTERN_NAMES[id]).join(', ') || 'watch pattern'} · ${Number(row.points).toFixed(1)} pts`,
              ]),
            },
          ]
        : [{ text: 'No finds this time.' }]),
      { link: `${this.publicUrl().replace(/\/$/, '')}/hunts/${hunt.id}`, label: 'Open the hunt' },
      { small: figures.caveat },
    ]);
    try {
      await this.mailer.send({ to, subject: oneLine(`Strapsift hunt summary: ${hunt.title}`), ...body });
    } catch (error) {
      logger.error({ err: error, huntId }, 'hunt summary mail could not be sent');
      throw new HttpError(502, 'mail_failed', 'The summary could not be sent just now; try again in a minute');
    }
    return { sent: true, to };
  }
}

export function huntSummaryRoutes(summary: HuntSummaryService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.post(
    '/hunts/:id/summary-mail',
    requireAuth,
    route(async (req, res) => {
      res.json(await summary.send(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  return router;
}
