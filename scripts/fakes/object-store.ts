import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

/** A local S3-compatible store: the photo code talks to it through the real AWS SDK over HTTP. */
export async function startObjectStore(options: { port: number; directory: string; bucket: string }) {
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket }],
  });
  await server.run();
  return { close: () => server.close() };
}
