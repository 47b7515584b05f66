import { BEP_DISTRICTS } from './references';
import type { District } from './types';

const RESERVE_BANKS = BEP_DISTRICTS;

/** The twelve Federal Reserve districts, letter A–L, with number and bank. */
export const DISTRICTS: readonly District[] = [
  { letter: 'A', number: 1, bank: 'Boston', source: 'published', reference: RESERVE_BANKS },
  { letter: 'B', number: 2, bank: 'New York', source: 'published', reference: RESERVE_BANKS },
  { letter: 'C', number: 3, bank: 'Philadelphia', source: 'published', reference: RESERVE_BANKS },
  { letter: 'D', number: 4, bank: 'Cleveland', source: 'published', reference: RESERVE_BANKS },
  { letter: 'E', number: 5, bank: 'Richmond', source: 'published', reference: RESERVE_BANKS },
  { letter: 'F', number: 6, bank: 'Atlanta', source: 'published', reference: RESERVE_BANKS },
  { letter: 'G', number: 7, bank: 'Chicago', source: 'published', reference: RESERVE_BANKS },
  { letter: 'H', number: 8, bank: 'St. Louis', source: 'published', reference: RESERVE_BANKS },
  { letter: 'I', number: 9, bank: 'Minneapolis', source: 'published', reference: RESERVE_BANKS },
  { letter: 'J', number: 10, bank: 'Kansas City', source: 'published', reference: RESERVE_BANKS },
  { letter: 'K', number: 11, bank: 'Dallas', source: 'published', reference: RESERVE_BANKS },
  { letter: 'L', number: 12, bank: 'San Francisco', source: 'published', reference: RESERVE_BANKS },
];

/**
 * The district for a letter, or null.
 *
 * @example
 * districtByLetter('B')?.bank // 'New York'
 */
export function districtByLetter(letter: string): District | null {
  const upper = typeof letter === 'string' ? letter.toUpperCase() : '';
  return DISTRICTS.find((d) => d.letter === upper) ?? null;
}
