import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET } from "@/app/api/v1/vendors/[vendor]/desk/sheet-versions/route";
import { PICKER_VERSIONS } from "@/content-schema/api-queries";
import { db } from "@/lib/db/knex";
import { findPickerVersions, listPickerVersionsById } from "@/lib/desk/picker-versions";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createDraftingScenario, publishOpenDraft } from "@/tests/factories/sheets";
import { mustExist } from "@/tests/support/must-exist";

const BULK = PICKER_VERSIONS + 5;

/** A vendor with one published sheet, and `copies` more sheets whose published versions are titled "<title> NN". */
async function vendorWithVersions(copies: number, title = "Bulk sheet") {
  const s = await createDraftingScenario();
  await publishOpenDraft(s);
  const sheet = mustExist(await db("sheets").where({ vendor_id: s.vendor.id, slug: s.slug }).first("id"), "sheet");
  for (let i = 1; i <= copies; i++) {
    const n = String(i).padStart(2, "0");
    const [copy] = await db
      .raw<{ rows: { id: string }[] }>(
        `insert into sheets select (jsonb_populate_record(null::sheets, to_jsonb(s) || jsonb_build_object('id', gen_random_uuid(), 'slug', s.slug || '-' || ?::text))).* from sheets s where s.id = ? returning id`,
        [n, sheet.id],
      )
      .then((r) => r.rows);
    await db.raw(
      `insert into sheet_versions select (jsonb_populate_record(null::sheet_versions, to_jsonb(v) || jsonb_build_object('id', gen_random_uuid(), 'sheet_id', ?::uuid, 'title', ?::text))).* from sheet_versions v where v.sheet_id = ?`,
      [copy.id, `${title} ${n}`, sheet.id],
    );
  }
  return s;
}

async function fetchPicker(slug: string, token: string, query: string) {
  return GET(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/desk/sheet-versions${query}`, {
      headers: { authorization: `Bearer ${token}` },
    }),
    { params: Promise.resolve({ vendor: slug }) },
  );
}

// A catalogue can hold thousands of versions; the reply editor offers a page of them and finds the rest by words.
describe("the reply editor's sheet-version picker", () => {
  it("pages the current versions, finds by every word across title, cutter SKU, material and machine class, and stays in its vendor", async () => {
    const a = await vendorWithVersions(BULK);
    const b = await vendorWithVersions(1, "Rival only sheet");
    const find = (q: string) => findPickerVersions({ vendorId: a.vendor.id, q });

    const first = await find("");
    expect(first.versions).toHaveLength(PICKER_VERSIONS);
    expect(first.hasMore).toBe(true);
    expect(first.versions[0]?.name).toMatch(/^.+ · Light router \(version 1\)$/);

    const one = await find("bulk 07");
    expect(one.versions.map((v) => v.name)).toEqual(["Bulk sheet 07 · Light router (version 1)"]);
    expect(one.hasMore).toBe(false);
    // Words match anywhere and in any order, across the cutter's SKU, the material and the machine class.
    expect((await find("sf-125-o ACRYLIC light 07")).versions.map((v) => v.name.slice(0, 13))).toEqual(["Bulk sheet 07"]);
    expect((await find("sf-125-o acrylic light")).hasMore).toBe(true);
    // "%" and "_" are characters, not patterns.
    expect((await find("%")).versions).toEqual([]);
    expect((await find("bulk_0")).versions).toEqual([]);
    // Another vendor's versions are never offered, by words or by id.
    expect((await find("rival")).versions).toEqual([]);
    const rival = mustExist(
      await db("sheet_versions").where({ vendor_id: b.vendor.id }).whereLike("title", "Rival%").first("id"),
      "rival version",
    );
    const own = mustExist(first.versions[0], "own version");
    expect(await listPickerVersionsById({ vendorId: a.vendor.id, ids: [rival.id, own.id] })).toEqual([own]);
  });

  it("answers staff over the API, is a 404 to customers, and explains a query that is too long", async () => {
    const s = await vendorWithVersions(2);
    const staff = await createApiToken(s.vendor.id, s.support.user.id);
    const ok = await fetchPicker(s.vendor.slug, staff, "?q=bulk%2002");
    expect(ok.status).toBe(200);
    const body: { versions: { name: string }[]; hasMore: boolean } = await ok.json();
    expect(body).toEqual({ versions: [expect.objectContaining({ name: "Bulk sheet 02 · Light router (version 1)" })], hasMore: false });

    const customer = await createApiToken(s.vendor.id, s.customer.user.id);
    expect((await fetchPicker(s.vendor.slug, customer, "?q=bulk")).status).toBe(404);

    const long = await fetchPicker(s.vendor.slug, staff, `?q=${"x".repeat(121)}`);
    expect(long.status).toBe(400);
    expect(JSON.stringify(await long.json())).toContain("q");
  });
});
