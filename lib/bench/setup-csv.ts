import { toCsv } from "@/lib/csv/to-csv";

import type { SetupSheetData } from "./setup-sheet-data";

/** The setup's numbers as CSV: one row per quantity, sheet and adapted value, in the setup's units. */
export function setupCsv(data: SetupSheetData): string {
  return toCsv([
    ["setup", "machine", "sheet_version", "operation", "symbol", "quantity", "unit", "sheet_value", "adapted_value"],
    ...data.rows.map((r) => [data.setupName, data.machineName, data.versionLabel, data.operationLabel, r.symbol, r.label, r.unit, r.sheetNumber, r.adaptedNumber]),
  ]);
}
