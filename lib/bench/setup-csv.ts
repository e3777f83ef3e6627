import type { SetupSheetData } from "./setup-sheet-data";

const cell = (value: string) => (/[",\n\r]/.test(value) || /^[=+\-@\t]/.test(value) ? `"${(/^[=+\-@\t]/.test(value) ? `'${value}` : value).replace(/"/g, '""')}"` : value);

/** The setup's numbers as CSV: one row per quantity, sheet and adapted value, in the setup's units. */
export function setupCsv(data: SetupSheetData): string {
  const lines = [
    ["setup", "machine", "sheet_version", "operation", "symbol", "quantity", "unit", "sheet_value", "adapted_value"],
    ...data.rows.map((r) => [data.setupName, data.machineName, data.versionLabel, data.operationLabel, r.symbol, r.label, r.unit, r.sheetNumber, r.adaptedNumber]),
  ];
  return lines.map((line) => line.map(cell).join(",")).join("\r\n") + "\r\n";
}
