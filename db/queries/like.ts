/** A LIKE pattern matching text that contains `term`; wildcards the user typed are literal. */
export function containsPattern(term: string): string {
  return `%${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
