import { describe, expect, it } from 'vitest';
import {
  DISTRICTS,
  FACILITIES,
  GRADES,
  NOTES_PER_BRICK,
  NOTES_PER_BUNDLE,
  NOTES_PER_STRAP,
  PACKAGING,
  SERIAL_FACTS,
  SERIES_RULES,
  districtByLetter,
  isValidGrade,
  tradeNotes,
} from '../../shared/trade';

const LABELS = ['published', 'common practice', 'from memory'];

describe('trade data', () => {
  it('when the districts are listed, then they are the twelve Reserve Banks A–L numbered 1–12 (Federal Reserve Act of 1913; the Federal Reserve Board’s published list)', () => {
    const reference = [
      'Boston', 'New York', 'Philadelphia', 'Cleveland', 'Richmond', 'Atlanta',
      'Chicago', 'St. Louis', 'Minneapolis', 'Kansas City', 'Dallas', 'San Francisco',
    ];
    expect(DISTRICTS.map((d) => d.bank)).toEqual(reference);
    expect(DISTRICTS.map((d) => d.letter).join('')).toBe('ABCDEFGHIJKL');
    expect(DISTRICTS.map((d) => d.number)).toEqual(reference.map((_, i) => i + 1));
    expect(DISTRICTS.every((d) => d.source === 'published' && d.reference?.includes('Federal Reserve Act of 1913'))).toBe(true);
  });

  it('when a district letter is looked up in either case, then the bank is found; other letters find nothing', () => {
    expect(districtByLetter('l')?.bank).toBe('San Francisco');
    expect(districtByLetter('M')).toBeNull();
  });

  it('when packaging is counted, then a strap is 100 notes and a bundle 1,000 (common practice) and a brick 4,000 (from memory)', () => {
    expect([NOTES_PER_STRAP, NOTES_PER_BUNDLE, NOTES_PER_BRICK]).toEqual(PACKAGING.map((p) => p.notes));
    expect(PACKAGING.map((p) => [p.name, p.notes, p.source])).toEqual([
      ['strap', 100, 'common practice'],
      ['bundle', 1000, 'common practice'],
      ['brick', 4000, 'from memory'],
    ]);
  });

  it('when every fact is checked, then each carries one of the three labels TRADE.md uses', () => {
    const all = [...DISTRICTS, ...FACILITIES, ...PACKAGING, ...SERIES_RULES, ...SERIAL_FACTS, ...GRADES];
    for (const fact of all) expect(LABELS).toContain(fact.source);
  });

  it('when the facilities are listed, then Fort Worth notes carry FW and Washington notes none (BEP, TRADE.md "Printing"; checked from memory)', () => {
    expect(FACILITIES.map((f) => [f.code, f.source])).toEqual([
      ['DC', 'published'],
      ['FW', 'published'],
    ]);
    expect(FACILITIES.every((f) => f.reference?.includes('Bureau of Engraving and Printing'))).toBe(true);
    expect(FACILITIES.find((f) => f.code === 'FW')?.mark).toContain('FW');
  });

  it('when grades are checked, then the 1–70 scale is accepted and anything else is not', () => {
    expect([1, 4, 70].map(isValidGrade)).toEqual([true, true, true]);
    expect([0, 71, 12.5].map(isValidGrade)).toEqual([false, false, false]);
    expect(GRADES.every((g) => isValidGrade(g.grade))).toBe(true);
  });
});

describe('tradeNotes', () => {
  it('when a $1 note of series 1988A, 1993 or 1995 is given, then the web-press check applies; 1988 does not', () => {
    const ids = (series: string) => tradeNotes({ series, denomination: 1 }).map((n) => n.id);
    expect(ids('1988A')).toContain('web-press');
    expect(ids('1993')).toContain('web-press');
    expect(ids('1995')).toContain('web-press');
    expect(ids('1988')).not.toContain('web-press');
    expect(tradeNotes({ series: '1995', denomination: 5 }).map((n) => n.id)).not.toContain('web-press');
  });

  it('when series 1963 is given, then the first-current-design note applies', () => {
    const note = tradeNotes({ series: '1963' }).find((n) => n.id === 'first-current-design');
    expect(note?.source).toBe('common practice');
  });

  it('when a 2013 district B star inside a duplicated range is given, then the warning applies; a district C star or a B regular note gets none', () => {
    const has = (facts: Parameters<typeof tradeNotes>[0]) => tradeNotes(facts).some((n) => n.id === 'duplicate-star-serials');
    expect(has({ series: '2013', district: 'B', star: true, value: 100 })).toBe(true);
    expect(has({ series: '2013', district: 'C', star: true, value: 100 })).toBe(false);
    expect(has({ series: '2013', district: 'B', star: false, value: 100 })).toBe(false);
  });

  it('when a 2013 district B star is given without its serial, then no duplicate warning is guessed (only two ranges were duplicated)', () => {
    expect(tradeNotes({ series: '2013', district: 'B', star: true }).map((n) => n.id)).not.toContain('duplicate-star-serials');
  });

  it('when the facility and district are given, then their notes come first, each with its source label', () => {
    const notes = tradeNotes({ district: 'K', facility: 'FW' });
    expect(notes.map((n) => [n.id, n.source])).toEqual([
      ['district', 'published'],
      ['facility', 'published'],
    ]);
    expect(notes[0]!.text).toBe('District K (11): Dallas.');
  });
});
