/** One CSV record and the file line it starts on (quoted cells may span lines). */
export type CsvRecord = { line: number; cells: string[] };
export type CsvError = { line: number; column: number; message: string };
export type CsvResult = { ok: true; records: CsvRecord[] } | { ok: false; error: CsvError };

/**
 * RFC 4180 CSV: comma-separated cells, CRLF or LF between records, cells in double quotes may hold
 * commas, line breaks and doubled quotes (`""`). A blank line at the very end is not a record.
 */
export function parseCsv(input: string): CsvResult {
  const text = input.replace(/^\uFEFF/, "");
  const records: CsvRecord[] = [];
  let cells: string[] = [];
  let cell = "";
  let line = 1;
  let recordLine = 1;
  let i = 0;
  const endCell = () => {
    cells.push(cell);
    cell = "";
  };
  const endRecord = () => {
    endCell();
    records.push({ line: recordLine, cells });
    cells = [];
  };
  while (i < text.length) {
    const ch = text[i];
    if (ch === '"' && cell === "") {
      // A quoted cell: read to the closing quote.
      const startLine = line;
      i++;
      for (;;) {
        if (i >= text.length)
          return { ok: false, error: { line: startLine, column: cells.length + 1, message: "A quoted cell is never closed." } };
        if (text[i] === '"') {
          if (text[i + 1] === '"') {
            cell += '"';
            i += 2;
            continue;
          }
          i++;
          break;
        }
        if (text[i] === "\n") line++;
        cell += text[i++];
      }
      const next = text[i];
      if (next !== undefined && next !== "," && next !== "\n" && !(next === "\r" && text[i + 1] === "\n")) {
        return {
          ok: false,
          error: {
            line,
            column: cells.length + 1,
            message: 'Text after a closing quote; write a quote inside a quoted cell as two quotes ("").',
          },
        };
      }
      // Mark the cell as quoted-complete so a following quote is not taken as an opening one.
      if (next === undefined) break;
      continue;
    }
    if (ch === '"')
      return {
        ok: false,
        error: { line, column: cells.length + 1, message: "A quote inside an unquoted cell; quote the whole cell and double the quote." },
      };
    if (ch === ",") {
      endCell();
      i++;
      continue;
    }
    if (ch === "\r" && text[i + 1] === "\n") i++;
    if (text[i] === "\n") {
      endRecord();
      i++;
      line++;
      recordLine = line;
      continue;
    }
    cell += text[i++];
  }
  if (cell !== "" || cells.length > 0 || (text.length > 0 && !text.endsWith("\n"))) endRecord();
  return { ok: true, records };
}
