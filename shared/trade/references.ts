/**
 * The publications trade facts cite. Where the check against the source was
 * made from memory (no browsing from here), the reference says so.
 */
export const BEP_SERIALS = 'Bureau of Engraving and Printing, public page on serial numbers (checked from memory)';
export const USPM_SERIALS = 'uspapermoney.info, page "Serial Numbering" (checked from memory)';
export const BEP_DISTRICTS =
  "Bureau of Engraving and Printing's published list of Federal Reserve Bank letters and numbers; the Reserve Bank cities chosen in 1914 under the Federal Reserve Act of 1913";
export const BEP_FACILITIES = 'Bureau of Engraving and Printing, public pages on its Washington, DC and Fort Worth facilities (checked from memory)';
export const HOBBY_PRESS_DUPLICATES =
  'Hobby press reports on the Series 2013 $1 duplicate star serials (Coin World, Bank Note Reporter) and the collectors’ registry of matched pairs (checked from memory)';
export const WEB_PRESS_REFERENCE =
  'Society of Paper Money Collectors, Paper Money journal articles on the web-press $1 notes (checked from memory)';
export const SHELDON =
  'W. H. Sheldon, Early American Cents (1949): the 1–70 scale, as extended by the trade for paper money';
