import { createReadStream } from 'node:fs';
import { open, type FileHandle } from 'node:fs/promises';
import { Inflate } from 'fflate';
import type { ArchiveLimits } from '../../../../shared/contracts/archive';
import { ArchiveProblem } from './archive-problem';
import { crc32 } from './crc32';

/** Where one entry's bytes go, and how many it may have once decompressed. */
export interface EntrySink {
  limit: number;
  data(chunk: Uint8Array): void | Promise<void>;
  end(): void | Promise<void>;
}

/** Answers the sink for an entry by its name, or throws an ArchiveProblem for a name that has no place. */
export type OpenEntry = (name: string) => EntrySink;

/**
 * Small reads keep what one read can inflate to bounded: deflate expands at most about 1,032 to 1, so
 * 16 KB read becomes at most ~16 MB before the limits below see it and stop.
 */
const READ_BYTES = 16 * 1024;
/** The index of 50,000 entries with long names fits in a few megabytes; a claim of more is a damaged file. */
const MAX_INDEX_BYTES = 64 * 1024 * 1024;

interface IndexEntry {
  name: string;
  method: number;
  crc: number;
  compressedSize: number;
  size: number;
  offset: number;
}

const problem = (message: string) => new ArchiveProblem('archive', message);

async function readAt(file: FileHandle, position: number, length: number): Promise<Buffer> {
  const buffer = Buffer.alloc(length);
  const { bytesRead } = await file.read(buffer, 0, length, position);
  if (bytesRead !== length) throw problem('is cut short or damaged');
  return buffer;
}

/**
 * The zip's own index (its central directory), found from the end-of-archive record. Entries are read
 * from where the index says they are, never by scanning the data for signatures: a photo's bytes may
 * well contain "PK\x03\x04", and a streaming reader that scans would cut the photo there.
 */
async function readIndex(file: FileHandle, size: number, limits: ArchiveLimits): Promise<IndexEntry[]> {
  const tailLength = Math.min(size, 22 + 0xffff);
  if (tailLength < 22) throw problem('is not a zip file');
  const tail = await readAt(file, size - tailLength, tailLength);
  let end = -1;
  for (let i = tailLength - 22; i >= 0; i--) {
    if (tail.readUInt32LE(i) === 0x06054b50) {
      end = i;
      break;
    }
  }
  if (end < 0) throw problem('is not a zip file (it has no end-of-archive record; it may be cut short)');
  const count = tail.readUInt16LE(end + 10);
  const indexSize = tail.readUInt32LE(end + 12);
  const indexOffset = tail.readUInt32LE(end + 16);
  if (count === 0xffff || indexOffset === 0xffffffff || indexSize === 0xffffffff) throw problem('is a ZIP64 archive, larger than a Strapsift archive can be');
  if (count === 0) throw problem('is an empty zip file');
  if (count > limits.entries) throw problem(`holds more than ${limits.entries} files`);
  if (indexSize > MAX_INDEX_BYTES || indexOffset + indexSize > size) throw problem('is cut short or damaged (its index points past its end)');

  const index = await readAt(file, indexOffset, indexSize);
  const entries: IndexEntry[] = [];
  let at = 0;
  for (let n = 0; n < count; n++) {
    if (at + 46 > index.length || index.readUInt32LE(at) !== 0x02014b50) throw problem('has a damaged index');
    const flags = index.readUInt16LE(at + 8);
    const nameLength = index.readUInt16LE(at + 28);
    const name = index.toString(flags & 0x800 ? 'utf8' : 'latin1', at + 46, at + 46 + nameLength);
    if (flags & 0x1) throw new ArchiveProblem(name, 'is encrypted');
    entries.push({
      name,
      method: index.readUInt16LE(at + 10),
      crc: index.readUInt32LE(at + 16),
      compressedSize: index.readUInt32LE(at + 20),
      size: index.readUInt32LE(at + 24),
      offset: index.readUInt32LE(at + 42),
    });
    at += 46 + nameLength + index.readUInt16LE(at + 30) + index.readUInt16LE(at + 32);
  }
  return entries;
}

/**
 * Reads a zip file from disk entry by entry, in the order they are stored, through fflate's streaming
 * Inflate. Limits are counted on the bytes that actually come out, never on the sizes an entry claims,
 * so a zip bomb stops as soon as it passes them; entries that overlap (one stretch of compressed data
 * claimed by several names, the "overlapping files" bomb) are refused; every entry's CRC-32 is checked.
 * Each read's output is handed to the sink (and awaited) before the next read, so a slow sink (a
 * database write) holds the file back instead of piling data up.
 */
export async function walkZip(path: string, limits: ArchiveLimits, openEntry: OpenEntry): Promise<{ entries: number; bytes: number }> {
  const file = await open(path, 'r');
  let total = 0;
  let entries: IndexEntry[] = [];
  const starts = new Map<IndexEntry, number>();
  try {
    const { size } = await file.stat();
    entries = (await readIndex(file, size, limits)).sort((a, b) => a.offset - b.offset);
    let previousEnd = 0;
    for (const entry of entries) {
      const header = await readAt(file, entry.offset, 30).catch(() => {
        throw new ArchiveProblem(entry.name, 'points past the end of the archive');
      });
      if (header.readUInt32LE(0) !== 0x04034b50) throw new ArchiveProblem(entry.name, 'has no file header where the index says');
      const nameLength = header.readUInt16LE(26);
      const localName = (await readAt(file, entry.offset + 30, nameLength)).toString(header.readUInt16LE(6) & 0x800 ? 'utf8' : 'latin1');
      if (localName !== entry.name) throw new ArchiveProblem(entry.name, `is called "${localName}" in its own header; the archive has been tampered with`);
      const start = entry.offset + 30 + nameLength + header.readUInt16LE(28);
      if (entry.offset < previousEnd) throw new ArchiveProblem(entry.name, 'overlaps another file in the archive');
      if (start + entry.compressedSize > size) throw new ArchiveProblem(entry.name, 'points past the end of the archive');
      previousEnd = start + entry.compressedSize;
      starts.set(entry, start);
    }
  } finally {
    await file.close();
  }

  for (const entry of entries) {
    const sink = openEntry(entry.name);
    if (entry.method !== 0 && entry.method !== 8) throw new ArchiveProblem(entry.name, `uses compression method ${entry.method}; only stored and deflated files are read`);
    let size = 0;
    let crc = 0;
    const out: Uint8Array[] = [];
    let inflateError: Error | null = null;
    const take = (chunk: Uint8Array) => {
      size += chunk.length;
      total += chunk.length;
      if (size > sink.limit) throw new ArchiveProblem(entry.name, `is larger than ${sink.limit} bytes once decompressed`);
      if (total > limits.totalBytes) throw new ArchiveProblem('archive', `holds more than ${limits.totalBytes} bytes once decompressed`);
      crc = crc32(chunk, crc);
      if (chunk.length) out.push(chunk);
    };
    const inflate = entry.method === 8 ? new Inflate((chunk) => take(chunk)) : null;
    const push = (chunk: Uint8Array, final: boolean) => {
      if (!inflate) return take(chunk);
      try {
        inflate.push(chunk, final);
      } catch (error) {
        if (error instanceof ArchiveProblem) throw error;
        inflateError = error as Error;
      }
    };
    const flush = async () => {
      if (inflateError) throw new ArchiveProblem(entry.name, 'cannot be decompressed; the archive is damaged');
      for (let chunk = out.shift(); chunk; chunk = out.shift()) await sink.data(chunk);
    };
    if (entry.compressedSize > 0) {
      const start = starts.get(entry)!;
      const stream = createReadStream(path, { start, end: start + entry.compressedSize - 1, highWaterMark: READ_BYTES });
      try {
        for await (const chunk of stream) {
          push(chunk as Buffer, false);
          await flush();
        }
      } finally {
        stream.destroy();
      }
    }
    if (inflate) push(new Uint8Array(0), true);
    await flush();
    if (size !== entry.size || crc !== entry.crc) throw new ArchiveProblem(entry.name, 'does not match its checksum in the archive; it is damaged or was changed');
    await sink.end();
  }
  return { entries: entries.length, bytes: total };
}
