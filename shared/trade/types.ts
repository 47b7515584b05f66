/**
 * Where a trade fact comes from, with the exact labels TRADE.md uses:
 * a published source, what hunters and tellers do (`common practice`), or
 * believed true but worth a second look (`from memory`).
 */
export type SourceLabel = 'published' | 'common practice' | 'from memory';

export interface Sourced {
  source: SourceLabel;
  /** The publication, when `source` is `published`. */
  reference?: string;
}

export interface District extends Sourced {
  letter: string;
  number: number;
  bank: string;
}

export interface Facility extends Sourced {
  code: 'DC' | 'FW';
  name: string;
  /** How to recognise its notes. */
  mark: string;
}

/** A fact about a series that a hunter should check, with the notes it applies to. */
export interface SeriesRule extends Sourced {
  id: string;
  /** Series as printed ("1988A"); the rule applies to any of them. */
  series: string[];
  /** Face value in dollars, or null for every denomination. */
  denomination: number | null;
  /** When set, only these districts. */
  districts?: string[];
  /** When set, only star notes (true) or only regular notes (false). */
  star?: boolean;
  severity: 'info' | 'check' | 'warning';
  text: string;
}

/** One trade fact that applies to a given note, as a reading lists it. */
export interface TradeNote extends Sourced {
  id: string;
  severity: 'info' | 'check' | 'warning';
  text: string;
}

/** Federal Reserve notes (the default) or the older types with a block letter. */
export type NoteType = 'federal-reserve' | 'older';

/** What the caller knows about a note: its serial's parts when read, and what the hunt or keeper says. */
export interface NoteFacts {
  series?: string;
  district?: string | null;
  facility?: 'DC' | 'FW';
  star?: boolean;
  denomination?: number;
  /** The serial's value, 1…99,999,999, when a serial was read. */
  value?: number;
  /** Prefix letters as typed ('' for digits only). */
  prefix?: string;
  /** Suffix letter as typed ('' when none). */
  suffix?: string;
  /** True when the star was typed before the digits. */
  starBefore?: boolean;
  noteType?: NoteType;
  /** The star run's size as the hunter looked it up, when they did. */
  starRunSize?: number | null;
}
