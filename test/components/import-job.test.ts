import { describe, expect, it, vi } from 'vitest';
import { IMPORT_CHUNK_ROWS, type CreateHuntRequest, type ImportRow, type ImportRowsRequest, type ImportRowsResponse } from '@shared/contracts';
import { runImport, type ImportIo } from '../../src/features/you/api';

const rows = (n: number, firstDay = 10): ImportRow[] =>
  Array.from({ length: n }, (_, i) => ({
    line: i + 2,
    occurrence: 0,
    serial: String(30_000_000 + i),
    date: `2026-03-${String(firstDay + (i % 5)).padStart(2, '0')}T12:00:00.000Z`,
  }));

/** A server that stores every row it has not seen (by serial) and refuses none. */
function fakeIo() {
  const seen = new Set<string>();
  const io = {
    createHunt: vi.fn(async (_: CreateHuntRequest) => ({ id: 'new-hunt' })),
    deleteHunt: vi.fn(async (_: string) => undefined),
    importRows: vi.fn(async ({ rows: part }: ImportRowsRequest): Promise<ImportRowsResponse> => {
      const fresh = part.filter((row) => !seen.has(row.serial));
      fresh.forEach((row) => seen.add(row.serial));
      return { stored: fresh.length, duplicates: part.length - fresh.length, keepers: 0, rejected: [] };
    }),
    refresh: vi.fn(async () => undefined),
  } satisfies ImportIo;
  return io;
}

describe('runImport, the import job behind the import card', () => {
  it('when 1,201 rows go into a new hunt, then they go in parts of 500, 500 and 201 with progress after each, into a hunt sized and dated from the rows', async () => {
    const io = fakeIo();
    const progress: [number, number][] = [];
    const outcome = await runImport(rows(1201), { newHunt: { title: ' Old notebook ', denomination: 2 } }, (done, total) => progress.push([done, total]), io);

    expect(IMPORT_CHUNK_ROWS).toBe(500);
    expect(io.importRows.mock.calls.map(([body]) => [body.huntId, body.rows.length])).toEqual([
      ['new-hunt', 500],
      ['new-hunt', 500],
      ['new-hunt', 201],
    ]);
    expect(progress).toEqual([
      [0, 1201],
      [500, 1201],
      [1000, 1201],
      [1201, 1201],
    ]);
    // 1,201 notes need 13 straps of 100; the hunt starts on the earliest row's date.
    expect(io.createHunt).toHaveBeenCalledWith({
      title: 'Old notebook',
      source: 'Imported from an old log',
      denomination: 2,
      plannedStraps: 13,
      startedAt: '2026-03-10T12:00:00.000Z',
    });
    expect(outcome).toEqual({ stored: 1201, duplicates: 0, keepers: 0, rejected: [], huntId: 'new-hunt', removedEmptyHunt: false });
    expect(io.refresh).toHaveBeenCalledOnce();
  });

  it('when the same file comes again into a new hunt, then nothing is new and the empty hunt is deleted again', async () => {
    const io = fakeIo();
    await runImport(rows(30), { huntId: 'saturday' }, undefined, io);
    const again = await runImport(rows(30), { newHunt: { title: '', denomination: 1 } }, undefined, io);

    expect(io.createHunt.mock.calls[0]![0].title).toBe('Imported log');
    expect(io.deleteHunt).toHaveBeenCalledWith('new-hunt');
    expect(again).toMatchObject({ stored: 0, duplicates: 30, huntId: null, removedEmptyHunt: true });
  });

  it('when rows go into an existing hunt, then no hunt is made or deleted, even if nothing was new', async () => {
    const io = fakeIo();
    await runImport(rows(3), { huntId: 'saturday' }, undefined, io);
    const again = await runImport(rows(3), { huntId: 'saturday' }, undefined, io);

    expect(io.createHunt).not.toHaveBeenCalled();
    expect(io.deleteHunt).not.toHaveBeenCalled();
    expect(again).toMatchObject({ stored: 0, duplicates: 3, huntId: 'saturday', removedEmptyHunt: false });
  });

  it('when a part is refused by the server, then the job stops with that error and nothing is refreshed as if done', async () => {
    const io = fakeIo();
    io.importRows.mockRejectedValueOnce(new Error('The hunt is closed'));
    await expect(runImport(rows(10), { huntId: 'closed' }, undefined, io)).rejects.toThrow('The hunt is closed');
    expect(io.refresh).not.toHaveBeenCalled();
  });

  it('when the server refuses some rows, then their lines and reasons are kept in the outcome', async () => {
    const io = fakeIo();
    io.importRows.mockResolvedValueOnce({ stored: 1, duplicates: 0, keepers: 1, rejected: [{ line: 3, reason: 'not a serial' }] });
    const outcome = await runImport(rows(2), { huntId: 'saturday' }, undefined, io);
    expect(outcome).toMatchObject({ stored: 1, keepers: 1, rejected: [{ line: 3, reason: 'not a serial' }] });
  });
});
