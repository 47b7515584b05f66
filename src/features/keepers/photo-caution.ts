/**
 * TRADE.md's caution, shown wherever a photo of a note is added or shared. The conditions are those of
 * 18 U.S.C. § 504 and the Treasury's rules in 31 CFR Part 411 (checked from memory).
 */
export const PHOTO_CAUTION =
  'Many countries restrict pictures of their banknotes. In the US, 18 U.S.C. § 504 and the Treasury’s rules in 31 CFR Part 411 allow colour illustrations only one-sided and under 75% or over 150% of the note’s size, and digital files used to make them are to be deleted after use. These photos are your own records; a share link shows one side, small. Follow local law.';
