import {
  entryMethodLabels,
  operationKindLabels,
  type OperationKind,
  type SheetFrontMatter,
  type SheetOperation,
} from "@/content-schema/sheet-front-matter";
import { chipLoad, formatQuantity, type QuantityKind, type UnitSystem } from "@/lib/machining";

// Pure: no I/O. Shared by the Drafting diff page and the change-alert e-mails.

export type ParameterKey = "n" | "vf" | "fz" | "ap" | "ae" | "plungeFeed" | "entry" | "rampAngleDeg";
export const parameterLabels: Record<ParameterKey, string> = {
  n: "n (spindle speed)",
  vf: "vf (feed rate)",
  fz: "fz (chip load, derived)",
  ap: "ap (axial depth)",
  ae: "ae (radial depth)",
  plungeFeed: "Plunge feed",
  entry: "Entry",
  rampAngleDeg: "Ramp or helix angle",
};

type Kind = QuantityKind | "angle" | "text";
/** One parameter of one operation; numbers in metric machining units (mm, mm/min, rpm, mm/tooth, degrees). */
export type ParameterChange = {
  parameter: ParameterKey;
  kind: Kind;
  before: number | string | null;
  after: number | string | null;
  /** after − before, for numbers present on both sides. */
  delta: number | null;
  /** delta as a percentage of before. */
  percent: number | null;
};

export type OperationDiff = {
  key: string;
  label: string;
  kind: OperationKind;
  status: "changed" | "unchanged" | "added" | "removed";
  changes: ParameterChange[];
};

export type CutterGeometry = { flutes: number; diameterMm: number };

type Values = Record<ParameterKey, number | string | null>;
const KINDS: Record<ParameterKey, Kind> = {
  n: "spindleSpeed",
  vf: "feedRate",
  fz: "chipLoad",
  ap: "length",
  ae: "length",
  plungeFeed: "feedRate",
  entry: "text",
  rampAngleDeg: "angle",
};
const ORDER = Object.keys(KINDS) as ParameterKey[];

function valuesOf(op: SheetOperation, cutter: CutterGeometry): Values {
  return {
    n: op.n.value,
    vf: op.vf.value,
    fz: chipLoad({ feedMmMin: op.vf.value, rpm: op.n.value, flutes: cutter.flutes }),
    ap: op.ap.value,
    ae: op.ae.unit === "%D" ? (op.ae.value / 100) * cutter.diameterMm : op.ae.value,
    plungeFeed: op.plungeFeed?.value ?? null,
    entry: op.entry,
    rampAngleDeg: op.rampAngleDeg ?? null,
  };
}

const same = (a: number | string | null, b: number | string | null) =>
  typeof a === "number" && typeof b === "number" ? Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b)) : a === b;

function compare(before: Values | null, after: Values | null): ParameterChange[] {
  return ORDER.map((parameter) => {
    const b = before?.[parameter] ?? null;
    const a = after?.[parameter] ?? null;
    const numeric = typeof a === "number" && typeof b === "number";
    const delta = numeric ? a - b : null;
    return { parameter, kind: KINDS[parameter], before: b, after: a, delta, percent: numeric && b !== 0 ? (delta! / b) * 100 : null };
  }).filter((change) => !same(change.before, change.after));
}

/** Operations are matched by kind and label, so reordering them is not a change. */
function keyed(ops: SheetOperation[]): Map<string, SheetOperation> {
  const map = new Map<string, SheetOperation>();
  for (const op of ops) {
    const base = `${op.kind}:${(op.label ?? "").trim().toLowerCase()}`;
    let key = base;
    for (let i = 2; map.has(key); i++) key = `${base}#${i}`;
    map.set(key, op);
  }
  return map;
}

/** Which parameters changed between two versions, per operation, and by how much. */
export function diffParameters(before: SheetFrontMatter, after: SheetFrontMatter, cutter: CutterGeometry): OperationDiff[] {
  const old = keyed(before.operations);
  const next = keyed(after.operations);
  const keys = [...next.keys(), ...[...old.keys()].filter((k) => !next.has(k))];
  return keys.map((key) => {
    const b = old.get(key);
    const a = next.get(key);
    const op = (a ?? b)!;
    const changes = compare(b ? valuesOf(b, cutter) : null, a ? valuesOf(a, cutter) : null);
    const status = !b ? "added" : !a ? "removed" : changes.length ? "changed" : "unchanged";
    return { key, label: op.label ?? operationKindLabels[op.kind], kind: op.kind, status, changes };
  });
}

/** Display strings for one change in the reader's units; deltas carry a sign. */
export function formatParameterChange(change: ParameterChange, units: UnitSystem) {
  const show = (value: number | string | null): string => {
    if (value === null) return "—";
    if (typeof value === "string")
      return change.parameter === "entry" ? (entryMethodLabels[value as keyof typeof entryMethodLabels] ?? value) : value;
    if (change.kind === "angle") return `${value}\u00a0°`;
    return formatQuantity(value, change.kind as QuantityKind, units);
  };
  const sign = (text: string, value: number) => (value > 0 ? `+${text}` : text);
  const delta = change.delta === null ? "" : sign(show(change.delta), change.delta);
  const percent = change.percent === null ? "" : `${change.percent > 0 ? "+" : ""}${change.percent.toFixed(1)}\u00a0%`;
  return { label: parameterLabels[change.parameter], before: show(change.before), after: show(change.after), delta, percent };
}

/** True when any operation was added, removed or changed. */
export const hasParameterChanges = (diff: OperationDiff[]) => diff.some((op) => op.status !== "unchanged");
