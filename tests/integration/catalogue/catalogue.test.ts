import { describe, expect, it } from "vitest";

import { cutterFieldsSchema } from "@/content-schema/catalogue-cutter";
import { checkImage } from "@/lib/catalogue/check-image";
import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { findImage } from "@/lib/catalogue/image-store";
import { importCutters } from "@/lib/catalogue/import-cutters";
import { listCutters } from "@/lib/catalogue/list-catalogue";
import { createCutter, updateCutter } from "@/lib/catalogue/save-cutter";
import { setCutterImage } from "@/lib/catalogue/set-cutter-image";
import { db } from "@/lib/db/knex";
import { InvalidInput, NotFound, TooLarge } from "@/lib/errors/domain-errors";
import { cutterInput } from "@/tests/factories/catalogue";
import { createVendorWithStaff } from "@/tests/factories/foundation";

const HEADER = "sku,name,diameter_mm,flutes,flute_length_mm,overall_length_mm,shank_mm,geometry";
// The 8-byte PNG signature and an IHDR chunk header: enough for content sniffing (PNG spec, section 5.2).
const PNG = Uint8Array.from([
  0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 1, 0, 0, 0, 1, 8, 6, 0, 0, 0,
]);

describe("cutter catalogue", () => {
  it("creates, updates and lists cutters within one vendor; a duplicate SKU is a field error", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const other = await createVendorWithStaff();
    const fields = cutterFieldsSchema.parse(cutterInput({ sku: "NB-T-6" }));
    const cutter = await createCutter({ vendorId: vendor.id, userId: engineer.user.id, fields });
    await updateCutter({ vendorId: vendor.id, userId: engineer.user.id, id: cutter.id, fields: { ...fields, name: "Renamed" } });
    expect((await findCutterBySku({ vendorId: vendor.id, sku: "nb-t-6" }))?.name).toBe("Renamed");
    const dup = await createCutter({ vendorId: vendor.id, userId: null, fields }).catch((e: unknown) => e);
    expect((dup as InvalidInput).fieldErrors?.sku).toBeDefined();
    expect(await listCutters({ vendorId: other.vendor.id })).toEqual([]);
    await expect(updateCutter({ vendorId: other.vendor.id, userId: null, id: cutter.id, fields })).rejects.toBeInstanceOf(NotFound);
    expect(await db("audit_log").where({ vendor_id: vendor.id }).pluck("action")).toEqual(
      expect.arrayContaining(["cutter.create", "cutter.update"]),
    );
  });

  it("imports nothing when one row is wrong (all-or-nothing), naming the row and the cell", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const csv = `${HEADER}\nA-1,One,6,2,18,50,6,upcut\nA-2,Two,6,zero,18,50,6,upcut\n`;
    const error = await importCutters({ vendorId: vendor.id, userId: engineer.user.id, csv, mode: "all-or-nothing" }).catch(
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(InvalidInput);
    expect((error as InvalidInput).fieldErrors?.csv?.[0]).toMatch(/^Row 3, flutes:/);
    expect(await listCutters({ vendorId: vendor.id })).toEqual([]);
  });

  it("imports every row of a clean file in one go, reporting progress; or only the valid rows when asked", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const progress: number[] = [];
    const clean = `${HEADER}\nA-1,One,6,2,18,50,6,upcut\n"A-2","Two, with comma",4,3,12,50,4,straight\n`;
    const result = await importCutters({
      vendorId: vendor.id,
      userId: engineer.user.id,
      csv: clean,
      mode: "all-or-nothing",
      onProgress: (done) => progress.push(done),
    });
    expect([result.imported, progress]).toEqual([2, [1, 2]]);
    expect((await findCutterBySku({ vendorId: vendor.id, sku: "A-2" }))?.name).toBe("Two, with comma");
    const mixed = `${HEADER}\nA-3,Three,6,2,18,50,6,upcut\nA-1,Again,6,2,18,50,6,upcut\n`;
    const partial = await importCutters({ vendorId: vendor.id, userId: engineer.user.id, csv: mixed, mode: "valid-rows" });
    expect([partial.imported, partial.skipped]).toEqual([1, 1]);
    expect((await listCutters({ vendorId: vendor.id })).map((c) => c.sku)).toEqual(["A-1", "A-2", "A-3"]);
  });

  it("accepts PNG, JPEG and WebP by their bytes and refuses other files and files over 5 MB", async () => {
    expect(await checkImage(PNG)).toBe("image/png");
    await expect(checkImage(new TextEncoder().encode("<svg xmlns='http://www.w3.org/2000/svg'/>"))).rejects.toBeInstanceOf(InvalidInput);
    await expect(checkImage(new Uint8Array(5 * 1024 * 1024 + 1))).rejects.toBeInstanceOf(TooLarge);
    const { vendor, engineer } = await createVendorWithStaff();
    const cutter = await createCutter({ vendorId: vendor.id, userId: null, fields: cutterFieldsSchema.parse(cutterInput()) });
    const { key } = await setCutterImage({ vendorId: vendor.id, userId: engineer.user.id, cutterId: cutter.id, bytes: PNG });
    expect((await findImage({ vendorId: vendor.id, key }))?.contentType).toBe("image/png");
    const other = await createVendorWithStaff();
    expect(await findImage({ vendorId: other.vendor.id, key })).toBeNull();
  });
});
