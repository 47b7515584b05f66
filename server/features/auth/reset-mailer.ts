/** Everything a reset e-mail needs; SmtpResetMailer (reset-mail.ts) renders it and sends it over SMTP. */
export interface ResetMessage {
  to: string;
  displayName: string;
  /** The raw token: it exists only here and in the link, never in the database. */
  token: string;
  link: string;
  expiresAt: Date;
}

/** Where reset messages go: SMTP in the app, an in-memory outbox where a test wants to read the token. */
export interface ResetMailer {
  sendReset(message: ResetMessage): Promise<void>;
}

/**
 * Keeps the last messages in memory so tests can read the token without a mail server.
 * Bounded, so a long-running process cannot grow without limit.
 */
export class InMemoryResetOutbox implements ResetMailer {
  readonly sent: ResetMessage[] = [];

  constructor(private readonly capacity = 100) {}

  async sendReset(message: ResetMessage): Promise<void> {
    this.sent.push(message);
    if (this.sent.length > this.capacity) this.sent.splice(0, this.sent.length - this.capacity);
  }

  /** The newest message to an address, if any. */
  latestFor(email: string): ResetMessage | undefined {
    return [...this.sent].reverse().find((message) => message.to === email);
  }
}
