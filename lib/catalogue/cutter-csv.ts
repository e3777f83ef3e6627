import { cutterCsvColumns, cutterFieldsSchema, requiredCutterCsvColumns, type CutterFields } from "@/content-schema/catalogue-cutter";

import { parseCsv } from "./parse-csv";

type Field = keyof typeof cutterCsvColumns;
export type CellError = { column: string; message: string };
/** `row` counts like a spreadsheet: the header is row 1, the first cutter row 2. */
export type CutterCsvRow = { row: number; line: number; sku: string; fields?: CutterFields; errors: CellError[] };
export type CutterCsvReport = { fileErrors: string[]; rows: CutterCsvRow[] };

const FIELD_BY_COLUMN = new Map<string, Field>(
  Object.entries(cutterCsvColumns).map(([field, column]) => [column, field as Field] as const),
);

/** Parses and checks a cutter CSV without touching the database; shared by the preview and the import. */
export function checkCutterCsv(text: string, existingSkus: Iterable<string> = []): CutterCsvReport {
  const parsed = parseCsv(text);
  if (!parsed.ok) return { fileErrors: [`Line ${parsed.error.line}, cell ${parsed.error.column}: ${parsed.error.message}`], rows: [] };
  const [header, ...records] = parsed.records;
  if (!header) return { fileErrors: ["The file is empty: the first line must name the columns."], rows: [] };
  const columns = header.cells.map((c) => c.trim().toLowerCase());
  const fileErrors: string[] = [];
  const unknown = columns.filter((c) => c && !FIELD_BY_COLUMN.has(c));
  if (unknown.length) fileErrors.push(`Unknown column(s): ${unknown.join(", ")}. Known: ${[...FIELD_BY_COLUMN.keys()].join(", ")}.`);
  const missing = requiredCutterCsvColumns.filter((c) => !columns.includes(c));
  if (missing.length) fileErrors.push(`Missing required column(s): ${missing.join(", ")}.`);
  if (fileErrors.length) return { fileErrors, rows: [] };

  const taken = new Set([...existingSkus].map((s) => s.toLowerCase()));
  const seen = new Map<string, number>();
  const rows: CutterCsvRow[] = [];
  records.forEach((record, index) => {
    if (record.cells.every((c) => c.trim() === "")) return;
    const row = index + 2;
    const errors: CellError[] = [];
    if (record.cells.length !== columns.length) {
      errors.push({ column: "(row)", message: `has ${record.cells.length} cells, the header has ${columns.length}.` });
    }
    const input: Record<string, string> = {};
    columns.forEach((column, i) => {
      const field = FIELD_BY_COLUMN.get(column);
      if (field && record.cells[i] !== undefined && record.cells[i].trim() !== "") input[field] = record.cells[i].trim();
    });
    const sku = input.sku ?? "";
    const result = cutterFieldsSchema.safeParse(input);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = (issue.path[0] as Field | undefined) ?? "sku";
        errors.push({ column: cutterCsvColumns[field] ?? String(field), message: issue.message });
      }
    }
    const key = sku.toLowerCase();
    if (sku && taken.has(key)) errors.push({ column: "sku", message: `${sku} is already in the catalogue.` });
    if (sku && seen.has(key)) errors.push({ column: "sku", message: `${sku} is also on row ${seen.get(key)}.` });
    if (sku && !seen.has(key)) seen.set(key, row);
    rows.push({ row, line: record.line, sku, fields: errors.length === 0 && result.success ? result.data : undefined, errors });
  });
  if (rows.length === 0) fileErrors.push("The file has a header but no cutter rows.");
  return { fileErrors, rows };
}

export const formatCellError = (row: number, error: CellError) => `Row ${row}, ${error.column}: ${error.message}`;
