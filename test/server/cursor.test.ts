import { describe, expect, it } from 'vitest';
import { afterCursor, decodeCursor, encodeCursor, keysetPage, timeIdCursor } from '../../server/lib/cursor';
import { HttpError } from '../../server/lib/errors';

describe('keyset paging helpers', () => {
  it('when the query brought one row more than the page, then the page is cut and the cursor is the last kept row\'s key', () => {
    const rows = [{ id: 'a' }, { id: 'b' }, { id: 'c' }];
    const { page, nextCursor } = keysetPage(rows, 2, (last) => [last.id]);
    expect(page).toEqual([{ id: 'a' }, { id: 'b' }]);
    expect(JSON.parse(Buffer.from(nextCursor!, 'base64url').toString('utf8'))).toEqual(['b']);
  });

  it('when the rows fit in the page, or the last key is missing, then there is no next cursor', () => {
    expect(keysetPage([{ id: 'a' }, { id: 'b' }], 2, (last) => [last.id]).nextCursor).toBeNull();
    expect(keysetPage([{ id: 'a' }, { id: 'b' }, { id: 'c' }], 2, () => null).nextCursor).toBeNull();
    expect(keysetPage([], 50, () => ['x'])).toEqual({ page: [], nextCursor: null });
  });

  it('when a cursor is written and read back, then it gives the same sort values, and a forged one is a 400 naming the cursor', () => {
    const key = ['2026-03-02T10:00:00.000Z', '7cd96202-6a63-4712-b95e-975ce393d59f'] as const;
    expect(decodeCursor(encodeCursor(key), timeIdCursor)).toEqual(key);
    expect(decodeCursor(undefined, timeIdCursor)).toBeNull();
    for (const forged of ['not base64 json', encodeCursor(['yesterday', 'x'])]) {
      try {
        decodeCursor(forged, timeIdCursor);
        expect.unreachable('a forged cursor was accepted');
      } catch (error) {
        expect(error).toBeInstanceOf(HttpError);
        expect((error as HttpError).fields).toEqual({ cursor: 'is not a cursor from this list' });
      }
    }
  });

  it('when building the after-cursor condition, then descending lists ask for smaller keys, ascending for larger, with numbered casts', () => {
    const params: unknown[] = ['user'];
    expect(afterCursor(params, ['h.started_at', 'h.id'], ['timestamptz', 'uuid'], ['t', 'i'], 'DESC')).toBe('(h.started_at, h.id) < ($2::timestamptz, $3::uuid)');
    expect(afterCursor(params, ['u.email'], ['text'], ['e'], 'ASC')).toBe('(u.email) > ($4::text)');
    expect(params).toEqual(['user', 't', 'i', 'e']);
  });
});
