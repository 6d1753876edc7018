/** An ILIKE pattern matching `text` anywhere, with LIKE's own characters (% _ \) taken literally. */
export const containsPattern = (text: string) => `%${text.replace(/[%_\\]/g, '\\$&')}%`;
