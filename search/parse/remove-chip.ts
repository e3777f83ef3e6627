import { parseSpans } from "./parse-spans";
import type { QueryChip } from "./types";

type Span = { start: number; end: number };

const sameChip = (a: QueryChip, b: Pick<QueryChip, "kind" | "value">) => a.kind === b.kind && a.value === b.value;

/** Replaces the given spans of `query` (each with `by`) and tidies the spaces left behind. */
export function spliceSpans(query: string, spans: readonly Span[], by = ""): string {
  let out = query;
  for (const { start, end } of [...spans].sort((a, b) => b.start - a.start)) {
    out = `${out.slice(0, start)}${by ? ` ${by} ` : " "}${out.slice(end)}`;
  }
  return out.replace(/\s+/g, " ").trim();
}

/**
 * The query without the words of `chip`, every occurrence (`acrylic pmma` loses both for the
 * acrylic chip). Returns the sanitised query, unchanged when the chip is not in it.
 */
export function removeChip(input: string, chip: Pick<QueryChip, "kind" | "value">): string {
  const { query, spans } = parseSpans(input);
  return spliceSpans(
    query,
    spans.filter((s) => sameChip(s.chip, chip)),
  );
}
