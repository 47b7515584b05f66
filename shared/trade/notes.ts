import { districtByLetter } from './districts';
import { duplicateStarRange } from './duplicate-stars';
import { facilityByCode } from './facilities';
import { formatNotes } from './format-notes';
import { HIGHEST_RUN_END, LOWEST_RUN_END, runEndFor } from './run-ends';
import { SERIAL_FACTS } from './serials';
import { SERIES_RULES } from './series';
import { normaliseSeries } from './series-letters';
import { SMALL_STAR_RUN, isSmallStarRun } from './star-runs';
import type { NoteFacts, SeriesRule, Sourced, TradeNote } from './types';

function ruleApplies(rule: SeriesRule, facts: NoteFacts, district: string | null): boolean {
  if (facts.series === undefined || !rule.series.includes(normaliseSeries(facts.series))) return false;
  // An unknown denomination keeps the rule: its text names the denomination it is about.
  if (rule.denomination !== null && facts.denomination !== undefined && facts.denomination !== rule.denomination) {
    return false;
  }
  if (rule.districts && (district === null || !rule.districts.includes(district))) return false;
  if (rule.star !== undefined && Boolean(facts.star) !== rule.star) return false;
  return true;
}

function fact(id: string): Sourced & { text: string } {
  const found = SERIAL_FACTS.find((f) => f.id === id);
  if (!found) throw new Error(`trade: no serial fact ${id}`);
  return found;
}

const grouped = (n: number): string => n.toLocaleString('en-US');

function runEndNote(facts: NoteFacts): TradeNote | null {
  if (facts.value === undefined || facts.noteType === 'older') return null;
  const runEnd = runEndFor(facts.denomination);
  const source = sourceOf(fact('run-ends'));
  if (runEnd) {
    if (facts.value <= runEnd.last) return null;
    return {
      id: 'run-end',
      severity: 'warning',
      text: `Above ${grouped(runEnd.last)}: ${runEnd.text}. Higher serials come only from uncut sheets sold to collectors, so check this note.`,
      ...source,
    };
  }
  if (facts.value <= LOWEST_RUN_END) return null;
  const beyondAll = facts.value > HIGHEST_RUN_END;
  return {
    id: 'run-end',
    severity: beyondAll ? 'warning' : 'check',
    text: beyondAll
      ? `Above ${grouped(HIGHEST_RUN_END)}: past every circulating run end ($1–$20 stop at 96,000,000, $50 and $100 at 99,200,000). Higher serials come only from uncut sheets, so check this note.`
      : `Above ${grouped(LOWEST_RUN_END)}: past the run end of $1–$20 notes (only $50 and $100 run to 99,200,000). If this is a $1–$20 note, it comes from an uncut sheet.`,
    ...source,
  };
}

function duplicateNote(facts: NoteFacts, district: string | null): TradeNote | null {
  const range = duplicateStarRange({ ...facts, district });
  if (!range) return null;
  const mark =
    facts.facility === 'FW'
      ? ' This one carries FW, so it is the Fort Worth note.'
      : facts.facility === 'DC'
        ? ' This one has no mark, so it is the Washington note.'
        : '';
  return {
    id: 'duplicate-star-serials',
    severity: 'warning',
    text:
      'Series 2013 $1 New York star notes in B00000001★–B00250000★ and B03200001★–B09600000★ were printed at both Washington and Fort Worth, so two notes share this serial. ' +
      'The facility mark tells them apart: a small "FW" beside the face check (plate) number means Fort Worth, none means Washington.' +
      `${mark} A matched pair carries the premium; a single note is worth far less, so don't pay pair money for one.`,
    ...sourceOf(range),
  };
}

function qualityControlNote(facts: NoteFacts): TradeNote | null {
  if (facts.value === undefined) return null;
  const v = facts.value;
  const ending = v % 10_000 === 0 ? '0000' : v % 10_000 === 9_999 ? '9999' : v % 100_000 === 2 ? '00002' : null;
  if (ending === null) return null;
  return {
    id: 'quality-control-gap',
    severity: 'info',
    text: `Ends in ${ending}: for decades serials ending in 0000 or 9999 (and many ending 00002) were pulled for quality control and replaced by star notes, so such notes are scarcer in older series than the raw count says.`,
    ...sourceOf(fact('quality-control-gaps')),
  };
}

function starRunNote(facts: NoteFacts): TradeNote | null {
  if (!facts.star) return null;
  const source = sourceOf(fact('star-runs'));
  const size = facts.starRunSize;
  if (typeof size !== 'number') {
    return {
      id: 'star-run',
      severity: 'check',
      text: `Star note: look up its run size before it goes back in the strap. Runs of ${grouped(SMALL_STAR_RUN)} notes or fewer are small, and their notes scarcer.`,
      ...source,
    };
  }
  return {
    id: 'star-run',
    severity: 'info',
    text: isSmallStarRun(size)
      ? `Small star run: ${grouped(size)} notes (${grouped(SMALL_STAR_RUN)} or fewer), so this note is scarcer.`
      : `Star run of ${grouped(size)} notes: not a small run (those are ${grouped(SMALL_STAR_RUN)} notes or fewer).`,
    ...source,
  };
}

/**
 * The trade facts and format warnings that apply to a note, each with its
 * source label, in a stable order: district, facility, star, format
 * warnings, run end, duplicate serials, quality-control gap, series rules.
 * Facts about the serial need its parts (`value`, `prefix`, `suffix`).
 *
 * @example
 * tradeNotes({ series: '2013', district: 'B', star: true, denomination: 1, value: 5_000_000, prefix: 'B', suffix: '' })
 *   .map((n) => n.id) // ['district', 'star', 'star-run', 'duplicate-star-serials']
 */
export function tradeNotes(facts: NoteFacts): TradeNote[] {
  const notes: TradeNote[] = [];
  const district = facts.noteType === 'older' ? null : facts.district ? districtByLetter(facts.district) : null;
  if (district) {
    notes.push({
      id: 'district',
      severity: 'info',
      text: `District ${district.letter} (${district.number}): ${district.bank}.`,
      ...sourceOf(district),
    });
  }
  const facility = facts.facility ? facilityByCode(facts.facility) : null;
  if (facility) {
    notes.push({
      id: 'facility',
      severity: 'info',
      text: `Printed at ${facility.name}: ${facility.mark}.`,
      ...sourceOf(facility),
    });
  }
  if (facts.star) {
    const star = fact('star-replacement');
    notes.push({ id: 'star', severity: 'info', text: star.text, ...sourceOf(star) });
    const run = starRunNote(facts);
    if (run) notes.push(run);
  }
  notes.push(...formatNotes(facts));
  for (const note of [runEndNote(facts), duplicateNote(facts, district ? district.letter : null), qualityControlNote(facts)]) {
    if (note) notes.push(note);
  }
  for (const rule of SERIES_RULES) {
    if (ruleApplies(rule, facts, district ? district.letter : null)) {
      notes.push({ id: rule.id, severity: rule.severity, text: rule.text, ...sourceOf(rule) });
    }
  }
  return notes;
}

/** Copies the label, and the reference only when there is one, so notes stay JSON-exact. */
function sourceOf(fact: Sourced): Sourced {
  return fact.reference === undefined ? { source: fact.source } : { source: fact.source, reference: fact.reference };
}
