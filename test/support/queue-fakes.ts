import { ApiError } from '../../src/lib/api/api-error';
import type { BatchAnswer, QueuedScan, QueueTransport } from '../../src/lib/storage/scan-queue';

/** Device storage in memory, for the offline queue's tests. */
export function memoryStorage() {
  const data = new Map<string, string>();
  return {
    data,
    async get<T>(key: string) {
      const raw = data.get(key);
      return raw ? (JSON.parse(raw) as T) : null;
    },
    async set(key: string, value: unknown) {
      data.set(key, JSON.stringify(value));
    },
  };
}

/** A server that stores each id once, like the real batch route, and can be switched off. */
export function fakeServer() {
  const stored = new Set<string>();
  let online = true;
  let uploads = 0;
  const transport: QueueTransport = {
    async upload(scans: QueuedScan[]): Promise<BatchAnswer> {
      uploads += 1;
      if (!online) throw new ApiError(0, 'offline', 'No connection');
      const answer: BatchAnswer = { stored: [], duplicates: [], rejected: [] };
      for (const scan of scans) {
        if (!/^\d{8}$/.test(scan.serial)) answer.rejected.push({ id: scan.id, error: 'not a serial' });
        else if (stored.has(scan.id)) answer.duplicates.push(scan.id);
        else {
          stored.add(scan.id);
          answer.stored.push(scan.id);
        }
      }
      return answer;
    },
    async remove(id: string) {
      if (!online) throw new ApiError(0, 'offline', 'No connection');
      stored.delete(id);
    },
  };
  return {
    transport,
    stored,
    setOnline(value: boolean) {
      online = value;
    },
    uploads: () => uploads,
  };
}
