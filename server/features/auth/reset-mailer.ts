import { logger } from '../../lib/logger';

/** Everything a reset e-mail needs; the mail issue renders it and sends it over SMTP. */
export interface ResetMessage {
  to: string;
  displayName: string;
  /** The raw token: it exists only here and in the link, never in the database. */
  token: string;
  link: string;
  expiresAt: Date;
}

/** Where reset messages go. The mail issue plugs an SMTP implementation in through createApp's options. */
export interface ResetMailer {
  sendReset(message: ResetMessage): Promise<void>;
}

/**
 * Keeps the last messages in memory so tests (and a developer, until mail exists) can read the token.
 * Bounded, so a long-running server cannot grow without limit.
 */
export class InMemoryResetOutbox implements ResetMailer {
  readonly sent: ResetMessage[] = [];

  constructor(
    private readonly capacity = 100,
    private readonly logLinks = false,
  ) {}

  async sendReset(message: ResetMessage): Promise<void> {
    this.sent.push(message);
    if (this.sent.length > this.capacity) this.sent.splice(0, this.sent.length - this.capacity);
    // Until the mail issue lands, a developer has no other way to open the link; never in production.
    if (this.logLinks) logger.info({ to: message.to, resetLink: message.link }, 'password reset link (development outbox)');
  }

  /** The newest message to an address, if any. */
  latestFor(email: string): ResetMessage | undefined {
    return [...this.sent].reverse().find((message) => message.to === email);
  }
}
