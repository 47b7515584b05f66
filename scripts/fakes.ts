// Starts the local stand-ins for hosted services: an S3-compatible object store for photos and an
// SMTP mail catcher with an inbox page. `npm start` and `npm test` run this and stop it by PID.
import { resolve } from 'node:path';
import { startMailCatcher } from './fakes/mail-catcher';
import { startObjectStore } from './fakes/object-store';

const root = resolve(__dirname, '..');
const prefix = process.env.FAKES_PREFIX ? `-${process.env.FAKES_PREFIX}` : '';
const port = (name: string, fallback: number) => Number(process.env[name] ?? fallback);

async function main(): Promise<void> {
  const store = await startObjectStore({
    port: port('S3_PORT', 4569),
    directory: resolve(root, `.data/s3${prefix}`),
    bucket: process.env.S3_BUCKET ?? 'strapsift-photos',
  });
  const mail = await startMailCatcher({
    smtpPort: port('SMTP_PORT', 2525),
    inboxPort: port('INBOX_PORT', 8025),
    directory: resolve(root, `.data/mail${prefix}`),
  });
  console.error(
    `fakes ready: object store http://127.0.0.1:${port('S3_PORT', 4569)}, SMTP 127.0.0.1:${port('SMTP_PORT', 2525)}, inbox http://127.0.0.1:${port('INBOX_PORT', 8025)}`,
  );
  const stop = () => {
    void Promise.allSettled([store.close(), mail.close()]).then(() => process.exit(0));
    setTimeout(() => process.exit(0), 2000).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error('the local fakes failed to start:', error);
  process.exit(1);
});
