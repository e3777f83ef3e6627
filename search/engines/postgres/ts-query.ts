const fold = (s: string) =>
  s
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();

/** A word reduced to what to_tsquery reads safely inside quotes: letters, digits, inner `-` and `.`. */
export function lexemeOf(word: string): string {
  return fold(word)
    .replace(/[^a-z0-9.-]+/g, "")
    .replace(/^[.-]+|[.-]+$/g, "");
}

/**
 * A to_tsquery('simple', …) text: every word or alternative OR-ed (ts_rank_cd rewards documents
 * that match more of them), the last word typed so far as a prefix. Null when nothing is left.
 */
export function buildTsQuery(words: readonly string[], alternatives: readonly string[] = [], prefix?: string): string | null {
  const terms = new Set<string>();
  for (const w of [...words, ...alternatives]) {
    for (const part of w.split(/\s+/)) {
      const lexeme = lexemeOf(part);
      if (lexeme) terms.add(`'${lexeme}'`);
    }
  }
  const p = prefix ? lexemeOf(prefix) : "";
  if (p.length >= 2) terms.add(`'${p}':*`);
  return terms.size ? [...terms].join(" | ") : null;
}

/** Words long enough for typo matching (searchSettings.typoTolerance) and not numbers. */
export const typoWords = (words: readonly string[], minLength: number) =>
  [...new Set(words.map(fold))].filter((w) => w.length >= minLength && !/^[\d./-]+$/.test(w));
