import { NextRequest } from "next/server";
import { beforeEach, describe, expect, it, vi } from "vitest";

import { GET as cutterPdf } from "@/app/[vendor]/(customer)/library/cutters/[sku]/pdf/route";
import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import type { SheetState } from "@/content-schema/sheet-workflow";
import type { SessionUser } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { createBenchSheet, supersede } from "@/tests/factories/bench";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { buildSheetSource, frontMatterInput, operationInput } from "@/tests/factories/sheet-source";
import { mustExist } from "@/tests/support/must-exist";
import { readPdf } from "@/tests/support/pdf-text";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => session.user }));

const get = (vendor: string, sku: string) =>
  cutterPdf(new NextRequest(`http://127.0.0.1:3000/${vendor}/library/cutters/${sku}/pdf`), { params: Promise.resolve({ vendor, sku }) });
const textOf = async (res: Response) => readPdf(new Uint8Array(await res.arrayBuffer()));
const squash = (text: string) => text.replace(/[\u00a0\u202f]/g, " ").replace(/\s+/g, " ");

/** A second published sheet of the same cutter, in invented MDF on an invented small router, slot at 1200 mm/min. */
async function mdfSheet(vendorId: string, cutterId: string, state: SheetState = "published") {
  const [material] = await db("materials")
    .insert({
      vendor_id: vendorId,
      slug: uniq("mdf"),
      name: "MDF board",
      material_group: "wood",
      vc_min_mpm: 150,
      vc_max_mpm: 400,
      min_chip_load_mm: 0.04,
      kc_nmm2: 40,
    })
    .returning("id");
  const [klass] = await db("machine_classes")
    .insert({
      vendor_id: vendorId,
      slug: uniq("hobby"),
      name: "Hobby router",
      rpm_min: 10000,
      rpm_max: 24000,
      power_kw: 0.8,
      max_feed_mm_min: 4000,
      rigidity: 0.4,
    })
    .returning("id");
  const [sheet] = await db("sheets")
    .insert({ vendor_id: vendorId, slug: uniq("mdf-sheet"), cutter_id: cutterId, material_id: material.id, machine_class_id: klass.id })
    .returning("id");
  const fields = frontMatterInput({
    title: "MDF, 1/8 in single-flute cutter",
    operations: [operationInput({ vf: "1200 mm/min" })],
    cautions: [{ kind: "dust", text: "MDF dust is fine: extract at the cutter." }],
  });
  const fm = sheetFrontMatterSchema.parse(fields);
  await db("sheet_versions").insert({
    vendor_id: vendorId,
    sheet_id: sheet.id,
    number: 1,
    state,
    title: fm.title,
    source: buildSheetSource({ frontMatter: fields }),
    front_matter: JSON.stringify(fm),
    published_at: db.fn.now(),
    ...(state === "withdrawn" ? { withdrawn_at: db.fn.now(), withdrawn_reason: "Wrong feed." } : {}),
  });
}

beforeEach(() => {
  session.user = null;
});

describe("the cutter data sheet", () => {
  it("gathers every current published sheet of the cutter, in both unit systems, with the cautions, on one page", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const cutter = mustExist(await db("cutters").where({ vendor_id: vendor.id, sku: sheet.cutterSku }).first("id", "short_code"), "cutter");
    await mdfSheet(vendor.id, cutter.id);
    await mdfSheet(vendor.id, cutter.id, "withdrawn");
    // v2 of the acrylic sheet lowers the slot feed to 1440 mm/min (56.7 in/min): only v2 is current.
    await supersede(vendor.id, sheet.sheetId, { vf: "1440 mm/min" });
    const res = await get(vendor.slug, sheet.cutterSku);
    expect(res.status).toBe(200);
    const { text, pages } = await textOf(res);
    const t = squash(text);
    expect(pages).toBeLessThanOrEqual(2);
    expect(t).toContain("2 current published sheets");
    expect(t).toContain("Cast acrylic · Rigid router");
    expect(t).toContain("MDF board · Hobby router");
    expect(t).toMatch(/version 2 · published/);
    expect(t).toContain("1440 mm/min");
    expect(t).toContain("56.7 in/min");
    expect(t).toContain("1200 mm/min");
    expect(t).toContain("47.2 in/min");
    expect(t).not.toMatch(/Full-width slot 18000 rpm 1800 mm\/min/);
    expect(t).toContain("MDF dust is fine: extract at the cutter.");
    expect(t).toContain("Follow the machine maker's limits, local codes and workplace rules");
    expect(t).toContain(`/c/${cutter.short_code}`);
  });

  it("is not found for an unknown cutter or under another vendor's address", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheet = await createBenchSheet(a.vendor.id);
    expect((await get(a.vendor.slug, "NO-SUCH-SKU")).status).toBe(404);
    expect((await get(b.vendor.slug, sheet.cutterSku)).status).toBe(404);
  });
});
