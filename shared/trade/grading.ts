import { SHELDON } from './references';
import type { Sourced } from './types';

export interface Grade extends Sourced {
  /** Numeric grade on the 1–70 scale. */
  grade: number;
  /** Usual label, e.g. "VF-20" or "Gem Unc-65". */
  label: string;
}

/** An adjectival band of the scale: "Gem Uncirculated" for 65–66. */
export interface GradeBand {
  from: number;
  to: number;
  /** Full name, e.g. "Choice Uncirculated". */
  name: string;
  /** The abbreviation a label starts with, e.g. "Choice Unc". */
  short: string;
}

const ADJECTIVES = 'the numbers: the published scale; the adjectives: common practice';
const scale = (grade: number, label: string): Grade => ({ grade, label, source: 'published', reference: `${SHELDON} (${ADJECTIVES})` });

/** The grade points of the scale TRADE.md lists, G-4 to 70; 63–67 matter most for new notes from straps. */
export const GRADES: readonly Grade[] = [
  scale(4, 'G-4'),
  scale(8, 'VG-8'),
  scale(12, 'F-12'),
  scale(15, 'F-15'),
  scale(20, 'VF-20'),
  scale(25, 'VF-25'),
  scale(30, 'VF-30'),
  scale(35, 'VF-35'),
  scale(40, 'EF-40'),
  scale(45, 'EF-45'),
  scale(50, 'AU-50'),
  scale(53, 'AU-53'),
  scale(55, 'AU-55'),
  scale(58, 'AU-58'),
  scale(60, 'Unc-60'),
  scale(61, 'Unc-61'),
  scale(62, 'Unc-62'),
  scale(63, 'Choice Unc-63'),
  scale(64, 'Choice Unc-64'),
  scale(65, 'Gem Unc-65'),
  scale(66, 'Gem Unc-66'),
  scale(67, 'Superb Gem Unc-67'),
  scale(68, 'Superb Gem Unc-68'),
  scale(69, 'Superb Gem Unc-69'),
  scale(70, 'Superb Gem Unc-70'),
];

/**
 * The adjectival bands (common practice), lowest first. Below G-4 the scale's
 * lowest points (1–3) are named from memory.
 */
export const GRADE_BANDS: readonly GradeBand[] = [
  { from: 1, to: 3, name: 'Poor to About Good', short: 'PO–AG' },
  { from: 4, to: 7, name: 'Good', short: 'G' },
  { from: 8, to: 11, name: 'Very Good', short: 'VG' },
  { from: 12, to: 19, name: 'Fine', short: 'F' },
  { from: 20, to: 39, name: 'Very Fine', short: 'VF' },
  { from: 40, to: 49, name: 'Extremely Fine', short: 'EF' },
  { from: 50, to: 59, name: 'About Uncirculated', short: 'AU' },
  { from: 60, to: 62, name: 'Uncirculated', short: 'Unc' },
  { from: 63, to: 64, name: 'Choice Uncirculated', short: 'Choice Unc' },
  { from: 65, to: 66, name: 'Gem Uncirculated', short: 'Gem Unc' },
  { from: 67, to: 70, name: 'Superb Gem Uncirculated', short: 'Superb Gem Unc' },
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

/**
 * The band a grade falls in, or null for anything off the scale.
 *
 * @example
 * gradeBand(65)?.name // 'Gem Uncirculated'
 */
export function gradeBand(grade: number): GradeBand | null {
  if (!isValidGrade(grade)) return null;
  return GRADE_BANDS.find((b) => grade >= b.from && grade <= b.to) ?? null;
}

/**
 * A grade as a label: the band's abbreviation and the number.
 *
 * @example
 * gradeLabel(65) // 'Gem Unc-65'
 * gradeLabel(13) // 'F-13'
 */
export function gradeLabel(grade: number): string {
  const band = gradeBand(grade);
  return band ? `${band.short}-${grade}` : String(grade);
}
