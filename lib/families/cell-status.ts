import { isDeepStrictEqual } from "node:util";

import type { CellSheet } from "./cell-sheets";
import type { ComputedCell } from "./compute-cells";

// Pure: what generating a cell would do. A warned cell is never written; a sheet whose newest version already
// holds these numbers gets nothing new; a sheet with an open draft of its own is left alone.

export type CellStatus = "new" | "changed" | "unchanged" | "warned" | "busy";

export function cellStatus(cell: ComputedCell, sheet: CellSheet | undefined): CellStatus {
  if (cell.warnings.length) return "warned";
  if (!sheet) return "new";
  const ops = cell.operations.map((op) => op.operation);
  if (isDeepStrictEqual(sheet.latest.operations, ops)) return "unchanged";
  if (sheet.latest.state === "draft" || sheet.latest.state === "in_review") return "busy";
  return "changed";
}

export const cellStatusLabels: Record<CellStatus, string> = {
  new: "New sheet",
  changed: "New version",
  unchanged: "No change",
  warned: "Engine warns: blocked",
  busy: "Open draft: left alone",
};
