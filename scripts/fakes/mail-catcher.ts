import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/**
 * A local SMTP server that keeps every message it receives as an .eml file, and a small inbox page
 * to read them, so reset links and invitations can be followed on a development machine.
 */
export async function startMailCatcher(options: { smtpPort: number; inboxPort: number; directory: string }) {
  mkdirSync(options.directory, { recursive: true });
  let counter = 0;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'Strapsift development mail catcher',
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        counter += 1;
        const name = `${new Date().toISOString().replace(/[:.]/g, '-')}-${String(counter).padStart(4, '0')}.eml`;
        writeFileSync(join(options.directory, name), Buffer.concat(chunks));
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(options.smtpPort, '127.0.0.1', () => resolve());
  });

  const escape = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
  const inbox = createServer(async (req, res) => {
    try {
      const files = readdirSync(options.directory).filter((file) => file.endsWith('.eml')).sort().reverse();
      const url = new URL(req.url ?? '/', 'http://127.0.0.1');
      const wanted = url.pathname.replace(/^\/+/, '');
      if (wanted && files.includes(wanted)) {
        const mail = await simpleParser(readFileSync(join(options.directory, wanted)));
        res.setHeader('Content-Type', 'text/html; charset=utf-8');
        res.end(
          `<!doctype html><meta charset="utf-8"><title>${escape(mail.subject ?? '')}</title><body style="font-family:sans-serif;max-width:760px;margin:2rem auto">` +
            `<p><a href="/">← inbox</a></p><h1>${escape(mail.subject ?? '(no subject)')}</h1>` +
            `<p>From ${escape(mail.from?.text ?? '')}<br>To ${escape(Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : (mail.to?.text ?? ''))}<br>${escape(String(mail.date ?? ''))}</p>` +
            `<h2>Text</h2><pre style="white-space:pre-wrap">${escape(mail.text ?? '')}</pre>` +
            (mail.html ? `<h2>HTML</h2><iframe sandbox style="width:100%;height:480px;border:1px solid #ccc" srcdoc="${escape(mail.html)}"></iframe>` : '') +
            '</body>',
        );
        return;
      }
      const rows = await Promise.all(
        files.slice(0, 200).map(async (file) => {
          const mail = await simpleParser(readFileSync(join(options.directory, file)));
          const to = Array.isArray(mail.to) ? mail.to.map((a) => a.text).join(', ') : (mail.to?.text ?? '');
          return `<tr><td>${escape(String(mail.date?.toISOString() ?? ''))}</td><td>${escape(to)}</td><td><a href="/${file}">${escape(mail.subject ?? '(no subject)')}</a></td></tr>`;
        }),
      );
      res.setHeader('Content-Type', 'text/html; charset=utf-8');
      res.end(
        `<!doctype html><meta charset="utf-8"><title>Strapsift dev inbox</title><body style="font-family:sans-serif;max-width:960px;margin:2rem auto">` +
          `<h1>Strapsift development inbox</h1><p>Every mail the app sent on this machine (files in ${escape(options.directory)}).</p>` +
          `<table cellpadding="6"><tr><th>Sent</th><th>To</th><th>Subject</th></tr>${rows.join('') || '<tr><td colspan="3">No mail yet.</td></tr>'}</table></body>`,
      );
    } catch (error) {
      res.statusCode = 500;
      res.end(String(error));
    }
  });
  await new Promise<void>((resolve, reject) => {
    inbox.once('error', reject);
    inbox.listen(options.inboxPort, '127.0.0.1', () => resolve());
  });
  return {
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => inbox.close(() => resolve()));
    },
  };
}
