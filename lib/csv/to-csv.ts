// A cell that a spreadsheet could read as a formula gets a leading apostrophe; plain numbers stay numbers.
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

export function csvCell(value: string | number | null | undefined): string {
  const text = value == null ? "" : String(value);
  const guarded = FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
  return /[",\n\r]/.test(guarded) || guarded !== text ? `"${guarded.replace(/"/g, '""')}"` : guarded;
}

/** RFC 4180 lines (CRLF), header first. */
export function toCsv(rows: readonly (readonly (string | number | null | undefined)[])[]): string {
  return rows.map((row) => row.map(csvCell).join(",")).join("\r\n") + "\r\n";
}
