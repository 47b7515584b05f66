import { districtByLetter } from './districts';
import { facilityByCode } from './facilities';
import { SERIES_RULES } from './series';
import { SERIAL_FACTS } from './serials';
import type { NoteFacts, SeriesRule, Sourced, TradeNote } from './types';

function normaliseSeries(series: string): string {
  return series.replace(/\s+/g, '').toUpperCase();
}

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

/**
 * The trade facts that apply to a note, each with its source label, in a
 * stable order: district, facility, star, then series rules.
 *
 * @example
 * tradeNotes({ series: '2013', district: 'B', star: true, denomination: 1 })
 *   .map((n) => n.id) // ['district', 'star', 'duplicate-star-serials']
 */
export function tradeNotes(facts: NoteFacts): TradeNote[] {
  const notes: TradeNote[] = [];
  const district = facts.district ? districtByLetter(facts.district) : null;
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
    const fact = SERIAL_FACTS.find((f) => f.id === 'star-replacement');
    if (fact) notes.push({ id: 'star', severity: 'info', text: fact.text, ...sourceOf(fact) });
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
