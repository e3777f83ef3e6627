import { describe, expect, it } from "vitest";

import { checkCutterCsv } from "@/lib/catalogue/cutter-csv";

const HEADER = "sku,name,diameter_mm,flutes,flute_length_mm,overall_length_mm,shank_mm,corner_form,geometry";

describe("checkCutterCsv", () => {
  it("turns valid rows into cutter fields", () => {
    const report = checkCutterCsv(`${HEADER}\nNB-T-1,Test cutter,6,2,18,50,6,square,upcut\n`);
    expect(report.fileErrors).toEqual([]);
    expect(report.rows[0]).toMatchObject({ row: 2, sku: "NB-T-1", errors: [], fields: { diameterMm: 6, flutes: 2, geometry: "upcut" } });
  });

  it("names the row and the column of each wrong cell", () => {
    const report = checkCutterCsv(`${HEADER}\nA-1,Good,6,2,18,50,6,square,upcut\nA-2,Bad,-3,2,18,50,6,square,spiral\n`);
    const bad = report.rows.find((r) => r.row === 3)!;
    expect(bad.fields).toBeUndefined();
    expect(bad.errors.map((e) => e.column).sort()).toEqual(["diameter_mm", "geometry"]);
  });

  it("flags SKUs already in the catalogue and repeated within the file", () => {
    const report = checkCutterCsv(
      `${HEADER}\nA-1,One,6,2,18,50,6,square,upcut\na-1,Two,6,2,18,50,6,square,upcut\nOLD-1,Three,6,2,18,50,6,square,upcut\n`,
      ["OLD-1"],
    );
    expect(report.rows.map((r) => r.errors.map((e) => e.message))).toEqual([
      [],
      ["a-1 is also on row 2."],
      ["OLD-1 is already in the catalogue."],
    ]);
  });

  it("refuses a file without the required columns or with unknown ones", () => {
    expect(checkCutterCsv("sku,name,colour\nA,B,red\n").fileErrors).toHaveLength(2);
  });

  it("reports a row with a different number of cells", () => {
    const report = checkCutterCsv(`${HEADER}\nA-1,One,6,2\n`);
    expect(report.rows[0].errors[0]).toMatchObject({ column: "(row)" });
  });
});
