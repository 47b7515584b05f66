import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Zip, ZipPassThrough, strToU8, zipSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { crc32 } from '../../server/features/transfer/archive/crc32';
import { walkZip } from '../../server/features/transfer/archive/zip-walk';
import { ARCHIVE_LIMITS } from '../../shared/contracts/archive';

async function onDisk(bytes: Uint8Array): Promise<string> {
  const path = join(await mkdtemp(join(tmpdir(), 'zip-walk-')), 'a.zip');
  await writeFile(path, bytes);
  return path;
}

async function entriesOf(path: string): Promise<Record<string, Buffer>> {
  const files: Record<string, Buffer> = {};
  await walkZip(path, ARCHIVE_LIMITS, (name) => {
    const chunks: Buffer[] = [];
    return { limit: 1 << 30, data: (chunk) => void chunks.push(Buffer.from(chunk)), end: () => void (files[name] = Buffer.concat(chunks)) };
  });
  return files;
}

/** A zip as the archive export writes it: streamed, stored entries with data descriptors after the data. */
function streamedZip(files: Record<string, Uint8Array>): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    const parts: Uint8Array[] = [];
    const zip = new Zip((error, chunk, final) => {
      if (error) return reject(error);
      parts.push(chunk);
      if (final) resolve(Buffer.concat(parts));
    });
    for (const [name, bytes] of Object.entries(files)) {
      const entry = new ZipPassThrough(name);
      zip.add(entry);
      entry.push(bytes, true);
    }
    zip.end();
  });
}

describe('walkZip', () => {
  it('CRC-32 of "123456789" is 0xCBF43926 (the check value of CRC-32/ISO-HDLC in the CRC RevEng catalogue), also when carried over chunks', () => {
    expect(crc32(strToU8('123456789'))).toBe(0xcbf43926);
    expect(crc32(strToU8('56789'), crc32(strToU8('1234')))).toBe(0xcbf43926);
  });

  it('when a stored file’s bytes contain the zip signatures, then it still comes out whole (entries are found through the index, not by scanning)', async () => {
    const signatures = Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x50, 0x4b, 0x07, 0x08, 0x50, 0x4b, 0x01, 0x02, 0x50, 0x4b, 0x05, 0x06]);
    const photo = Buffer.concat([Buffer.alloc(5000, 7), signatures, Buffer.alloc(70_000, 9), signatures]);
    const path = await onDisk(await streamedZip({ 'README.txt': strToU8('hello'), 'photos/a.png': photo, 'strapsift.json': strToU8('{}') }));
    const files = await entriesOf(path);
    expect(Object.keys(files)).toEqual(['README.txt', 'photos/a.png', 'strapsift.json']);
    expect(files['photos/a.png']!.equals(photo)).toBe(true);
  });

  it('when an entry’s bytes were changed after zipping, then its CRC-32 gives it away', async () => {
    const zip = zipSync({ 'strapsift.json': [strToU8('{"a":"aaaaaaaa"}'), { level: 0 }] });
    const at = Buffer.from(zip).indexOf('aaaaaaaa');
    zip[at] = 'b'.charCodeAt(0);
    await expect(entriesOf(await onDisk(zip))).rejects.toThrow(/does not match its checksum/);
  });

  it('when two index entries point at one stretch of data (an overlapping-files bomb), then the archive is refused', async () => {
    const zip = Buffer.from(zipSync({ 'a.txt': strToU8('x'.repeat(1000)), 'b.txt': strToU8('y') }));
    // The second entry of the central directory is made to point at the first file's header.
    const index = zip.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02]));
    const second = zip.indexOf(Buffer.from([0x50, 0x4b, 0x01, 0x02]), index + 4);
    zip.writeUInt32LE(0, second + 42);
    await expect(entriesOf(await onDisk(zip))).rejects.toThrow(/tampered|overlaps/);
  });
});
