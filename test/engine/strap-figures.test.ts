import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { balanceOf, isTouched, strapFigures, strapStatus, strapsBackLine } from '../../shared/straps';

// A strap is 100 notes (common practice for US straps of small notes); the figures are worked by hand.
describe('strapFigures', () => {
  it('when a full strap had 3 pulled and 2 swapped in, then it goes back with 99: one short', () => {
    expect(strapFigures({ pulled: 3, swappedIn: 2, shortOver: 0 })).toEqual({ received: 100, notesBack: 99, complete: false });
  });

  it('when the bank sent one over and 1 was pulled with none swapped in, then it goes back complete', () => {
    expect(strapFigures({ pulled: 1, swappedIn: 0, shortOver: 1 })).toEqual({ received: 101, notesBack: 100, complete: true });
  });

  it('when the strap arrived two short and nothing was pulled, then it goes back two short', () => {
    expect(strapFigures({ pulled: 0, swappedIn: 0, shortOver: -2 })).toEqual({ received: 98, notesBack: 98, complete: false });
  });

  it('for any counts, every note is accounted for: what goes back plus what was pulled equals what came plus what went in', () => {
    fc.assert(
      fc.property(fc.nat(100), fc.nat(100), fc.integer({ min: -100, max: 100 }), (pulled, swappedIn, shortOver) => {
        const { received, notesBack, complete } = strapFigures({ pulled, swappedIn, shortOver });
        expect(notesBack + pulled).toBe(received + swappedIn);
        expect(complete).toBe(notesBack === 100);
      }),
    );
  });
});

describe('isTouched and strapStatus: one definition of a strap the hunter has worked on', () => {
  const blank = { searched: 0, pulled: 0, swappedIn: 0, shortOver: 0, note: null, notesBack: 100 };

  it('when nothing was logged or recorded, then the strap is untouched and "not started"', () => {
    expect(isTouched(blank)).toBe(false);
    expect(strapStatus(blank)).toEqual({ balance: 'not started', by: 0, label: 'not started' });
  });

  it.each([
    ['a note logged', { searched: 1 }],
    ['a note pulled', { pulled: 1, notesBack: 99 }],
    ['a note swapped in', { swappedIn: 1, notesBack: 101 }],
    ['a short count', { shortOver: -1, notesBack: 99 }],
    ['a written note', { note: 'teller recounted' }],
  ])('when the strap has %s, then it is touched, for the sheet, the print-out and the state alike', (_, change) => {
    const row = { ...blank, ...change };
    expect(isTouched(row)).toBe(true);
    expect(strapStatus(row).balance).not.toBe('not started');
  });

  it('when a touched strap goes back with 98, 100 or 101, then it reads "2 short", "complete" or "1 over"', () => {
    expect(strapStatus({ ...blank, searched: 100, pulled: 2, notesBack: 98 })).toEqual({ balance: 'short', by: 2, label: '2 short' });
    expect(balanceOf(100)).toEqual({ balance: 'complete', by: 0, label: 'complete' });
    expect(balanceOf(101)).toEqual({ balance: 'over', by: 1, label: '1 over' });
  });
});

describe('strapsBackLine', () => {
  const row = (searched: number, pulled: number, swappedIn = 0, shortOver = 0) => ({ searched, pulled, swappedIn, shortOver, notesBack: 100 + shortOver - pulled + swappedIn });

  it('when one strap of ten is opened with one note pulled, then it says 9 of 10 go back with 100 and 9 are not started', () => {
    expect(strapsBackLine([row(2, 1), ...Array.from({ length: 9 }, () => row(0, 0))])).toBe('9 of 10 straps go back with 100 (9 not started)');
  });

  it('when every strap is opened and squared, then nothing is said of straps not started', () => {
    expect(strapsBackLine([row(100, 2, 2), row(101, 1, 0, 1)])).toBe('2 of 2 straps go back with 100');
    expect(strapsBackLine([row(100, 1)])).toBe('0 of 1 strap goes back with 100');
  });
});
