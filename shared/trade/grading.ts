import type { Sourced } from './types';

export interface Grade extends Sourced {
  /** Numeric grade on the 1–70 scale. */
  grade: number;
  /** Usual label, e.g. "VF-20". */
  label: string;
}

const SHELDON = 'W. H. Sheldon, Early American Cents (1949): the 1–70 scale, adapted for paper money';

/** Common grade points; the adjectives are common practice, the numbers the published scale. */
export const GRADES: readonly Grade[] = [
  { grade: 4, label: 'G-4', source: 'published', reference: SHELDON },
  { grade: 8, label: 'VG-8', source: 'published', reference: SHELDON },
  { grade: 12, label: 'F-12', source: 'published', reference: SHELDON },
  { grade: 20, label: 'VF-20', source: 'published', reference: SHELDON },
  { grade: 30, label: 'VF-30', source: 'published', reference: SHELDON },
  { grade: 40, label: 'EF-40', source: 'published', reference: SHELDON },
  { grade: 50, label: 'AU-50', source: 'published', reference: SHELDON },
  { grade: 55, label: 'AU-55', source: 'published', reference: SHELDON },
  { grade: 58, label: 'AU-58', source: 'published', reference: SHELDON },
  { grade: 60, label: 'Unc-60', source: 'published', reference: SHELDON },
  { grade: 70, label: 'Unc-70', source: 'published', reference: SHELDON },
];

/**
 * True for a whole number on the 1–70 scale.
 *
 * @example
 * isValidGrade(64) // true
 */
export function isValidGrade(grade: number): boolean {
  return Number.isInteger(grade) && grade >= 1 && grade <= 70;
}
