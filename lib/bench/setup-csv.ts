import { toCsv } from "@/lib/csv/to-csv";

import type { SetupSheetData } from "./setup-sheet-data";

/**
 * The setup's numbers as CSV: one row per quantity, sheet and adapted value, in the setup's units,
 * whether it changed, then the stick-out, the entry method and the customer's own changes.
 */
export function setupCsv(data: SetupSheetData): string {
  const head = [data.setupName, data.machineName, data.versionLabel, data.operationLabel];
  return toCsv([
    ["setup", "machine", "sheet_version", "operation", "symbol", "quantity", "unit", "sheet_value", "adapted_value", "changed"],
    ...data.rows.map((r) => [...head, r.symbol, r.label, r.unit, r.sheetNumber, r.adaptedNumber, r.changed ? "yes" : "no"]),
    [...head, "L", "Stick-out", "", "", data.stickout, ""],
    [...head, "", "Entry method", "", "", data.entryMethod, ""],
    ...data.yourChanges.map((line) => [...head, "", "Your change", "", "", line, "yes"]),
  ]);
}
