/** [start, end) character offsets into a field's text, sorted, not overlapping. */
export type HighlightRange = [start: number, end: number];

// Folds one character at a time, so offsets in the folded text are offsets in the original. ASCII text (most
// of it) only needs lower case, which keeps offsets too; the per-character fold is for accented letters.
const ASCII = /^[\x00-\x7f]*$/;
const foldChar = (c: string) => (c.charCodeAt(0) < 128 ? c : (c.normalize("NFKD").replace(/[\u0300-\u036f]/g, "")[0] ?? c)).toLowerCase();
const foldChars = (text: string) => (ASCII.test(text) ? text.toLowerCase() : Array.from(text, foldChar).join(""));

const MAX_REMEMBERED = 200;
const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;
const isWordChar = (c: string) => {
  const code = c.charCodeAt(0);
  if (code < 128) return (code >= 48 && code <= 57) || (code >= 97 && code <= 122) || (code >= 65 && code <= 90);
  return LETTER_OR_DIGIT.test(c);
};

/**
 * The highlighter of one search: its terms folded once and grouped by first character (longest first, so a
 * word start takes its longest term), then applied to each field of each hit. A text met again (the same
 * cutter or material on many hits) is marked once.
 */
export function highlighter(terms: readonly string[]): (text: string) => HighlightRange[] {
  const byFirst = new Map<string, string[]>();
  for (const term of new Set(terms.map((t) => foldChars(t.trim())))) {
    if (term.length >= 2) byFirst.set(term[0], [...(byFirst.get(term[0]) ?? []), term]);
  }
  if (byFirst.size === 0) return () => [];
  for (const list of byFirst.values()) list.sort((a, b) => b.length - a.length);
  const seen = new Map<string, HighlightRange[]>();
  return (text) => {
    let ranges = seen.get(text);
    if (!ranges) {
      // A highlighter lives as long as its search plan is kept; it remembers a bounded number of texts.
      if (seen.size >= MAX_REMEMBERED) seen.clear();
      seen.set(text, (ranges = rangesOf(text, byFirst)));
    }
    return ranges.map(([start, end]) => [start, end]);
  };
}

/**
 * Where the terms occur in `text`, at word starts, ignoring case and accents. The client marks
 * these ranges itself, so no markup travels with user text.
 */
export function highlightRanges(text: string, terms: readonly string[]): HighlightRange[] {
  return highlighter(terms)(text);
}

function rangesOf(text: string, byFirst: ReadonlyMap<string, readonly string[]>): HighlightRange[] {
  // Offsets count UTF-16 units; text with astral characters (emoji) is not marked rather than marked wrong.
  if (/[\uD800-\uDFFF]/.test(text)) return [];
  const hay = foldChars(text);
  const merged: HighlightRange[] = [];
  for (let at = 0; at < hay.length; at++) {
    const candidates = byFirst.get(hay[at]);
    if (!candidates || (at > 0 && isWordChar(hay[at - 1]))) continue;
    const term = candidates.find((t) => hay.startsWith(t, at));
    if (!term) continue;
    // Starts come in order, so an overlapping or touching term extends the range before it.
    const last = merged.at(-1);
    if (last && at <= last[1]) last[1] = Math.max(last[1], at + term.length);
    else merged.push([at, at + term.length]);
  }
  return merged;
}
