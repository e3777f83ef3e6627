/** [start, end) character offsets into a field's text, sorted, not overlapping. */
export type HighlightRange = [start: number, end: number];

// Folds one character at a time, so offsets in the folded text are offsets in the original. ASCII text (most
// of it) only needs lower case, which keeps offsets too; the per-character fold is for accented letters.
const ASCII = /^[\x00-\x7f]*$/;
const foldChar = (c: string) => (c.charCodeAt(0) < 128 ? c : (c.normalize("NFKD").replace(/[\u0300-\u036f]/g, "")[0] ?? c)).toLowerCase();
const foldChars = (text: string) => (ASCII.test(text) ? text.toLowerCase() : Array.from(text, foldChar).join(""));

/** The highlighter of one search: its terms folded once, then applied to each field of each hit. */
export function highlighter(terms: readonly string[]): (text: string) => HighlightRange[] {
  const folded = [...new Set(terms.map((t) => foldChars(t.trim())).filter((t) => t.length >= 2))];
  return (text) => rangesOf(text, folded);
}

/**
 * Where the terms occur in `text`, at word starts, ignoring case and accents. The client marks
 * these ranges itself, so no markup travels with user text.
 */
export function highlightRanges(text: string, terms: readonly string[]): HighlightRange[] {
  return highlighter(terms)(text);
}

function rangesOf(text: string, terms: readonly string[]): HighlightRange[] {
  // Offsets count UTF-16 units; text with astral characters (emoji) is not marked rather than marked wrong.
  if (/[\uD800-\uDFFF]/.test(text)) return [];
  const hay = foldChars(text);
  const ranges: HighlightRange[] = [];
  for (const term of terms) {
    for (let at = hay.indexOf(term); at !== -1; at = hay.indexOf(term, at + 1)) {
      if (at === 0 || !/[\p{L}\p{N}]/u.test(hay[at - 1])) ranges.push([at, at + term.length]);
    }
  }
  ranges.sort((a, b) => a[0] - b[0] || b[1] - a[1]);
  const merged: HighlightRange[] = [];
  for (const r of ranges) {
    const last = merged.at(-1);
    if (last && r[0] <= last[1]) last[1] = Math.max(last[1], r[1]);
    else merged.push([r[0], r[1]]);
  }
  return merged;
}
