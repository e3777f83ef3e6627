import { matchDiameter } from "./match-diameter";
import { matchFlutes } from "./match-flutes";
import { matchPhrase } from "./phrase-index";
import { MAX_QUERY_TOKENS, sanitiseQuery } from "./sanitise";
import { tokenise, type Token } from "./tokenise";
import type { ChipKind, QueryChip } from "./types";

/** Where one recognised part sits in the sanitised query. */
export interface ChipSpan {
  chip: QueryChip;
  start: number;
  end: number;
  /** Flute count given or implied (`O-flute` is one flute). */
  flutes?: number;
  diameterText?: string;
}

export interface QuerySpans {
  query: string;
  truncated: boolean;
  spans: ChipSpan[];
  textTokens: Token[];
}

const SKU = /^(?=[^-]*-)(?=.*[a-z])(?=.*\d)[a-z0-9]+(?:-[a-z0-9]+)+$/i;

/** Splits a query into recognised parts (in order, repeats included) and the tokens left as text. */
export function parseSpans(input: unknown): QuerySpans {
  const { query, truncated: cut } = sanitiseQuery(input);
  const { tokens, truncated } = tokenise(query, MAX_QUERY_TOKENS);
  const spans: ChipSpan[] = [];
  const textTokens: Token[] = [];
  const seen = new Set<ChipKind>();
  const push = (kind: ChipKind, value: string, label: string, from: number, count: number, extra: Partial<ChipSpan> = {}) => {
    const start = tokens[from].start;
    const end = tokens[from + count - 1].end;
    spans.push({ chip: { kind, label, value, sourceText: query.slice(start, end) }, start, end, ...extra });
    seen.add(kind);
    if (extra.flutes !== undefined) seen.add("flutes");
    return count;
  };
  const sameAsFirst = (kind: ChipKind, value: string) => spans.find((s) => s.chip.kind === kind)?.chip.value === value;
  for (let i = 0; i < tokens.length;) {
    // A second diameter or flute count is recognised only when it repeats the first.
    const diameter = matchDiameter(tokens, i);
    if (diameter && (!seen.has("diameter") || sameAsFirst("diameter", String(diameter.mm)))) {
      i += push("diameter", String(diameter.mm), diameter.label, i, diameter.count, { diameterText: diameter.display });
      continue;
    }
    const flutes = matchFlutes(tokens, i);
    if (flutes && (!seen.has("flutes") || spans.find((s) => s.flutes !== undefined)?.flutes === flutes.flutes)) {
      const label = `${flutes.flutes} ${flutes.flutes === 1 ? "flute" : "flutes"}`;
      i += push("flutes", String(flutes.flutes), label, i, flutes.count, { flutes: flutes.flutes });
      continue;
    }
    const phrase = matchPhrase(tokens, i);
    if (phrase) {
      const { kind, key, label, flutes: implied } = phrase.hit;
      i += push(kind, key, label, i, phrase.count, implied === undefined ? {} : { flutes: implied });
      continue;
    }
    if (SKU.test(tokens[i].text) && tokens[i].text.length <= 40) {
      const sku = tokens[i].text.toUpperCase();
      push("sku", sku, sku, i, 1);
      textTokens.push(tokens[i]); // SKUs stay in the free text too
    } else {
      textTokens.push(tokens[i]);
    }
    i += 1;
  }
  return { query, truncated: cut || truncated, spans, textTokens };
}
