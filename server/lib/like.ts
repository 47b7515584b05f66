/** A LIKE/ILIKE pattern matching `text` anywhere, with the user's % and _ taken literally. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
