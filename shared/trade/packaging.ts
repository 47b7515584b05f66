import type { Sourced } from './types';

export interface PackagingUnit extends Sourced {
  name: 'strap' | 'bundle' | 'brick';
  notes: number;
  text: string;
}

/** Notes per strap, bundle and brick, as hunters and tellers count them. */
export const PACKAGING: readonly PackagingUnit[] = [
  { name: 'strap', notes: 100, text: 'A strap holds 100 notes of one denomination.', source: 'common practice' },
  { name: 'bundle', notes: 1000, text: 'Ten straps make a bundle of 1,000 notes.', source: 'common practice' },
  { name: 'brick', notes: 4000, text: 'Four bundles make a brick of 4,000 notes.', source: 'from memory' },
];

/** 100 (common practice). */
export const NOTES_PER_STRAP = 100;
/** 1,000 (common practice). */
export const NOTES_PER_BUNDLE = 1000;
/** 4,000 (from memory). */
export const NOTES_PER_BRICK = 4000;
