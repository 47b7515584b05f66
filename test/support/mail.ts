import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { MailMessage, Mailer } from '../../server/lib/mail';

/** The folder of .eml files the test script's mail catcher writes (scripts/fakes/mail-catcher.ts). */
export function mailDir(): string {
  const dir = process.env.MAIL_DIR;
  if (!dir) throw new Error('MAIL_DIR is not set; run the tests with `npm test`');
  return dir;
}

function recipients(mail: ParsedMail): string[] {
  const to = Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : [];
  return to.flatMap((address) => address.value.map((v) => (v.address ?? '').toLowerCase()));
}

/**
 * Waits until the catcher has stored a mail to `address` (optionally matching the subject) and returns
 * it parsed. Each test uses fresh addresses, so earlier runs' mail never matches.
 */
export async function waitForMail(address: string, subject?: RegExp, timeoutMs = 10_000): Promise<ParsedMail> {
  const deadline = Date.now() + timeoutMs;
  const wanted = address.toLowerCase();
  for (;;) {
    const dir = mailDir();
    const files = existsSync(dir) ? readdirSync(dir).filter((file) => file.endsWith('.eml')).sort().reverse() : [];
    for (const file of files) {
      const raw = readFileSync(join(dir, file));
      // Cheap filter before parsing: the address appears in the raw headers.
      if (!raw.includes(wanted)) continue;
      const mail = await simpleParser(raw);
      if (recipients(mail).includes(wanted) && (!subject || subject.test(mail.subject ?? ''))) return mail;
    }
    if (Date.now() > deadline) throw new Error(`no mail to ${address}${subject ? ` matching ${subject}` : ''} within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** Every mail stored for an address so far. */
export async function mailsTo(address: string): Promise<ParsedMail[]> {
  const dir = mailDir();
  if (!existsSync(dir)) return [];
  const wanted = address.toLowerCase();
  const found: ParsedMail[] = [];
  for (const file of readdirSync(dir).filter((name) => name.endsWith('.eml'))) {
    const raw = readFileSync(join(dir, file));
    if (!raw.includes(wanted)) continue;
    const mail = await simpleParser(raw);
    if (recipients(mail).includes(wanted)) found.push(mail);
  }
  return found;
}

/** Keeps every mail an app sends in memory, for tests that read a link without the mail catcher. */
export class MemoryMailer implements Mailer {
  readonly sent: MailMessage[] = [];
  async send(message: MailMessage): Promise<void> {
    this.sent.push(message);
  }
  to(address: string): MailMessage[] {
    return this.sent.filter((mail) => mail.to === address);
  }
}
