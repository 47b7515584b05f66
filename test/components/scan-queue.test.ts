import { describe, expect, it } from 'vitest';
import { ApiError } from '../../src/lib/api/api-error';
import { ScanQueue, type QueuedScan, type QueueTransport } from '../../src/lib/storage/scan-queue';
import { fakeServer, memoryStorage } from '../support/queue-fakes';

const scan = (n: number, serial = String(10000000 + n)): QueuedScan => ({
  id: `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`,
  huntId: '11111111-1111-4111-8111-111111111111',
  strap: 1,
  serial,
  star: false,
  pulled: false,
  scannedAt: '2026-12-01T10:00:00.000Z',
});

describe('the offline scan queue', () => {
  it('when a note is added, then it is in device storage before add() resolves', async () => {
    const storage = memoryStorage();
    const server = fakeServer();
    server.setOnline(false);
    const queue = new ScanQueue('q', server.transport, storage);
    await queue.add(scan(1));
    expect(storage.data.get('q')).toContain(scan(1).id);
    queue.dispose();
  });

  it('when the network is down, then notes wait; when it returns, each is stored exactly once', async () => {
    const storage = memoryStorage();
    const server = fakeServer();
    server.setOnline(false);
    const queue = new ScanQueue('q', server.transport, storage);
    for (let n = 1; n <= 5; n++) await queue.add(scan(n));
    await queue.flush();
    expect(queue.getSnapshot()).toMatchObject({ status: 'offline', waiting: 5 });
    server.setOnline(true);
    await queue.flush();
    await queue.flush();
    expect(server.stored.size).toBe(5);
    expect(queue.getSnapshot()).toMatchObject({ status: 'saved', waiting: 0 });
    queue.dispose();
  });

  it('when the page reloads with notes waiting, then a new queue on the same storage uploads them', async () => {
    const storage = memoryStorage();
    const server = fakeServer();
    server.setOnline(false);
    const first = new ScanQueue('q', server.transport, storage);
    for (let n = 1; n <= 3; n++) await first.add(scan(n));
    first.dispose();
    server.setOnline(true);
    const reloaded = new ScanQueue('q', server.transport, storage);
    await reloaded.ready();
    await reloaded.flush();
    expect([...server.stored].sort()).toEqual([scan(1).id, scan(2).id, scan(3).id]);
    reloaded.dispose();
  });

  it('when an answer is lost after the server stored a batch, then the retry counts as duplicates, not new notes', async () => {
    const storage = memoryStorage();
    const server = fakeServer();
    const lossy: QueueTransport = {
      ...server.transport,
      upload: async (scans) => {
        await server.transport.upload(scans);
        throw new ApiError(0, 'offline', 'the answer never arrived');
      },
    };
    const first = new ScanQueue('q', lossy, storage);
    await first.add(scan(1));
    await first.add(scan(2));
    await first.flush();
    first.dispose();
    const retry = new ScanQueue('q', server.transport, storage);
    await retry.ready();
    await retry.flush();
    expect(server.stored.size).toBe(2);
    expect(retry.getSnapshot().waiting).toBe(0);
    retry.dispose();
  });

  it('when a note is undone before upload, then it never reaches the server; after upload, it is deleted there', async () => {
    const storage = memoryStorage();
    const server = fakeServer();
    const queue = new ScanQueue('q', server.transport, storage);
    await queue.add(scan(1));
    await queue.undo(scan(1).id);
    await queue.flush();
    expect(server.stored.size).toBe(0);
    await queue.add(scan(2));
    await queue.flush();
    expect(server.stored.has(scan(2).id)).toBe(true);
    await queue.undo(scan(2).id);
    await queue.flush();
    expect(server.stored.size).toBe(0);
    queue.dispose();
  });

  it('when the server rejects a note, then it leaves the queue and is listed as rejected with the reason', async () => {
    const server = fakeServer();
    const queue = new ScanQueue('q', server.transport, memoryStorage());
    await queue.add(scan(1, 'bad'));
    await queue.flush();
    expect(queue.getSnapshot().rejected).toEqual([{ scan: scan(1, 'bad'), error: 'not a serial' }]);
    expect(queue.getSnapshot().waiting).toBe(0);
    queue.dispose();
  });
});

describe('undo while an upload is under way', () => {
  it('when a note is undone while its batch is in flight and the answer is lost, then it is still deleted on the server', async () => {
    const server = fakeServer();
    let release: () => void = () => undefined;
    const gate = new Promise<void>((resolve) => {
      release = resolve;
    });
    let lossy = true;
    const transport: QueueTransport = {
      upload: async (scans) => {
        const answer = await server.transport.upload(scans);
        if (!lossy) return answer;
        await gate;
        throw new ApiError(0, 'offline', 'the answer never arrived');
      },
      remove: (id) => server.transport.remove(id),
    };
    const queue = new ScanQueue('q', transport, memoryStorage());
    await queue.add(scan(1));
    const flushing = queue.flush();
    await queue.undo(scan(1).id);
    release();
    await flushing;
    expect(server.stored.has(scan(1).id)).toBe(true);
    lossy = false;
    await queue.flush();
    expect(server.stored.has(scan(1).id)).toBe(false);
    expect(queue.getSnapshot().waiting).toBe(0);
    queue.dispose();
  });
});
