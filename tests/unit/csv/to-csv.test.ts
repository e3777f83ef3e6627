import { describe, expect, it } from "vitest";

import { csvCell, toCsv } from "@/lib/csv/to-csv";

describe("csvCell: RFC 4180 quoting", () => {
  it("leaves plain text and numbers unquoted", () => {
    expect(csvCell("plain text")).toBe("plain text");
    expect(csvCell(42)).toBe("42");
    expect(csvCell(0.25)).toBe("0.25");
  });

  it("quotes a cell with a comma", () => {
    expect(csvCell("6 mm, 3 flutes")).toBe('"6 mm, 3 flutes"');
  });

  it("quotes a cell with a double quote and doubles the quote", () => {
    expect(csvCell('1/4" end mill')).toBe('"1/4"" end mill"');
    expect(csvCell('"')).toBe('""""');
  });

  it("quotes a cell with a line break (LF, CR or CRLF)", () => {
    expect(csvCell("line 1\nline 2")).toBe('"line 1\nline 2"');
    expect(csvCell("line 1\r\nline 2")).toBe('"line 1\r\nline 2"');
    expect(csvCell("a\rb")).toBe('"a\rb"');
  });

  it("null and undefined become an empty cell", () => {
    expect(csvCell(null)).toBe("");
    expect(csvCell(undefined)).toBe("");
  });

  it("keeps 0 and the empty string as they are", () => {
    expect(csvCell(0)).toBe("0");
    expect(csvCell("")).toBe("");
  });
});

describe("csvCell: formula-injection guard", () => {
  it.each([
    ["=SUM(A1)", `"'=SUM(A1)"`],
    ["+1+1", `"'+1+1"`],
    ["@x", `"'@x"`],
    ["-x", `"'-x"`],
    ["\tcmd", `"'\tcmd"`],
    ["\rcmd", `"'\rcmd"`],
    ["-1+1", `"'-1+1"`],
    ['=HYPERLINK("http://evil","x")', `"'=HYPERLINK(""http://evil"",""x"")"`],
  ])("%j gets a leading apostrophe and quotes", (input, expected) => {
    expect(csvCell(input)).toBe(expected);
  });

  it.each([["-18"], ["-0.5"], ["-100.25"], ["18"]])("the plain number %j stays as it is", (input) => {
    expect(csvCell(input)).toBe(input);
  });

  it("negative numbers given as numbers stay as they are", () => {
    expect(csvCell(-18)).toBe("-18");
    expect(csvCell(-0.5)).toBe("-0.5");
  });

  it("a formula character later in the text is harmless", () => {
    expect(csvCell("a=b")).toBe("a=b");
    expect(csvCell("x-1")).toBe("x-1");
  });
});

describe("toCsv", () => {
  it("joins cells with commas and ends every line, the last included, with CRLF", () => {
    expect(
      toCsv([
        ["param", "median %"],
        ["vf", -18],
        ["n", 12],
      ]),
    ).toBe("param,median %\r\nvf,-18\r\nn,12\r\n");
  });

  it("quotes and guards cells inside rows and keeps empty cells", () => {
    expect(toCsv([["a,b", null, "=1+1", undefined, 'say "hi"']])).toBe(`"a,b",,"'=1+1",,"say ""hi"""\r\n`);
  });

  it("a line break inside a cell does not end the record", () => {
    const csv = toCsv([["note"], ["first\nsecond"]]);
    expect(csv).toBe('note\r\n"first\nsecond"\r\n');
    expect(csv.split("\r\n")).toHaveLength(3);
  });

  it("an empty table is a single CRLF", () => {
    expect(toCsv([])).toBe("\r\n");
  });
});
