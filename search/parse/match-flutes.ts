import type { Token } from "./tokenise";

export interface FluteMatch {
  count: number;
  flutes: number;
}

const WORDS: Record<string, number> = { two: 2, three: 3, four: 4, five: 5, six: 6 };
const FLUTE = "(?:fl|flt|flute|flutes|fluted)";
const GLUED = new RegExp(`^(\\d{1,2}|${Object.keys(WORDS).join("|")})-?${FLUTE}$`);
const SHORT = /^(\d{1,2})f$/; // 2F
const ISO = /^z(\d{1,2})$/; // z2: ISO symbol for the number of teeth
const FLUTE_WORD = new RegExp(`^${FLUTE}$`);
const MAX_FLUTES = 12;

const toCount = (word: string) => (/^\d+$/.test(word) ? Number(word) : (WORDS[word] ?? NaN));

/**
 * A flute count at token `i`: `2 flute`, `2-flute`, `2fl`, `2F`, `three flutes`, `z2`.
 * One-flute words (`single flute`, `O-flute`) are geometry words in the vocabulary.
 */
export function matchFlutes(tokens: readonly Token[], i: number): FluteMatch | null {
  const word = tokens[i].lower;
  const glued = word.match(GLUED) ?? word.match(SHORT) ?? word.match(ISO);
  let count = 1;
  let flutes = glued ? toCount(glued[1]) : NaN;
  if (!glued && tokens[i + 1] && FLUTE_WORD.test(tokens[i + 1].lower)) {
    flutes = toCount(word);
    count = 2;
  }
  return flutes >= 1 && flutes <= MAX_FLUTES ? { count, flutes } : null;
}
