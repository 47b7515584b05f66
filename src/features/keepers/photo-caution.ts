/** TRADE.md's caution, shown wherever a photo of a note is added or shared. */
export const PHOTO_CAUTION =
  'Many countries restrict pictures of their banknotes (in the US, 18 U.S.C. § 504 sets size and colour conditions). These photos are for your own records; follow local law.';
