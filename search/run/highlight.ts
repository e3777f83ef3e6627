/** [start, end) character offsets into a field's text, sorted, not overlapping. */
export type HighlightRange = [start: number, end: number];

// Folds one character at a time, so offsets in the folded text are offsets in the original. ASCII text (most
// of it) only needs lower case, which keeps offsets too; the per-character fold is for accented letters.
const ASCII = /^[\x00-\x7f]*$/;
const foldChar = (c: string) => (c.charCodeAt(0) < 128 ? c : (c.normalize("NFKD").replace(/[\u0300-\u036f]/g, "")[0] ?? c)).toLowerCase();
const foldChars = (text: string) => (ASCII.test(text) ? text.toLowerCase() : Array.from(text, foldChar).join(""));
const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&");

const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;
const isWordChar = (c: string) => {
  const code = c.charCodeAt(0);
  if (code < 128) return (code >= 48 && code <= 57) || (code >= 97 && code <= 122) || (code >= 65 && code <= 90);
  return LETTER_OR_DIGIT.test(c);
};

/**
 * The highlighter of one search: its terms folded once and compiled into one regular expression (longest term
 * first, so a word start takes its longest term; plain alternatives, quick to compile for each new search text).
 * Applied to each field of each hit, it scans the folded text once and keeps the matches at word starts
 * (positions not preceded by a letter or digit).
 */
export function highlighter(terms: readonly string[]): (text: string) => HighlightRange[] {
  const folded = [...new Set(terms.map((t) => foldChars(t.trim())))].filter((t) => t.length >= 2);
  if (folded.length === 0) return () => [];
  folded.sort((a, b) => b.length - a.length);
  const pattern = new RegExp(folded.map(escapeRegExp).join("|"), "g");
  return (text) => rangesOf(text, pattern);
}

/**
 * Where the terms occur in `text`, at word starts, ignoring case and accents. The client marks
 * these ranges itself, so no markup travels with user text.
 */
export function highlightRanges(text: string, terms: readonly string[]): HighlightRange[] {
  return highlighter(terms)(text);
}

function rangesOf(text: string, pattern: RegExp): HighlightRange[] {
  // Offsets count UTF-16 units; text with astral characters (emoji) is not marked rather than marked wrong.
  if (/[\uD800-\uDFFF]/.test(text)) return [];
  const hay = foldChars(text);
  const merged: HighlightRange[] = [];
  pattern.lastIndex = 0;
  for (let match = pattern.exec(hay); match !== null; match = pattern.exec(hay)) {
    const at = match.index;
    // A term must start a word; elsewhere, look again from the next character.
    pattern.lastIndex = at + 1;
    if (at > 0 && isWordChar(hay[at - 1])) continue;
    const end = at + match[0].length;
    // Starts come in order, so an overlapping or touching term extends the range before it.
    const last = merged.at(-1);
    if (last && at <= last[1]) last[1] = Math.max(last[1], end);
    else merged.push([at, end]);
  }
  return merged;
}
