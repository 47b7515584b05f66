import { ApiError } from '../api/api-error';

/** One logged note as the device keeps it until the server has it. */
export interface QueuedScan {
  /** Made on the device, so a retried upload can never store the note twice. */
  id: string;
  huntId: string;
  strap: number;
  serial: string;
  star: boolean;
  pulled: boolean;
  scannedAt: string;
  /** For a star note: the run size the hunter looked up, when they did. */
  starRunSize?: number | null;
  /** How the serial came in; notes queued before camera mode have neither field (the server reads keypad). */
  entryMethod?: 'keypad' | 'camera';
  /** The camera's confidence in the whole serial, 0–1; absent for typed notes. */
  cameraConfidence?: number;
}

export interface RejectedScan {
  scan: QueuedScan;
  error: string;
}

interface PersistedQueue {
  pending: QueuedScan[];
  /** Ids of notes already uploaded and then undone: deleted on the server at the next sync. */
  undone: string[];
  rejected: RejectedScan[];
}

export type SyncStatus = 'saved' | 'waiting' | 'syncing' | 'offline';

export interface QueueSnapshot {
  status: SyncStatus;
  waiting: number;
  rejected: RejectedScan[];
  lastSyncedAt: string | null;
}

export interface BatchAnswer {
  stored: string[];
  duplicates: string[];
  rejected: { id: string; error: string }[];
}

/** Where the queue keeps itself: device storage in the app, memory in tests. */
export interface QueueStorage {
  get<T>(key: string): Promise<T | null>;
  set(key: string, value: unknown): Promise<void>;
}

export interface QueueTransport {
  upload(scans: QueuedScan[]): Promise<BatchAnswer>;
  remove(id: string): Promise<void>;
}

/** How the queue paces itself; tests and the fault rig shorten the waits. */
export interface QueueTiming {
  batchSize: number;
  debounceMs: number;
  firstBackoffMs: number;
  maxBackoffMs: number;
}

export const DEFAULT_TIMING: QueueTiming = { batchSize: 500, debounceMs: 800, firstBackoffMs: 1000, maxBackoffMs: 60_000 };

/**
 * The device-first scan log (kept free of React Native imports so Node tests and the fault rig run it as is): every note is written to storage before the keypad moves on,
 * then uploaded in batches with backoff. Uploads are idempotent on the server (client ids),
 * so a batch whose answer was lost is simply sent again.
 */
export class ScanQueue {
  private state: PersistedQueue = { pending: [], undone: [], rejected: [] };
  private loaded: Promise<void>;
  private listeners = new Set<() => void>();
  private snapshot: QueueSnapshot = { status: 'saved', waiting: 0, rejected: [], lastSyncedAt: null };
  private timer: ReturnType<typeof setTimeout> | null = null;
  private flushing: Promise<void> | null = null;
  private failures = 0;
  private offline = false;
  private lastSyncedAt: string | null = null;
  private writeChain: Promise<void> = Promise.resolve();
  /** Notes in a batch whose answer hasn't come back: the server may already hold them. */
  private inFlight = new Set<string>();

  constructor(
    private readonly storageKey: string,
    private readonly transport: QueueTransport,
    private readonly storage: QueueStorage,
    private readonly timing: QueueTiming = DEFAULT_TIMING,
  ) {
    this.loaded = this.storage.get<PersistedQueue>(storageKey).then((saved) => {
      if (saved) this.state = { pending: saved.pending ?? [], undone: saved.undone ?? [], rejected: saved.rejected ?? [] };
      this.publish();
      if (this.state.pending.length || this.state.undone.length) this.schedule(0);
    });
  }

  ready(): Promise<void> {
    return this.loaded;
  }

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = (): QueueSnapshot => this.snapshot;

  pending(): readonly QueuedScan[] {
    return this.state.pending;
  }

  /** Resolves once the note is in device storage: only then may the keypad clear. */
  async add(scan: QueuedScan): Promise<void> {
    await this.loaded;
    this.state = { ...this.state, pending: [...this.state.pending, scan] };
    await this.persist();
    this.schedule(this.state.pending.length >= this.timing.batchSize ? 0 : this.timing.debounceMs);
  }

  /** Takes a note back: dropped from the queue if it hasn't left yet, else deleted on the server later. */
  async undo(id: string): Promise<void> {
    await this.loaded;
    const stillHere = this.state.pending.some((scan) => scan.id === id);
    // A note whose upload has started may be stored already even if no answer came back, so it is
    // deleted on the server too (a 404 there counts as done).
    const mayBeStored = !stillHere || this.inFlight.has(id);
    this.state = {
      ...this.state,
      pending: this.state.pending.filter((scan) => scan.id !== id),
      undone: mayBeStored ? [...this.state.undone, id] : this.state.undone,
    };
    await this.persist();
    if (mayBeStored) this.schedule(this.timing.debounceMs);
  }

  dismissRejected(): void {
    this.state = { ...this.state, rejected: [] };
    void this.persist();
  }

  /** The network came back (or the user asked): try now instead of waiting out the backoff. */
  retryNow(): void {
    this.failures = 0;
    this.schedule(0);
  }

  flush(): Promise<void> {
    this.flushing ??= this.runFlush().finally(() => {
      this.flushing = null;
    });
    return this.flushing;
  }

  private async runFlush(): Promise<void> {
    await this.loaded;
    this.timer = null;
    try {
      while (this.state.undone.length) {
        const id = this.state.undone[0];
        this.setStatus('syncing');
        await this.transport.remove(id);
        this.state = { ...this.state, undone: this.state.undone.filter((other) => other !== id) };
        await this.persist();
      }
      while (this.state.pending.length) {
        const batch = this.state.pending.slice(0, this.timing.batchSize);
        this.setStatus('syncing');
        for (const scan of batch) this.inFlight.add(scan.id);
        const answer = await this.transport.upload(batch).finally(() => {
          for (const scan of batch) this.inFlight.delete(scan.id);
        });
        const done = new Set([...answer.stored, ...answer.duplicates, ...answer.rejected.map((item) => item.id)]);
        const rejected = answer.rejected
          .map((item) => ({ scan: batch.find((scan) => scan.id === item.id), error: item.error }))
          .filter((item): item is RejectedScan => !!item.scan);
        // Anything the server neither stored nor named stays queued for the next try.
        this.state = {
          ...this.state,
          pending: this.state.pending.filter((scan) => !done.has(scan.id)),
          rejected: [...this.state.rejected, ...rejected],
        };
        await this.persist();
        if (!batch.some((scan) => done.has(scan.id))) throw new Error('the server answered without taking any note');
      }
      this.failures = 0;
      this.offline = false;
      this.lastSyncedAt = new Date().toISOString();
      this.publish();
    } catch (error) {
      this.failures += 1;
      this.offline = error instanceof ApiError ? error.isNetwork : false;
      if (error instanceof ApiError && error.status === 401) {
        // Signed out: keep the notes on the device; they go up after the next sign-in.
        this.publish();
        return;
      }
      this.publish();
      const backoff = Math.min(this.timing.maxBackoffMs, this.timing.firstBackoffMs * 2 ** Math.min(this.failures - 1, 6));
      this.schedule(backoff * (0.75 + Math.random() * 0.5));
    }
  }

  private schedule(delay: number): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), delay);
    this.publish();
  }

  private persist(): Promise<void> {
    // Writes are chained so a slow write can never land after a newer one.
    const state = this.state;
    this.writeChain = this.writeChain.then(() => this.storage.set(this.storageKey, state));
    this.publish();
    return this.writeChain;
  }

  private setStatus(status: SyncStatus): void {
    if (this.snapshot.status !== status) {
      this.snapshot = { ...this.snapshot, status };
      this.emit();
    }
  }

  private publish(): void {
    const waiting = this.state.pending.length + this.state.undone.length;
    const status: SyncStatus = waiting === 0 ? 'saved' : this.offline ? 'offline' : this.flushing ? 'syncing' : 'waiting';
    const next: QueueSnapshot = { status, waiting, rejected: this.state.rejected, lastSyncedAt: this.lastSyncedAt };
    const prev = this.snapshot;
    if (prev.status !== next.status || prev.waiting !== next.waiting || prev.rejected !== next.rejected || prev.lastSyncedAt !== next.lastSyncedAt) {
      this.snapshot = next;
      this.emit();
    }
  }

  private emit(): void {
    for (const listener of this.listeners) listener();
  }

  dispose(): void {
    if (this.timer) clearTimeout(this.timer);
    this.listeners.clear();
  }
}
