import { act, renderHook } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useDebounced } from '../../src/lib/use-debounced';
import { ScanQueue, type QueuedScan } from '../../src/lib/storage/scan-queue';
import { fakeServer, memoryStorage } from '../support/queue-fakes';

const scan = (n: number): QueuedScan => ({
  id: `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`,
  huntId: '11111111-1111-4111-8111-111111111111',
  strap: 1,
  serial: String(20000000 + n),
  star: false,
  pulled: false,
  scannedAt: '2026-12-01T10:00:00.000Z',
});

const TIMING = { batchSize: 500, debounceMs: 800, firstBackoffMs: 1000, maxBackoffMs: 60_000 };

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.restoreAllMocks();
  vi.useRealTimers();
});

describe('the queue waits for a pause in typing (debounce, fake timers)', () => {
  it('when three notes come 300 ms apart, then nothing is sent until 800 ms after the last, and then all three go in one batch', async () => {
    const server = fakeServer();
    const queue = new ScanQueue('q', server.transport, memoryStorage(), TIMING);
    await queue.add(scan(1));
    await vi.advanceTimersByTimeAsync(300);
    await queue.add(scan(2));
    await vi.advanceTimersByTimeAsync(300);
    await queue.add(scan(3));
    await vi.advanceTimersByTimeAsync(799);
    expect(server.uploads()).toBe(0);
    await vi.advanceTimersByTimeAsync(1);
    expect(server.uploads()).toBe(1);
    expect(server.stored.size).toBe(3);
    queue.dispose();
  });

  it('when a full batch is waiting, then it goes at once without the pause', async () => {
    const server = fakeServer();
    const queue = new ScanQueue('q', server.transport, memoryStorage(), { ...TIMING, batchSize: 2 });
    await queue.add(scan(1));
    await queue.add(scan(2));
    await vi.advanceTimersByTimeAsync(0);
    expect(server.uploads()).toBe(1);
    expect(server.stored.size).toBe(2);
    queue.dispose();
  });
});

describe('the queue backs off while the network is down (exponential backoff, fake timers)', () => {
  it('when every upload fails, then the waits double from 1 s and stop growing at 60 s', async () => {
    // The jitter multiplies each wait by 0.75–1.25; Math.random() = 0.5 takes it out.
    vi.spyOn(Math, 'random').mockReturnValue(0.5);
    const server = fakeServer();
    server.setOnline(false);
    const queue = new ScanQueue('q', server.transport, memoryStorage(), TIMING);
    await queue.add(scan(1));
    await vi.advanceTimersByTimeAsync(TIMING.debounceMs);
    expect(server.uploads()).toBe(1);
    for (const [attempt, wait] of [1000, 2000, 4000, 8000, 16_000, 32_000, 60_000, 60_000].entries()) {
      await vi.advanceTimersByTimeAsync(wait - 1);
      expect(server.uploads(), `attempt ${attempt + 2} came before its ${wait} ms wait`).toBe(attempt + 1);
      await vi.advanceTimersByTimeAsync(1);
      expect(server.uploads(), `attempt ${attempt + 2} did not come after ${wait} ms`).toBe(attempt + 2);
    }
    expect(queue.getSnapshot()).toMatchObject({ status: 'offline', waiting: 1 });
    queue.dispose();
  });

  it('when the jitter is at its extremes, then a wait stays within 0.75 and 1.25 of its step', async () => {
    const server = fakeServer();
    server.setOnline(false);
    const random = vi.spyOn(Math, 'random').mockReturnValue(0);
    const queue = new ScanQueue('q', server.transport, memoryStorage(), TIMING);
    await queue.add(scan(1));
    await vi.advanceTimersByTimeAsync(TIMING.debounceMs);
    await vi.advanceTimersByTimeAsync(749);
    expect(server.uploads()).toBe(1);
    // The wait after the next failure takes the other extreme.
    random.mockReturnValue(0.999999);
    await vi.advanceTimersByTimeAsync(1);
    expect(server.uploads()).toBe(2);
    // The second wait is 2 s × (0.75 + 0.5 × 0.999999) ≈ 2,500 ms.
    await vi.advanceTimersByTimeAsync(2498);
    expect(server.uploads()).toBe(2);
    await vi.advanceTimersByTimeAsync(2);
    expect(server.uploads()).toBe(3);
    queue.dispose();
  });

  it('when the network returns during a wait and the hunter taps retry, then the note goes at once and the backoff resets', async () => {
    vi.spyOn(Math, 'random').mockReturnValue(0.5);
    const server = fakeServer();
    server.setOnline(false);
    const queue = new ScanQueue('q', server.transport, memoryStorage(), TIMING);
    await queue.add(scan(1));
    await vi.advanceTimersByTimeAsync(TIMING.debounceMs + 1000 + 2000);
    expect(server.uploads()).toBe(3);
    server.setOnline(true);
    queue.retryNow();
    await vi.advanceTimersByTimeAsync(0);
    expect(server.stored.size).toBe(1);
    expect(queue.getSnapshot()).toMatchObject({ status: 'saved', waiting: 0 });
    queue.dispose();
  });
});

describe('useDebounced (fake timers)', () => {
  it('when the value changes faster than the pause, then only the last value comes through, once the pause has passed', async () => {
    const { result, rerender } = renderHook(({ value }) => useDebounced(value, 250), { initialProps: { value: 'r' } });
    rerender({ value: 'ra' });
    await act(() => vi.advanceTimersByTimeAsync(200));
    rerender({ value: 'rad' });
    await act(() => vi.advanceTimersByTimeAsync(249));
    expect(result.current).toBe('r');
    await act(() => vi.advanceTimersByTimeAsync(1));
    expect(result.current).toBe('rad');
  });
});
