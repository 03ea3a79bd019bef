/** A case-insensitive substring pattern for ILIKE, with the wildcards % and _ taken literally. */
export function containsPattern(q: string): string {
  return `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
