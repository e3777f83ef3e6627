import { describe, expect, it } from "vitest";

import { parseCsv } from "@/lib/catalogue/parse-csv";

const cells = (text: string) => {
  const result = parseCsv(text);
  if (!result.ok) throw new Error(result.error.message);
  return result.records.map((r) => r.cells);
};

// Cases follow RFC 4180 section 2 (rules 1–7).
describe("parseCsv (RFC 4180)", () => {
  it("splits records on CRLF and on LF, and ignores one line break at the end (rules 1–2)", () => {
    expect(cells("a,b\r\nc,d\r\n")).toEqual([
      ["a", "b"],
      ["c", "d"],
    ]);
    expect(cells("a,b\nc,d")).toEqual([
      ["a", "b"],
      ["c", "d"],
    ]);
  });

  it("keeps empty cells, including a trailing one (rule 4)", () => {
    expect(cells("a,,c,\n")).toEqual([["a", "", "c", ""]]);
  });

  it("reads quoted cells holding commas, line breaks and doubled quotes (rules 5–7)", () => {
    expect(cells('sku,notes\nNB-1,"say ""hi"", then\nleave"\n')).toEqual([
      ["sku", "notes"],
      ["NB-1", 'say "hi", then\nleave'],
    ]);
    expect(cells('"",x')).toEqual([["", "x"]]);
  });

  it("reports the line a record starts on, counting line breaks inside quotes", () => {
    const result = parseCsv('h\n"two\nlines"\nthird\n');
    expect(result.ok && result.records.map((r) => r.line)).toEqual([1, 2, 4]);
  });

  it("keeps spaces as data (rule 4: spaces are part of a field)", () => {
    expect(cells(" a , b ")).toEqual([[" a ", " b "]]);
  });

  it("refuses an unclosed quote, naming its line", () => {
    expect(parseCsv('a\n"open,b\nc')).toEqual({ ok: false, error: { line: 2, column: 1, message: "A quoted cell is never closed." } });
  });

  it("refuses text after a closing quote and a bare quote inside an unquoted cell", () => {
    const after = parseCsv('"a"b,c');
    expect(after.ok === false && after.error.column).toBe(1);
    const bare = parseCsv('a,b"c');
    expect(bare.ok === false && bare.error.column).toBe(2);
  });

  it("strips a byte-order mark and returns no records for an empty file", () => {
    expect(cells("\uFEFFa")).toEqual([["a"]]);
    expect(cells("")).toEqual([]);
  });
});
