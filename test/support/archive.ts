import type { Express } from 'express';
import { strFromU8, strToU8, unzipSync, zipSync, type Zippable } from 'fflate';
import request from 'supertest';

/** The archive as the server streams it, whole, for a test to open. */
export async function downloadArchive(app: Express, auth: Record<string, string>): Promise<Buffer> {
  const response = await request(app)
    .get('/api/export/archive')
    .set(auth)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
  if (response.status !== 200) throw new Error(`archive export failed: ${response.status}`);
  return response.body as Buffer;
}

export function uploadArchive(app: Express, auth: Record<string, string>, zip: Uint8Array, query = '') {
  return request(app).post(`/api/import/archive${query}`).set(auth).attach('archive', Buffer.from(zip), 'strapsift-archive.zip');
}

export interface OpenedArchive {
  files: Record<string, Uint8Array>;
  json: ArchiveJson;
}

/** strapsift.json as a test reads it: loosely typed, to compare and to tamper with. */
export type ArchiveJson = Record<string, unknown> & {
  format: string;
  version: number;
  account: Record<string, unknown>;
  hunts: Array<Record<string, unknown>>;
  notes: Array<Record<string, unknown>>;
  keepers: Array<Record<string, unknown>>;
  photos: Array<Record<string, unknown>>;
  weightTables: Array<Record<string, unknown>>;
  watchPatterns: Array<Record<string, unknown>>;
};

export function openArchive(zip: Uint8Array): OpenedArchive {
  const files = unzipSync(zip);
  return { files, json: JSON.parse(strFromU8(files['strapsift.json']!)) as ArchiveJson };
}

/** The same files zipped again, with strapsift.json and any file replaced or added. */
export function rezip(archive: OpenedArchive, change: { json?: unknown; files?: Zippable } = {}): Uint8Array {
  const files: Zippable = { ...archive.files };
  files['strapsift.json'] = strToU8(JSON.stringify(change.json ?? archive.json));
  Object.assign(files, change.files ?? {});
  return zipSync(files, { level: 1 });
}
