/**
 * A LIKE pattern matching `q` anywhere, lower-cased to suit the lower-cased search columns.
 * %, _ and \ in what the user typed are matched literally, not as wildcards.
 */
export function containsPattern(q: string): string {
  return `%${q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
