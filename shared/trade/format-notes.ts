import { BEP_SERIALS, USPM_SERIALS } from './references';
import { SERIES_LETTERS, TWO_LETTER_FROM, normaliseSeries, prefixLettersFor, seriesLettersFor } from './series-letters';
import type { NoteFacts, TradeNote } from './types';

const BEP = { source: 'published', reference: BEP_SERIALS } as const;
const USPM = { source: 'published', reference: USPM_SERIALS } as const;

function noteName(facts: NoteFacts): string {
  const series = facts.series === undefined ? '' : `Series ${normaliseSeries(facts.series)} `;
  const denomination = facts.denomination === undefined ? '' : `$${facts.denomination} `;
  return `${series}${denomination}notes`.replace(/^./, (c) => c.toUpperCase());
}

function prefixRule(facts: NoteFacts, letters: 1 | 2): string {
  if (letters === 1) {
    if (facts.denomination === 1 || facts.denomination === 2) return `$${facts.denomination} notes carry one prefix letter: the district.`;
    return `${noteName(facts)} carry one prefix letter: the district.`;
  }
  const from = facts.denomination === undefined ? undefined : TWO_LETTER_FROM[facts.denomination];
  const since = from === undefined ? '' : ` (from Series ${from})`;
  return `${noteName(facts)}${since} carry two prefix letters: the series letter, then the district.`;
}

/** Prefix letters against the note type, denomination and series. */
function prefixNotes(facts: NoteFacts, prefix: string): TradeNote[] {
  if (facts.noteType === 'older') {
    if (prefix.length <= 1) return [];
    return [{ id: 'serial-format', severity: 'warning', text: 'Older note types carry one block letter before the digits, not two.', ...USPM }];
  }
  const expected = prefixLettersFor(facts.denomination, facts.series);
  if (prefix === '' || expected === null || prefix.length === expected) return [];
  const got = prefix.length === 1 ? `this serial has one (${prefix})` : `this serial has two (${prefix})`;
  return [{ id: 'serial-format', severity: 'warning', text: `${prefixRule(facts, expected)} As typed, ${got}.`, ...BEP }];
}

/** The series letter of a two-letter prefix against the series (or, without one, what it stands for). */
function seriesLetterNotes(facts: NoteFacts, prefix: string): TradeNote[] {
  if (facts.noteType === 'older' || prefix.length !== 2) return [];
  if (facts.denomination === 1 || facts.denomination === 2) return [];
  const letter = prefix[0]!;
  if (facts.series === undefined) {
    const rows = SERIES_LETTERS.filter((r) => r.letter === letter);
    if (rows.length === 0) return [];
    const named = rows.map((r) => `Series ${r.series} (${r.design})`).join(' or ');
    return [{ id: 'series-letter', severity: 'info', text: `Series letter ${letter}: ${named}.`, ...USPM }];
  }
  const allowed = seriesLettersFor(facts.series, facts.denomination);
  if (allowed.length === 0 || allowed.includes(letter)) return [];
  const series = normaliseSeries(facts.series);
  return [
    {
      id: 'series-letter-mismatch',
      severity: 'warning',
      text: `Series ${series} notes carry series letter ${allowed.join(' or ')}; this prefix starts with ${letter}. Check the series on the note or the letter typed.`,
      ...USPM,
    },
  ];
}

function suffixNotes(facts: NoteFacts): TradeNote[] {
  if (facts.suffix === 'O') {
    return [{ id: 'suffix-letter', severity: 'warning', text: 'Suffix letters never use O (it looks like 0): check the letter.', ...BEP }];
  }
  if (facts.suffix === 'Z') {
    return [
      { id: 'suffix-letter', severity: 'check', text: 'Suffix Z is kept for test printings, not a regular block: check the note.', ...BEP },
    ];
  }
  return [];
}

function starNotes(facts: NoteFacts): TradeNote[] {
  if (!facts.star || facts.prefix === undefined) return [];
  if (facts.noteType === 'older' && !facts.starBefore) {
    return [{ id: 'star-position', severity: 'warning', text: 'Older note types put the star before the digits.', ...USPM }];
  }
  if (facts.noteType !== 'older' && facts.starBefore) {
    return [
      {
        id: 'star-position',
        severity: 'warning',
        text: 'Federal Reserve notes carry the star after the digits, in place of the suffix letter; a star before the digits belongs to older note types (silver certificates, United States notes).',
        ...USPM,
      },
    ];
  }
  return [];
}

/**
 * What does not fit the serial format of the note type, denomination and
 * series given, each as a note that says what is wrong; an empty list when
 * everything fits or too little is known to judge. Only the parts typed are
 * judged: digits alone have no prefix to check.
 *
 * @example
 * formatNotes({ denomination: 1, prefix: 'MB' })[0]?.text
 * // '$1 notes carry one prefix letter: the district. As typed, this serial has two (MB).'
 */
export function formatNotes(facts: NoteFacts): TradeNote[] {
  const prefix = facts.prefix ?? '';
  return [...prefixNotes(facts, prefix), ...seriesLetterNotes(facts, prefix), ...suffixNotes(facts), ...starNotes(facts)];
}
