import { entryMethodLabels, operationKindLabels, type SheetOperation } from "@/content-schema/sheet-front-matter";
import { chipLoad, formatChipLoad, formatFeed, formatLength, formatSpindleSpeed, type UnitSystem } from "@/lib/machining";

export type Cutter = { flutes?: number; diameterMm?: number };

/** Display strings for one row of the operation table, in the reader's unit system. */
export function operationCells(op: SheetOperation, units: UnitSystem, cutter: Cutter = {}) {
  const fz = cutter.flutes ? chipLoad({ feedMmMin: op.vf.value, rpm: op.n.value, flutes: cutter.flutes }) : undefined;
  const aeLength = op.ae.unit === "mm" ? op.ae.value : cutter.diameterMm ? (op.ae.value / 100) * cutter.diameterMm : undefined;
  const aePercent = op.ae.unit === "%D" ? `${op.ae.value}\u00a0% of D` : undefined;
  return {
    operation: op.label ?? operationKindLabels[op.kind],
    kind: operationKindLabels[op.kind],
    n: formatSpindleSpeed(op.n.value),
    vf: formatFeed(op.vf.value, units),
    fz: fz === undefined ? undefined : formatChipLoad(fz, units),
    ap: formatLength(op.ap.value, units),
    ae:
      aePercent && aeLength !== undefined
        ? `${aePercent} (${formatLength(aeLength, units)})`
        : (aePercent ?? formatLength(op.ae.value, units)),
    plungeFeed: op.plungeFeed ? formatFeed(op.plungeFeed.value, units) : "—",
    entry: entryMethodLabels[op.entry],
    rampAngle: op.rampAngleDeg !== undefined ? `${op.rampAngleDeg}°` : undefined,
  };
}
