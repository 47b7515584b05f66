import { describe, expect, it } from 'vitest';
import { neighbours, read, sweep } from '../../shared/engine';
import {
  DUPLICATE_STAR_RANGES,
  GRADES,
  GRADE_BANDS,
  RUN_ENDS,
  SERIAL_FACTS,
  SERIES_LETTERS,
  SMALL_STAR_RUN,
  formatNotes,
  gradeBand,
  gradeLabel,
  isSmallStarRun,
  prefixLettersFor,
  runEndFor,
  seriesLettersFor,
  tradeNotes,
} from '../../shared/trade';
import type { ReadOptions } from '../../shared/engine';

function ids(text: string, options: ReadOptions): string[] {
  const r = read(text, options);
  if (!r.ok) throw new Error(`must read ${text}`);
  return r.trade.map((n) => n.id);
}

function note(text: string, options: ReadOptions, id: string) {
  const r = read(text, options);
  if (!r.ok) throw new Error(`must read ${text}`);
  return r.trade.find((n) => n.id === id);
}

describe('serial format by note type (BEP serial numbers; USPM "Serial Numbering" for which notes and when; both checked from memory)', () => {
  // One vector per denomination form: [denomination, series, a serial that fits, a serial that does not].
  const FORMS: Array<[number, string, string, string]> = [
    [1, '2017', 'L 1234 5678 A', 'NL 1234 5678 A'],
    [2, '2013', 'F 1234 5678 A', 'MF 1234 5678 A'],
    [5, '1995', 'B 1234 5678 A', 'AB 1234 5678 A'],
    [5, '2006', 'IB 1234 5678 A', 'B 1234 5678 A'],
    [10, '1999', 'BG 1234 5678 A', 'G 1234 5678 A'],
    [10, '1995', 'G 1234 5678 A', 'BG 1234 5678 A'],
    [20, '1996', 'AK 1234 5678 A', 'K 1234 5678 A'],
    [20, '1993', 'K 1234 5678 A', 'AK 1234 5678 A'],
    [50, '2013', 'ML 1234 5678 A', 'L 1234 5678 A'],
    [100, '2009A', 'LB 1234 5678 A', 'B 1234 5678 A'],
  ];

  for (const [denomination, series, fits, doesNot] of FORMS) {
    it(`when a $${denomination} Series ${series} note is read, then ${fits} fits and ${doesNot} gets a format warning that says what is wrong`, () => {
      expect(ids(fits, { denomination, series })).not.toContain('serial-format');
      const warning = note(doesNot, { denomination, series }, 'serial-format');
      expect(warning?.severity).toBe('warning');
      expect(warning?.source).toBe('published');
      expect(warning?.text).toMatch(/carr(y|ies) (one prefix letter: the district|two prefix letters: the series letter, then the district)/);
    });
  }

  it('when a $1 note carries two prefix letters, then the warning reads "$1 notes carry one prefix letter: the district"', () => {
    expect(note('MB 1234 5678 A', { denomination: 1 }, 'serial-format')?.text).toContain('$1 notes carry one prefix letter: the district.');
    expect(note('MB 1234 5678 A', { denomination: 2 }, 'serial-format')?.text).toContain('$2 notes carry one prefix letter: the district.');
  });

  it('when only the series is known, then series 1995 and earlier need one letter and later series are not judged by count alone', () => {
    expect(prefixLettersFor(undefined, '1995')).toBe(1);
    expect(prefixLettersFor(undefined, '2013')).toBeNull();
    expect(prefixLettersFor(20, undefined)).toBeNull();
    expect(prefixLettersFor(1, undefined)).toBe(1);
    expect(prefixLettersFor(5, '1996')).toBe(1);
    expect(prefixLettersFor(5, '1999')).toBe(2);
  });

  it('when digits alone are typed, then there is no prefix to judge and no warning', () => {
    expect(ids('12345678', { denomination: 1, series: '2017' })).not.toContain('serial-format');
  });

  it('when the series letter does not match the series, then a warning names the letter expected (USPM series-letter table)', () => {
    const w = note('JB 1234 5678 A', { denomination: 20, series: '2013' }, 'series-letter-mismatch');
    expect(w?.severity).toBe('warning');
    expect(w?.text).toBe('Series 2013 notes carry series letter M; this prefix starts with J. Check the series on the note or the letter typed.');
    expect(ids('MB 1234 5678 A', { denomination: 20, series: '2013' })).not.toContain('series-letter-mismatch');
  });

  it('when the series-letter table is read, then it holds the letters TRADE.md lists, with O and Q never used', () => {
    expect(SERIES_LETTERS.map((r) => `${r.letter}${r.series}`)).toEqual([
      'A1996', 'B1999', 'C2001', 'D2003', 'F2003A', 'H2006', 'K2006A',
      'E2004', 'G2004A', 'I2006', 'J2009', 'L2009A', 'M2013', 'N2017', 'P2017A',
    ]);
    expect(SERIES_LETTERS.every((r) => r.source === 'published' && r.reference?.includes('uspapermoney.info'))).toBe(true);
    expect(seriesLettersFor('2006').sort()).toEqual(['H', 'I']);
    expect(seriesLettersFor('2006', 100)).toEqual(['H']);
    expect(seriesLettersFor('2006', 20)).toEqual(['I']);
    expect(seriesLettersFor('2021')).toEqual([]);
  });

  it('when a two-letter prefix is read without a series, then the series letter says which series it stands for', () => {
    const r = read('MB 1234 5678 A');
    if (!r.ok) throw new Error('must read');
    expect(r.seriesLetter).toBe('M');
    expect(r.trade.find((n) => n.id === 'series-letter')?.text).toBe('Series letter M: Series 2013 (second redesign).');
  });

  it('when the suffix is O or Z, then O is flagged as never used and Z as a test printing (BEP)', () => {
    expect(note('B 1234 5678 O', {}, 'suffix-letter')).toMatchObject({ severity: 'warning', source: 'published' });
    expect(note('B 1234 5678 Z', {}, 'suffix-letter')).toMatchObject({ severity: 'check', source: 'published' });
    expect(ids('B 1234 5678 Y', {})).not.toContain('suffix-letter');
  });

  it('when an older note type is read, then the prefix is a block letter (any letter, no district) and the star goes before the digits (USPM)', () => {
    const older = read('*1234 5678 A', { noteType: 'older' });
    if (!older.ok) throw new Error('must read');
    expect(older.district).toBeNull();
    expect(older.trade.map((n) => n.id)).not.toContain('star-position');
    const block = read('R 1234 5678 A', { noteType: 'older' });
    expect(block.ok && block.district).toBeNull();
    expect(read('R 1234 5678 A').ok).toBe(false);
    expect(note('1234 5678 *', { noteType: 'older' }, 'star-position')?.text).toBe('Older note types put the star before the digits.');
    expect(note('*B 1234 5678', {}, 'star-position')?.text).toContain('Federal Reserve notes carry the star after the digits');
    expect(note('AB 1234 5678 A', { noteType: 'older' }, 'serial-format')?.text).toContain('one block letter');
  });

  it('when formatNotes is given nothing to judge, then it says nothing', () => {
    expect(formatNotes({})).toEqual([]);
  });
});

describe('run ends (run sizes: common practice among hunters; the principle: USPM, checked from memory)', () => {
  it('when run ends are looked up, then $1–$20 stop at 96,000,000 (15 runs of 6,400,000) and $50, $100 at 99,200,000 (31 runs of 3,200,000)', () => {
    for (const d of [1, 2, 5, 10, 20]) expect(runEndFor(d)?.last).toBe(96_000_000);
    for (const d of [50, 100]) expect(runEndFor(d)?.last).toBe(99_200_000);
    expect(RUN_ENDS.map((r) => r.runSize * (r.last / r.runSize))).toEqual([15 * 6_400_000, 31 * 3_200_000]);
    expect(RUN_ENDS.every((r) => r.source === 'common practice')).toBe(true);
    expect(runEndFor(3)).toBeNull();
  });

  it('when a note is read above its run end, then the reading says so; at the run end it does not', () => {
    expect(note('96000001', { denomination: 20 }, 'run-end')?.severity).toBe('warning');
    expect(note('96000001', { denomination: 20 }, 'run-end')?.text).toContain('uncut sheets');
    expect(ids('96000000', { denomination: 20 })).not.toContain('run-end');
    expect(ids('99200000', { denomination: 100 })).not.toContain('run-end');
    expect(note('99200001', { denomination: 100 }, 'run-end')?.severity).toBe('warning');
    expect(note('97000000', {}, 'run-end')?.severity).toBe('check');
    expect(note('99300000', {}, 'run-end')?.severity).toBe('warning');
  });

  it('when the denomination is known, then neighbours never point past its run end', () => {
    const r = read('95999999', { denomination: 1 });
    if (!r.ok) throw new Error('must read');
    expect(r.runEnd).toBe(96_000_000);
    for (const n of Object.values(r.neighbours)) if (n.above) expect(Number(n.above.serial)).toBeLessThanOrEqual(96_000_000);
    expect(r.neighbours.solid.above).toBeNull();
    const above = read('98888887', { denomination: 5 });
    if (!above.ok) throw new Error('must read');
    expect(above.neighbours.solid.below?.serial).toBe('88888888');
    expect(above.neighbours.solid.above).toBeNull();
    const free = read('95999999');
    expect(free.ok && free.neighbours.solid.above?.serial).toBe('99999999');
    expect(neighbours('99199999', 'radar', { last: 99_200_000 }).above).toBeNull();
  });

  it('when a sweep is given a run end, then it stops there and says it was cut', () => {
    const cut = sweep('95999990', 100, ['trinary'], { last: 96_000_000 });
    expect(cut.last).toBe(96_000_000);
    expect(cut.truncated).toBe(true);
    expect(cut.hits.every((h) => h.value <= 96_000_000)).toBe(true);
  });

  it('when the odds use the run-end domain, then the domain is the run end and no high serial is counted', () => {
    const r = read('88888888', { denomination: 10, domainLast: 'run-end' });
    if (!r.ok) throw new Error('must read');
    expect(r.odds.domainSize).toBe(96_000_000);
  });
});

describe('duplicate star serials (hobby press and the collectors’ registry of pairs; checked from memory)', () => {
  const facts = { series: '2013', denomination: 1 };
  const has = (text: string, extra: ReadOptions = {}) => ids(text, { ...facts, ...extra }).includes('duplicate-star-serials');

  it('when the ranges are listed, then they are B00000001★–B00250000★ and B03200001★–B09600000★', () => {
    expect(DUPLICATE_STAR_RANGES.map((r) => [r.district, r.first, r.last])).toEqual([
      ['B', 1, 250_000],
      ['B', 3_200_001, 9_600_000],
    ]);
  });

  it('when each range is probed at both ends and just outside each end, then only the serials inside warn', () => {
    expect(has('B 0000 0001 *')).toBe(true);
    expect(has('B 0025 0000 *')).toBe(true);
    expect(has('B 0025 0001 *')).toBe(false);
    expect(has('B 0320 0000 *')).toBe(false);
    expect(has('B 0320 0001 *')).toBe(true);
    expect(has('B 0960 0000 *')).toBe(true);
    expect(has('B 0960 0001 *')).toBe(false);
  });

  it('when the note is not a 2013 $1 New York star, then there is no warning', () => {
    expect(has('B 0000 0001 A')).toBe(false);
    expect(has('C 0000 0001 *')).toBe(false);
    expect(ids('B 0000 0001 *', { series: '2013A', denomination: 1 })).not.toContain('duplicate-star-serials');
    expect(ids('B 0000 0001 *', { series: '2013', denomination: 5 })).not.toContain('duplicate-star-serials');
  });

  it('when the warning shows, then it explains the facility mark and that the matched pair carries the premium; with FW it names the note', () => {
    const text = note('B 0000 0001 *', { ...facts, facility: 'FW' }, 'duplicate-star-serials')?.text ?? '';
    expect(text).toContain('"FW"');
    expect(text).toContain('A matched pair carries the premium; a single note is worth far less');
    expect(text).toContain('This one carries FW, so it is the Fort Worth note.');
  });
});

describe('quality-control gaps (common practice)', () => {
  it('when a serial ends in 0000, 9999 or 00002, then the reading mentions the quality-control pulls; other endings do not', () => {
    for (const s of ['12340000', '12349999', '12300002']) expect(ids(s, {})).toContain('quality-control-gap');
    for (const s of ['12340001', '12349998', '12300012']) expect(ids(s, {})).not.toContain('quality-control-gap');
    expect(SERIAL_FACTS.find((f) => f.id === 'quality-control-gaps')?.source).toBe('common practice');
  });
});

describe('star runs (common practice; no run data ships)', () => {
  it('when a run size is recorded, then 640,000 or fewer counts as small', () => {
    expect(SMALL_STAR_RUN).toBe(640_000);
    expect([640_000, 320_000, 640_001, 3_200_000, 0, null].map((n) => isSmallStarRun(n))).toEqual([true, true, false, false, false, false]);
  });

  it('when a star note has no run size, then the reading prompts to look it up and the suggestion is not a bare "back in the strap"', () => {
    const r = read('B 1234 5679 *');
    if (!r.ok) throw new Error('must read');
    expect(r.trade.find((n) => n.id === 'star-run')?.severity).toBe('check');
    expect(r.score.suggestion).toContain('look up its run size before it goes back in the strap');
  });

  it('when a small run is recorded, then the small-run bonus is scored on top of the star bonus', () => {
    const r = read('B 1234 5679 *', { starRunSize: 320_000 });
    if (!r.ok) throw new Error('must read');
    expect(r.score.lines.map((l) => [l.kind, l.points])).toEqual([
      ['star', 1],
      ['star-run', 3],
    ]);
    const big = read('B 1234 5679 *', { starRunSize: 3_200_000 });
    expect(big.ok && big.score.lines.map((l) => l.kind)).toEqual(['star']);
    expect(big.ok && big.score.suggestion).toContain('back in the strap.');
  });

  it('when the trade data is searched, then it holds no run sizes of real star runs', () => {
    expect(JSON.stringify(tradeNotes({ star: true, starRunSize: null }))).not.toMatch(/\d{3},\d{3} notes\)/);
  });
});

describe('grades (the 1–70 scale: Sheldon 1949 as extended by the trade; adjectives common practice)', () => {
  it('when the scale is listed, then it has every point TRADE.md lists, 61 and 62 and 63–70 included', () => {
    expect(GRADES.map((g) => g.label)).toEqual([
      'G-4', 'VG-8', 'F-12', 'F-15', 'VF-20', 'VF-25', 'VF-30', 'VF-35', 'EF-40', 'EF-45',
      'AU-50', 'AU-53', 'AU-55', 'AU-58', 'Unc-60', 'Unc-61', 'Unc-62', 'Choice Unc-63', 'Choice Unc-64',
      'Gem Unc-65', 'Gem Unc-66', 'Superb Gem Unc-67', 'Superb Gem Unc-68', 'Superb Gem Unc-69', 'Superb Gem Unc-70',
    ]);
  });

  it('when grades are put in bands, then 63–64 is Choice, 65–66 Gem and 67 up Superb Gem: a 65 is not just "Unc"', () => {
    expect([60, 62, 63, 64, 65, 66, 67, 70].map((g) => gradeBand(g)?.name)).toEqual([
      'Uncirculated', 'Uncirculated', 'Choice Uncirculated', 'Choice Uncirculated',
      'Gem Uncirculated', 'Gem Uncirculated', 'Superb Gem Uncirculated', 'Superb Gem Uncirculated',
    ]);
    expect(gradeLabel(65)).toBe('Gem Unc-65');
    expect(gradeLabel(13)).toBe('F-13');
    expect(gradeBand(0)).toBeNull();
  });

  it('when the bands are laid end to end, then they cover 1–70 once each', () => {
    let next = 1;
    for (const band of GRADE_BANDS) {
      expect(band.from).toBe(next);
      next = band.to + 1;
    }
    expect(next).toBe(71);
    for (const g of GRADES) expect(gradeLabel(g.grade)).toBe(g.label);
  });
});
