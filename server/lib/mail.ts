import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config';

/** One message with both parts: mail clients that show no HTML get the same words as text. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/**
 * Sends through nodemailer. The transport is injectable: the app builds an SMTP one from the config
 * (locally the mail catcher of scripts/fakes.ts), tests may pass nodemailer's stream or JSON transport.
 */
export class NodemailerMailer implements Mailer {
  constructor(
    private readonly transport: Transporter,
    private readonly from: string,
  ) {}

  async send(message: MailMessage): Promise<void> {
    await this.transport.sendMail({ from: this.from, to: message.to, subject: oneLine(message.subject), text: message.text, html: message.html });
  }
}

export function createSmtpMailer(settings: Pick<Config, 'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASSWORD' | 'MAIL_FROM'>): Mailer {
  const transport = nodemailer.createTransport({
    host: settings.SMTP_HOST,
    port: settings.SMTP_PORT,
    secure: settings.SMTP_SECURE === 'true',
    auth: settings.SMTP_USER ? { user: settings.SMTP_USER, pass: settings.SMTP_PASSWORD ?? '' } : undefined,
    // A mail server that does not answer must not hold a request for minutes.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return new NodemailerMailer(transport, settings.MAIL_FROM);
}

/**
 * A subject line built from user text (hunt titles, display names): line breaks and other control
 * characters become spaces, so no one can start a new header or a forged body through a name.
 */
// eslint-disable-next-line no-control-regex -- control characters are exactly what this removes
export const oneLine = (text: string) => text.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]+/g, ' ').trim();

export const escapeHtml = (text: string) =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** A paragraph of the HTML part, or a button-like link. Every value is escaped here, once. */
export type MailBlock = { text: string } | { link: string; label: string } | { rows: Array<[string, string]> } | { small: string };

/**
 * Renders the two parts of a mail from the same blocks, so text and HTML never say different things.
 * The HTML is plain and inline-styled: mail clients ignore style sheets.
 */
export function renderMail(heading: string, blocks: MailBlock[]): { text: string; html: string } {
  const text: string[] = [heading, ''];
  const html: string[] = [
    `<h1 style="font-size:20px;font-weight:600;margin:0 0 16px">${escapeHtml(heading)}</h1>`,
  ];
  for (const block of blocks) {
    if ('text' in block) {
      text.push(block.text, '');
      html.push(`<p style="margin:0 0 14px;line-height:1.5">${escapeHtml(block.text)}</p>`);
    } else if ('link' in block) {
      text.push(`${block.label}: ${block.link}`, '');
      html.push(
        `<p style="margin:0 0 18px"><a href="${escapeHtml(block.link)}" style="display:inline-block;background:#2F4A3A;color:#ffffff;padding:10px 16px;border-radius:8px;text-decoration:none;font-weight:600">${escapeHtml(block.label)}</a></p>`,
        `<p style="margin:0 0 14px;font-size:12px;color:#555">Or open this address: ${escapeHtml(block.link)}</p>`,
      );
    } else if ('rows' in block) {
      const width = Math.max(...block.rows.map(([label]) => label.length), 0);
      for (const [label, value] of block.rows) text.push(`${label.padEnd(width)}  ${value}`);
      text.push('');
      html.push(
        `<table cellpadding="4" style="border-collapse:collapse;margin:0 0 16px;font-family:'IBM Plex Mono',Menlo,monospace;font-size:14px">${block.rows
          .map(([label, value]) => `<tr><td style="color:#555;padding-right:16px">${escapeHtml(label)}</td><td>${escapeHtml(value)}</td></tr>`)
          .join('')}</table>`,
      );
    } else {
      text.push(block.small, '');
      html.push(`<p style="margin:0 0 10px;font-size:12px;color:#666;line-height:1.4">${escapeHtml(block.small)}</p>`);
    }
  }
  text.push('— Strapsift');
  return {
    text: text.join('\n'),
    html: `<!doctype html><html><body style="margin:0;padding:24px;background:#F5F1E8;color:#1E2320;font-family:-apple-system,Segoe UI,Roboto,sans-serif"><div style="max-width:560px;margin:0 auto;background:#ffffff;border:1px solid #DDD6C8;border-radius:12px;padding:24px">${html.join('')}<p style="margin:18px 0 0;font-size:12px;color:#666">— Strapsift</p></div></body></html>`,
  };
}
