// Pure: bounds untrusted Markdown before the parser sees it. The Markdown parser and the renderers after it recurse
// once per nesting level and slow down super-linearly on long runs of emphasis and bracket delimiters, so a few
// thousand `>` or `- ` in a row overflow the stack and a few thousand `![` take seconds. Block parsing also grows
// faster than the text with the number of lines (setext underlines, lazy quote continuations, list items, headings:
// 5,000 two-character lines took seconds), so the line count is capped as well. Everything here is one linear pass.

export const MARKDOWN_LIMITS = {
  /** Longer text is shown as plain text: tickets and replies are at most 20,000 characters. */
  maxLength: 20_000,
  /** Block quotes and list items one line may open (indentation counts as one level per two columns). */
  maxLineDepth: 16,
  /** Lines in one text; more is shown as plain text (a long ticket is a few dozen lines). */
  maxLines: 400,
  /** Emphasis, strike-through, link, table and code-span delimiters in one text; more is shown as plain text. */
  maxDelimiters: 200,
} as const;

export type PreparedMarkdown = { kind: "markdown"; text: string } | { kind: "plain"; text: string };

const DELIMITERS = new Set(["*", "_", "~", "[", "]", "|", "`"]);
const BULLETS = new Set(["-", "*", "+"]);

function countLines(text: string, stopAbove: number): number {
  let count = 1;
  for (let i = 0; i < text.length && count <= stopAbove; i++) {
    const c = text[i];
    if (c === "\n" || (c === "\r" && text[i + 1] !== "\n")) count++;
  }
  return count;
}

function countDelimiters(text: string, stopAbove: number): number {
  let count = 0;
  for (let i = 0; i < text.length && count <= stopAbove; i++) if (DELIMITERS.has(text[i])) count++;
  return count;
}

const isBlank = (c: string | undefined) => c === undefined || c === " " || c === "\t";
const isDigit = (c: string | undefined) => c !== undefined && c >= "0" && c <= "9";

/** Length of a container marker at `i` (`>`, a bullet, `12.`/`12)`, a footnote label `[^x]:`), 0 when none. */
function markerAt(line: string, i: number): number {
  const c = line[i];
  if (c === ">") return 1;
  if (BULLETS.has(c) && isBlank(line[i + 1])) return 1;
  if (isDigit(c)) {
    let j = i;
    while (j < line.length && j - i < 9 && isDigit(line[j])) j++;
    return (line[j] === "." || line[j] === ")") && isBlank(line[j + 1]) ? j - i + 1 : 0;
  }
  if (c === "[" && line[i + 1] === "^") {
    const close = line.indexOf("]:", i + 2);
    return close > 0 && close - i < 1_000 ? close - i + 2 : 0;
  }
  return 0;
}

/** The marker with its first punctuation escaped, so it reads as text. */
function escapeMarker(marker: string): string {
  if (isDigit(marker[0])) return `${marker.slice(0, -1)}\\${marker.slice(-1)}`;
  return `\\${marker}`;
}

/** Keeps a line's leading containers within the limit; the rest of its markers become text. */
function limitLineDepth(line: string, maxDepth: number): string {
  let depth = 0;
  let columns = 0;
  let i = 0;
  const level = () => depth + Math.ceil(columns / 2);
  for (;;) {
    if (line[i] === " " || line[i] === "\t") {
      columns += line[i] === "\t" ? 4 : 1;
      i++;
      continue;
    }
    const length = markerAt(line, i);
    if (!length) return line;
    depth++;
    if (level() > maxDepth) break;
    i += length;
  }
  // Over the limit: rebuild the prefix up to the limit, then let the rest start as paragraph text.
  let out = "";
  depth = 0;
  columns = 0;
  i = 0;
  for (;;) {
    const c = line[i];
    if (c === " " || c === "\t") {
      const width = c === "\t" ? 4 : 1;
      if (depth + Math.ceil((columns + width) / 2) <= maxDepth) {
        out += " ".repeat(width);
        columns += width;
      }
      i++;
      continue;
    }
    const length = markerAt(line, i);
    if (!length) return out + line.slice(i);
    if (depth + 1 + Math.ceil(columns / 2) > maxDepth) return out + escapeMarker(line.slice(i, i + length)) + line.slice(i + length);
    depth++;
    out += line.slice(i, i + length);
    i += length;
  }
}

/**
 * Makes untrusted Markdown safe to parse in bounded time: too long, too many lines or too many delimiters → plain text;
 * lines nested deeper than the limit → flattened.
 */
export function prepareMarkdown(source: string, limits: typeof MARKDOWN_LIMITS = MARKDOWN_LIMITS): PreparedMarkdown {
  if (source.length > limits.maxLength) return { kind: "plain", text: source };
  if (countLines(source, limits.maxLines) > limits.maxLines) return { kind: "plain", text: source };
  if (countDelimiters(source, limits.maxDelimiters) > limits.maxDelimiters) return { kind: "plain", text: source };
  const lines = source.split(/\r\n|\r|\n/);
  return { kind: "markdown", text: lines.map((line) => limitLineDepth(line, limits.maxLineDepth)).join("\n") };
}
