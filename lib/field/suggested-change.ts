import { parseDocument } from "yaml";

import { changeableParamLabels, type ChangeableParam } from "@/content-schema/outcome-fields";
import type { SheetOperation } from "@/content-schema/sheet-front-matter";
import { inMinToMmMin, inToMm } from "@/lib/machining";
import { splitFrontMatter } from "@/lib/mdx/split-front-matter";

// Pure: a "What customers changed" suggestion applied to one operation of a sheet source, and the change note
// that cites the reports behind it. No customer is named anywhere: only counts, shares and intervals.

/** The front-matter key of an operation that holds each parameter customers report changing. */
export const OPERATION_KEY = {
  rpm: "n",
  feedMmMin: "vf",
  axialDepthMm: "ap",
  radialDepthMm: "ae",
  plungeFeedMmMin: "plungeFeed",
} as const satisfies Record<ChangeableParam, keyof SheetOperation>;

export type ScaledValue = {
  key: (typeof OPERATION_KEY)[ChangeableParam];
  fromText: string;
  toText: string;
  fromValue: number;
  toValue: number;
};

const IMPERIAL = /\bin\b|inch|["″”]/i;
const trim = (value: number, decimals: number) => String(Number(value.toFixed(decimals)));

/**
 * The operation's value of `param` times `factor`, written in the unit the author used: n to 10 rpm, feeds to
 * 1 mm/min (0.1 in/min), depths to 0.01 mm (0.001 in), ae given as a share of D to 0.1 %. `toValue` is metric
 * (mm, mm/min, rpm) or % of D, like the parsed front matter. Null when the operation has no such value.
 */
export function scaleOperationValue(op: SheetOperation, param: ChangeableParam, factor: number): ScaledValue | null {
  if (!(factor > 0) || !Number.isFinite(factor)) throw new RangeError("The factor must be a positive number.");
  const key = OPERATION_KEY[param];
  if (param === "rpm") {
    const to = Math.round((op.n.value * factor) / 10) * 10;
    return { key, fromText: op.n.text, toText: `${to} rpm`, fromValue: op.n.value, toValue: to };
  }
  if (param === "radialDepthMm" && op.ae.unit === "%D") {
    const to = Math.min(100, Number((op.ae.value * factor).toFixed(1)));
    return { key, fromText: op.ae.text, toText: `${trim(to, 1)} %`, fromValue: op.ae.value, toValue: to };
  }
  const quantity = param === "feedMmMin" ? op.vf : param === "plungeFeedMmMin" ? op.plungeFeed : param === "axialDepthMm" ? op.ap : op.ae;
  if (!quantity) return null;
  const isFeed = param === "feedMmMin" || param === "plungeFeedMmMin";
  const scaled = quantity.value * factor;
  if (IMPERIAL.test(quantity.text)) {
    const inches = isFeed ? Number((scaled / 25.4).toFixed(1)) : Number((scaled / 25.4).toFixed(3));
    return {
      key,
      fromText: quantity.text,
      toText: `${inches} ${isFeed ? "in/min" : "in"}`,
      fromValue: quantity.value,
      toValue: isFeed ? inMinToMmMin(inches) : inToMm(inches),
    };
  }
  const metric = isFeed ? Math.round(scaled) : Number(scaled.toFixed(2));
  return {
    key,
    fromText: quantity.text,
    toText: `${trim(metric, 2)} ${isFeed ? "mm/min" : "mm"}`,
    fromValue: quantity.value,
    toValue: metric,
  };
}

/** The source with one operation's value replaced; the rest of the front matter and the body are kept. */
export function replaceOperationValue(source: string, operationIndex: number, key: string, text: string): string {
  const split = splitFrontMatter(source);
  if (!split.ok) throw new RangeError(split.message);
  const doc = parseDocument(split.frontMatter);
  if (doc.errors.length || !doc.hasIn(["operations", operationIndex]))
    throw new RangeError(`The sheet has no operation ${operationIndex + 1}.`);
  doc.setIn(["operations", operationIndex, key], text);
  return `---\n${String(doc).replace(/\n$/, "")}\n---\n${split.body}`;
}

export type NoteFacts = {
  param: ChangeableParam;
  operationLabel: string;
  versionNumber: number;
  reports: number;
  lowered: number;
  raised: number;
  medianPct: number;
  q1Pct: number;
  q3Pct: number;
  outcomes: number;
  failed: number;
  failure: { lower: number; upper: number };
  confidenceLabel: string;
  value: ScaledValue;
  engineWarnings: string[];
  referenceMachine: string;
};

const pct = (n: number) => `${Math.abs(n).toLocaleString("en-GB", { maximumFractionDigits: 1 })} %`;
const signed = (n: number) => `${n < 0 ? "−" : "+"}${pct(n)}`;
const share = (n: number) => `${(n * 100).toLocaleString("en-GB", { maximumFractionDigits: 0 })} %`;
const NOTE_MAX = 1000;

/** The change note of a draft started from a suggestion: counts, intervals, the new value and the engine's check. */
export function suggestionChangeNote(f: NoteFacts): string {
  const parts = [
    `From Field results: ${changeableParamLabels[f.param]} of “${f.operationLabel}” ${f.value.fromText} → ${f.value.toText}, the median change (${signed(f.medianPct)}) in ${f.reports} “worked after changes” ${f.reports === 1 ? "report" : "reports"} on version ${f.versionNumber} (${f.lowered} lowered, ${f.raised} raised; the middle half ran ${signed(f.q1Pct)} to ${signed(f.q3Pct)}).`,
    `Version ${f.versionNumber} failed in ${f.failed} of ${f.outcomes} outcome reports (${f.confidenceLabel} interval ${share(f.failure.lower)}–${share(f.failure.upper)}).`,
    f.engineWarnings.length
      ? `Engine check on ${f.referenceMachine}: the changed operation raises ${f.engineWarnings.length === 1 ? "a warning" : `${f.engineWarnings.length} warnings`}: ${f.engineWarnings.join(" ")}`
      : `Engine check on ${f.referenceMachine}: no warning for the changed operation.`,
  ];
  const note = parts.join(" ");
  return note.length <= NOTE_MAX ? note : `${note.slice(0, NOTE_MAX - 1)}…`;
}
