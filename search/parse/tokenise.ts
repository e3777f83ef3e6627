export interface Token {
  /** As written in the sanitised query. */
  text: string;
  lower: string;
  start: number;
  end: number;
}

// A word: letters and digits, joined inside by `.`, `_`, `-`, or `/` between digits (`1/8`),
// optionally ending in an inch mark. A leading `.25` counts as a number.
const TOKEN = /(?:\.\d|[\p{L}\p{N}])(?:[\p{L}\p{N}]|[._-](?=[\p{L}\p{N}])|(?<=\d)\/(?=\d))*"?/gu;

export function tokenise(query: string, limit: number): { tokens: Token[]; truncated: boolean } {
  const tokens: Token[] = [];
  for (const m of query.matchAll(TOKEN)) {
    if (tokens.length === limit) return { tokens, truncated: true };
    tokens.push({ text: m[0], lower: m[0].toLowerCase(), start: m.index, end: m.index + m[0].length });
  }
  return { tokens, truncated: false };
}
