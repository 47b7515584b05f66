import { BEP_FACILITIES } from './references';
import type { Facility } from './types';

/** The two facilities that print US notes. */
export const FACILITIES: readonly Facility[] = [
  {
    code: 'DC',
    name: 'Washington, DC',
    mark: 'no facility mark beside the face check (plate) number',
    source: 'published',
    reference: BEP_FACILITIES,
  },
  {
    code: 'FW',
    name: 'Fort Worth, Texas',
    mark: 'a small "FW" before the face check (plate) number',
    source: 'published',
    reference: BEP_FACILITIES,
  },
];

/**
 * The facility for a code, or null.
 *
 * @example
 * facilityByCode('FW')?.name // 'Fort Worth, Texas'
 */
export function facilityByCode(code: string): Facility | null {
  const upper = typeof code === 'string' ? code.toUpperCase() : '';
  return FACILITIES.find((f) => f.code === upper) ?? null;
}
