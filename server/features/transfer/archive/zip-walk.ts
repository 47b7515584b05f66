import { createReadStream } from 'node:fs';
import { Unzip, UnzipInflate } from 'fflate';
import type { ArchiveLimits } from '../../../../shared/contracts/archive';
import { ArchiveProblem } from './archive-problem';

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

/**
 * Streams a zip file from disk through fflate's Unzip, entry by entry, in the order they are stored.
 * Limits are counted on the bytes that actually come out, never on the sizes an entry claims, so a zip
 * bomb stops as soon as it passes them. Each read's output is handed to the sinks (and awaited) before
 * the next read, so a slow sink (a database write) holds the file back instead of piling data up.
 */
export async function walkZip(path: string, limits: ArchiveLimits, open: OpenEntry): Promise<{ entries: number; bytes: number }> {
  let entries = 0;
  let total = 0;
  let failure: unknown = null;
  const queue: Array<() => void | Promise<void>> = [];
  const unfinished = new Set<string>();

  const unzip = new Unzip((file) => {
    entries += 1;
    if (entries > limits.entries) throw new ArchiveProblem('archive', `holds more than ${limits.entries} files`);
    const name = file.name;
    const sink = open(name);
    let size = 0;
    unfinished.add(name);
    file.ondata = (error, chunk, final) => {
      if (error) {
        failure = new ArchiveProblem(name, `cannot be decompressed (${error.message})`);
        return;
      }
      size += chunk.length;
      total += chunk.length;
      if (size > sink.limit) throw new ArchiveProblem(name, `is larger than ${sink.limit} bytes once decompressed`);
      if (total > limits.totalBytes) throw new ArchiveProblem('archive', `holds more than ${limits.totalBytes} bytes once decompressed`);
      if (chunk.length) queue.push(() => sink.data(chunk));
      if (final) {
        unfinished.delete(name);
        queue.push(() => sink.end());
      }
    };
    file.start();
  });
  unzip.register(UnzipInflate);

  const push = (chunk: Uint8Array, final: boolean) => {
    try {
      unzip.push(chunk, final);
    } catch (error) {
      if (error instanceof ArchiveProblem) throw error;
      throw new ArchiveProblem('archive', final ? 'ends part-way (the zip is cut short)' : 'is not a readable zip file');
    }
    if (failure) throw failure;
  };
  const drain = async () => {
    for (let task = queue.shift(); task; task = queue.shift()) await task();
  };

  const stream = createReadStream(path, { highWaterMark: READ_BYTES });
  try {
    for await (const chunk of stream) {
      push(chunk as Buffer, false);
      await drain();
    }
    push(new Uint8Array(0), true);
    await drain();
  } finally {
    stream.destroy();
  }
  if (entries === 0) throw new ArchiveProblem('archive', 'is not a zip file (no files found in it)');
  const cut = [...unfinished][0];
  if (cut) throw new ArchiveProblem(cut, 'ends part-way (the zip is cut short)');
  return { entries, bytes: total };
}
