import { useEffect, useSyncExternalStore } from 'react';
import { useSession } from '../session/session-provider';
import { onNetworkReturn } from './network-events';
import { httpTransport } from './http-transport';
import { kv } from './kv';
import { ScanQueue, type QueueSnapshot } from './scan-queue';

const queues = new Map<string, ScanQueue>();

/** One queue per signed-in user on this device; it outlives screens, so leaving Sift never drops a note. */
export function scanQueueFor(userId: string): ScanQueue {
  let queue = queues.get(userId);
  if (!queue) {
    queue = new ScanQueue(`strapsift.queue.${userId}`, httpTransport, kv);
    queues.set(userId, queue);
  }
  return queue;
}

const idle: QueueSnapshot = { status: 'saved', waiting: 0, rejected: [], lastSyncedAt: null };
const noop = () => () => undefined;

/** The signed-in user's queue, retried whenever the network returns; no re-render when its status changes. */
export function useDeviceScanQueue(): ScanQueue | null {
  const { user } = useSession();
  const queue = user ? scanQueueFor(user.id) : null;
  useEffect(() => {
    if (!queue) return undefined;
    // Notes logged while signed out or offline go up as soon as we can.
    queue.retryNow();
    return onNetworkReturn(() => queue.retryNow());
  }, [queue]);
  return queue;
}

/**
 * The queue's status (saved, waiting, offline, refused notes). Every stored note changes it, and a store
 * subscription renders synchronously, so only the small parts that show it should subscribe, never a screen.
 */
export function useScanQueueSnapshot(queue: ScanQueue | null): QueueSnapshot {
  return useSyncExternalStore(queue?.subscribe ?? noop, queue?.getSnapshot ?? (() => idle), () => idle);
}
