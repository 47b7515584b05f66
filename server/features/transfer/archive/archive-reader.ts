import type { z } from 'zod';
import {
  ARCHIVE_JSON,
  ARCHIVE_PHOTO_NAME,
  ARCHIVE_README,
  archiveAccount,
  archiveHeader,
  archiveHunt,
  archiveKeeper,
  archiveNote,
  archivePhoto,
  archiveWatchPattern,
  archiveWeightTable,
  type ArchiveAccount,
  type ArchiveHunt,
  type ArchiveKeeper,
  type ArchiveLimits,
  type ArchiveNote,
  type ArchivePhoto,
  type ArchiveWatchPattern,
  type ArchiveWeightTable,
} from '../../../../shared/contracts/archive';
import { isoDateTime } from '../../../../shared/contracts/common';
import type { PhotoSide } from '../../../../shared/contracts/photos';
import { fieldsFromZod } from '../../../lib/errors';
import { ArchiveProblem, MAX_PROBLEMS, type ProblemView } from './archive-problem';
import { JsonSections, type JsonSectionEvent } from './json-sections';
import { walkZip, type EntrySink } from './zip-walk';

export interface PhotoFile {
  name: string;
  keeperId: string;
  side: PhotoSide;
  extension: string;
  bytes: Buffer;
}

/** What a pass over an archive does with each record that passed its contract. */
export interface ArchiveVisitor {
  account?(account: ArchiveAccount, exportedAt: string): void | Promise<void>;
  weightTable?(table: ArchiveWeightTable): void | Promise<void>;
  watchPattern?(pattern: ArchiveWatchPattern): void | Promise<void>;
  hunt?(hunt: ArchiveHunt, where: string): void | Promise<void>;
  note?(note: ArchiveNote, where: string): void | Promise<void>;
  keeper?(keeper: ArchiveKeeper, where: string): void | Promise<void>;
  photo?(photo: ArchivePhoto, where: string): void | Promise<void>;
  /** A photo file; left out of a pass that does not ask for photos (their bytes are skipped). */
  photoFile?(file: PhotoFile): void | Promise<void>;
  /** The end of a section of strapsift.json (notes, keepers…): a chance to write what is batched. */
  sectionEnd?(section: string): void | Promise<void>;
}

const SECTIONS: Record<string, { schema: z.ZodTypeAny; call: keyof ArchiveVisitor; max: number }> = {
  weightTables: { schema: archiveWeightTable, call: 'weightTable', max: 200 },
  watchPatterns: { schema: archiveWatchPattern, call: 'watchPattern', max: 1000 },
  hunts: { schema: archiveHunt, call: 'hunt', max: 20_000 },
  notes: { schema: archiveNote, call: 'note', max: 2_000_000 },
  keepers: { schema: archiveKeeper, call: 'keeper', max: 200_000 },
  photos: { schema: archivePhoto, call: 'photo', max: 400_000 },
};
const REQUIRED = ['format', 'version', 'exportedAt', 'account', ...Object.keys(SECTIONS)];

/** A name that tries to leave the folder it is unpacked into, whatever the reader does with it. */
const escapes = (name: string) => name.includes('..') || name.startsWith('/') || name.includes('\\') || /^[a-zA-Z]:/.test(name) || name.includes('\0');

/**
 * Reads an uploaded archive from disk in one streaming pass and hands each record that passes the shared
 * contract to the visitor. Problems with one record are collected (up to MAX_PROBLEMS) and the record is
 * skipped; problems with the archive as a whole (not a zip, wrong version, an entry name that escapes its
 * folder, a zip bomb) throw an ArchiveProblem at once.
 */
export async function readArchive(path: string, limits: ArchiveLimits, visitor: ArchiveVisitor, problems: ProblemView[]): Promise<void> {
  const seen = new Set<string>();
  let sawJson = false;
  const report = (where: string, message: string) => {
    if (problems.length < MAX_PROBLEMS) problems.push({ where, message });
  };

  const jsonSink = (): EntrySink => {
    const sections = new JsonSections(ARCHIVE_JSON, limits.recordBytes);
    const decoder = new TextDecoder('utf-8', { fatal: true });
    const header: Record<string, unknown> = {};
    const seenKeys = new Set<string>();
    let account: ArchiveAccount | null = null;
    let exportedAt: string | null = null;

    const handle = async (event: JsonSectionEvent) => {
      const key = event.key;
      if (key !== 'format' && key !== 'version' && !('version' in header && 'format' in header)) {
        throw new ArchiveProblem(ARCHIVE_JSON, 'must begin with "format" and "version"');
      }
      if (event.kind === 'end-array') {
        await visitor.sectionEnd?.(key);
        return;
      }
      if (event.kind === 'value') {
        if (seenKeys.has(key)) throw new ArchiveProblem(ARCHIVE_JSON, `has "${key}" twice`);
        seenKeys.add(key);
        if (key === 'format' || key === 'version') {
          header[key] = event.value;
          if ('format' in header && 'version' in header) {
            const parsed = archiveHeader.safeParse(header);
            if (!parsed.success) {
              const [field, message] = Object.entries(fieldsFromZod(parsed.error))[0] ?? ['format', 'is not a Strapsift archive'];
              throw new ArchiveProblem(`${ARCHIVE_JSON} ${field}`, message);
            }
          }
          return;
        }
        if (key === 'exportedAt') {
          const parsed = isoDateTime.safeParse(event.value);
          if (!parsed.success) report(`${ARCHIVE_JSON} exportedAt`, 'must be an ISO date and time');
          else exportedAt = parsed.data;
        } else if (key === 'account') {
          const parsed = archiveAccount.safeParse(event.value);
          if (!parsed.success) for (const [field, message] of Object.entries(fieldsFromZod(parsed.error))) report(`account.${field}`, message);
          else account = parsed.data;
        } else if (Object.hasOwn(SECTIONS, key)) throw new ArchiveProblem(`${ARCHIVE_JSON} ${key}`, 'must be a list');
        else throw new ArchiveProblem(ARCHIVE_JSON, `has "${key}", which is not part of a version 1 archive`);
        if (account && exportedAt) await visitor.account?.(account, exportedAt);
        return;
      }
      // Own keys only: a member called "toString" must not find Object.prototype's.
      const section = Object.hasOwn(SECTIONS, key) ? SECTIONS[key] : undefined;
      if (!section) throw new ArchiveProblem(ARCHIVE_JSON, `has "${key}", which is not part of a version 1 archive`);
      if (event.index === 0) {
        if (seenKeys.has(key)) throw new ArchiveProblem(ARCHIVE_JSON, `has "${key}" twice`);
        seenKeys.add(key);
      }
      if (event.index >= section.max) throw new ArchiveProblem(ARCHIVE_JSON, `has more than ${section.max} ${key}`);
      const where = `${key}[${event.index}]`;
      const parsed = section.schema.safeParse(event.value);
      if (!parsed.success) {
        for (const [field, message] of Object.entries(fieldsFromZod(parsed.error))) report(`${where}.${field}`, message);
        return;
      }
      const call = visitor[section.call] as ((value: unknown, where: string) => void | Promise<void>) | undefined;
      await call?.call(visitor, parsed.data, where);
    };

    const run = async (events: JsonSectionEvent[]) => {
      for (const event of events) await handle(event);
    };
    return {
      limit: limits.jsonBytes,
      data: async (chunk) => {
        let text: string;
        try {
          text = decoder.decode(chunk, { stream: true });
        } catch {
          throw new ArchiveProblem(ARCHIVE_JSON, 'is not UTF-8 text');
        }
        await run(sections.push(text));
      },
      end: async () => {
        await run(sections.push(decoder.decode()));
        await run(sections.end());
        for (const key of REQUIRED) {
          // An empty array is still present: `end-array` events do not mark keys, so count them here.
          if (!seenKeys.has(key) && !Object.hasOwn(SECTIONS, key)) throw new ArchiveProblem(ARCHIVE_JSON, `has no "${key}"`);
        }
        sawJson = true;
      },
    };
  };

  const photoSink = (name: string, match: RegExpExecArray): EntrySink => {
    const chunks: Buffer[] = [];
    return {
      limit: limits.photoBytes,
      data: (chunk) => {
        if (visitor.photoFile) chunks.push(Buffer.from(chunk));
      },
      end: async () => {
        if (!visitor.photoFile) return;
        await visitor.photoFile({ name, keeperId: match[1]!, side: match[2] as PhotoSide, extension: match[3]!, bytes: Buffer.concat(chunks) });
        chunks.length = 0;
      },
    };
  };

  const ignore = (limit: number): EntrySink => ({ limit, data: () => undefined, end: () => undefined });

  await walkZip(path, limits, (name) => {
    if (escapes(name)) throw new ArchiveProblem(name, 'points outside the archive; archives with such names are refused');
    if (seen.has(name)) throw new ArchiveProblem(name, 'appears twice in the archive');
    seen.add(name);
    if (name === ARCHIVE_JSON) return jsonSink();
    if (name === ARCHIVE_README) return ignore(limits.readmeBytes);
    if (name === 'photos/') return ignore(0);
    const photo = ARCHIVE_PHOTO_NAME.exec(name);
    if (photo) return photoSink(name, photo);
    throw new ArchiveProblem(name, 'is not a file a Strapsift archive holds');
  });
  if (!sawJson) throw new ArchiveProblem('archive', `has no ${ARCHIVE_JSON}; it is not a Strapsift archive`);
}
