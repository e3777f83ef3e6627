import { formatLength, mmToIn, parseLength } from "@/lib/machining";

import { formatSixtyFourths, nearestSixtyFourths, snapInchMm } from "./inch-sizes";
import type { Token } from "./tokenise";

export interface DiameterMatch {
  /** Tokens consumed. */
  count: number;
  mm: number;
  /** In the user's unit: `1/8"`, `6 mm`. */
  display: string;
  label: string;
}

// Router and mill cutters: anything outside is a typo or another number, left as text.
const MAX_DIAMETER_MM = 100;
const NUMBER = String.raw`(?:\d+-\d+\/\d+|\d+\/\d+|\d+(?:\.\d+)?|\.\d+)`;
const UNIT = String.raw`(?:mm|millimetres?|millimeters?|in|inch|inches|")`;
const SINGLE = new RegExp(`^(${NUMBER})-?(${UNIT})?$`);
const UNIT_WORD = new RegExp(`^${UNIT}$`);
const PREFIX_WORDS = new Set(["ø", "dia", "diameter"]);
const GLUED_PREFIX = /^(?:ø|dia|d)(?=\.?\d)/;

const unitOf = (word: string | undefined): "mm" | "in" | null => (!word ? null : word.startsWith("m") ? "mm" : "in");

/**
 * A diameter starting at token `i`. Unit rules: a written unit wins; a fraction or mixed
 * number is inches; after `Ø`, `d` or `dia` a plain number is mm; a bare decimal is inches
 * when it is at most 1 and within 0.0005 in of a 1/64 size (`0.125`, `.25`), else mm;
 * a bare whole number (`6`, `2`, `6061`) is not a diameter.
 */
export function matchDiameter(tokens: readonly Token[], i: number): DiameterMatch | null {
  let j = i;
  let prefixed = false;
  let first = tokens[j]?.lower ?? "";
  if (PREFIX_WORDS.has(first) && tokens[j + 1]) {
    prefixed = true;
    first = tokens[++j].lower;
  } else if (GLUED_PREFIX.test(first)) {
    prefixed = true;
    first = first.replace(GLUED_PREFIX, "");
  }
  let numberText: string;
  let unit: "mm" | "in" | null;
  const mixed = /^\d+$/.test(first) ? tokens[j + 1]?.lower.match(new RegExp(`^(\\d+\\/\\d+)(${UNIT})?$`)) : null;
  if (mixed) {
    numberText = `${first} ${mixed[1]}`;
    unit = unitOf(mixed[2]);
    j += 1;
  } else {
    const single = first.match(SINGLE);
    if (!single) return null;
    numberText = single[1];
    unit = unitOf(single[2]);
  }
  if (!unit && tokens[j + 1] && UNIT_WORD.test(tokens[j + 1].lower)) unit = unitOf(tokens[++j].lower);
  const fraction = numberText.includes("/");
  if (!unit) {
    if (fraction) unit = "in";
    else if (prefixed) unit = "mm";
    else if (!numberText.includes(".")) return null;
    else unit = Number(numberText) <= 1 && nearestSixtyFourths(Number(numberText)) !== null ? "in" : "mm";
  }
  let mm: number;
  try {
    mm = parseLength(`${numberText} ${unit}`);
  } catch {
    return null;
  }
  if (!(mm > 0 && mm <= MAX_DIAMETER_MM)) return null;
  const count = j - i + 1;
  if (unit === "mm") {
    const rounded = Math.round(mm * 1e4) / 1e4;
    const display = formatLength(rounded, "metric");
    return { count, mm: rounded, display, label: `Ø ${display}` };
  }
  const snapped = snapInchMm(mm);
  const rounded = Math.round(snapped.mm * 1e4) / 1e4;
  const display = snapped.sixtyFourths ? formatSixtyFourths(snapped.sixtyFourths) : `${+mmToIn(mm).toFixed(4)}"`;
  return { count, mm: rounded, display, label: `Ø ${formatLength(rounded, "metric")} (${display})` };
}
