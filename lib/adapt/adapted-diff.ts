import { formatQuantity, type AdaptNumbers, type QuantityKind, type UnitSystem } from "@/lib/machining";

// Pure: the difference between two adapted results on the same machine (old version vs new version).

export const ADAPTED_FIELDS = [
  { field: "rpm", label: "n (spindle speed)", kind: "spindleSpeed" },
  { field: "feedMmMin", label: "vf (feed rate)", kind: "feedRate" },
  { field: "chipLoadMm", label: "fz (chip load)", kind: "chipLoad" },
  { field: "cuttingSpeedMpm", label: "vc (cutting speed)", kind: "cuttingSpeed" },
  { field: "axialDepthMm", label: "ap (axial depth)", kind: "length" },
  { field: "radialDepthMm", label: "ae (radial depth)", kind: "length" },
  { field: "plungeFeedMmMin", label: "Plunge feed", kind: "feedRate" },
] as const satisfies readonly { field: keyof AdaptNumbers; label: string; kind: QuantityKind }[];

export type AdaptedChange = {
  field: keyof AdaptNumbers;
  label: string;
  kind: QuantityKind;
  before: number | null;
  after: number | null;
  percent: number | null;
};

const same = (a: number | null, b: number | null) =>
  a === null || b === null ? a === b : Math.abs(a - b) <= 1e-6 * Math.max(Math.abs(a), Math.abs(b), 1e-9);

/** The adapted numbers that differ, with the change as a percentage of the old value. */
export function diffAdapted(before: AdaptNumbers, after: AdaptNumbers): AdaptedChange[] {
  return ADAPTED_FIELDS.flatMap(({ field, label, kind }) => {
    const b = before[field];
    const a = after[field];
    if (same(b, a)) return [];
    const percent = a !== null && b !== null && b !== 0 ? ((a - b) / b) * 100 : null;
    return [{ field, label, kind, before: b, after: a, percent }];
  });
}

export function formatAdaptedChange(change: AdaptedChange, units: UnitSystem) {
  const percent = change.percent === null ? "" : `${change.percent > 0 ? "+" : ""}${change.percent.toFixed(1)}\u00a0%`;
  return {
    label: change.label,
    before: formatQuantity(change.before, change.kind, units),
    after: formatQuantity(change.after, change.kind, units),
    percent,
  };
}
