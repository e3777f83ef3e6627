import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { deliverSheetEvent, dispatchSheetEvent } from "@/lib/events/dispatch-sheet-event";
import { getBoss } from "@/lib/jobs/boss";
import { publishDraft } from "@/lib/sheets/publish-draft";
import { withdrawVersion } from "@/lib/sheets/withdraw-version";
import { getSearchEngine } from "@/search/engines/choose-engine";
import type { SearchEngine } from "@/search/engines/engine-types";
import { reindexSheets, reindexVendor } from "@/search/indexing/reindex";
import { runSearch } from "@/search/run/run-search";
import { runSeeds } from "@/seeds/run-seeds";
import { mustExist } from "@/tests/support/must-exist";

const engine = getSearchEngine();
let ids: Awaited<ReturnType<typeof runSeeds>>;
const search = (vendor: string, q: string) => runSearch(engine, { vendorId: ids.vendors[vendor], q, perPage: 50 });

async function publishedVersions(vendorId: string): Promise<Map<string, number>> {
  const rows: { slug: string; number: number }[] = await db("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "v.vendor_id": vendorId, "v.state": "published" })
    .select("s.slug", "v.number");
  return new Map(rows.map((r) => [r.slug, r.number]));
}

/** Runs the queued sheet events through the real dispatcher and the search subscriber, as the worker would. */
async function deliverQueuedEvents() {
  const events: { id: string; data: unknown }[] = (
    await db.raw("select id, data from pgboss.job where name = 'sheet.events' and state = 'created' order by created_on")
  ).rows;
  for (const e of events) await dispatchSheetEvent(e.data);
  const deliveries: { id: string; data: { subscriber: string } }[] = (
    await db.raw("select id, data from pgboss.job where name = 'sheet.events.deliver' and state = 'created' order by created_on")
  ).rows;
  for (const d of deliveries.filter((x) => x.data.subscriber === "search-index")) await deliverSheetEvent(d.data);
  await db.raw("delete from pgboss.job where name in ('sheet.events', 'sheet.events.deliver')");
  return events.length;
}

async function insertReviewedDraft(vendor: string, slug: string, title: string) {
  const vendorId = ids.vendors[vendor];
  // Any sheet of the vendor with a published version (the first row without an order was sometimes a sheet without one).
  const template = mustExist(
    await db("sheets as s")
      .join("sheet_versions as v", function () {
        this.on("v.sheet_id", "s.id").andOn("v.vendor_id", "s.vendor_id");
      })
      .where({ "s.vendor_id": vendorId, "v.state": "published" })
      .orderBy("s.slug")
      .first("s.id", "s.cutter_id", "s.material_id", "s.machine_class_id", "v.source", "v.front_matter"),
    "template sheet with a published version",
  );
  const source = template;
  const [{ id: sheetId }] = await db("sheets")
    .insert({
      vendor_id: vendorId,
      slug,
      cutter_id: template.cutter_id,
      material_id: template.material_id,
      machine_class_id: template.machine_class_id,
    })
    .returning("id");
  await db("sheet_versions").insert({
    vendor_id: vendorId,
    sheet_id: sheetId,
    number: 1,
    state: "in_review",
    title,
    source: source.source,
    front_matter: JSON.stringify(source.front_matter),
    author_id: ids.users[`eng1@${vendor}.test`],
    approved_by: ids.users[`eng2@${vendor}.test`],
    approved_at: new Date(),
    submitted_at: new Date(),
  });
  return sheetId as string;
}

beforeAll(async () => {
  ids = await runSeeds(db, { reset: true });
  for (const id of Object.values(ids.vendors)) await reindexVendor({ engine, vendorId: id });
  await getBoss();
  await db.raw("delete from pgboss.job where name in ('sheet.events', 'sheet.events.deliver')");
}, 120_000);

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

describe("search isolation", () => {
  it.each(["northbeck", "quillon"])("%s: every hit is a current published version of its own sheets", async (vendor) => {
    const own = await publishedVersions(ids.vendors[vendor]);
    for (const q of ["", "acrylic", "6mm", "router", "1/8 acrylic slot", "hardwood", "QC-E3-8", "NB-3F-6", "carbon fibre", "demo"]) {
      const result = await search(vendor, q);
      for (const hit of result.hits) expect(own.get(hit.slug), `${vendor} “${q}” → ${hit.slug} v${hit.version}`).toBe(hit.version);
      const prefix = vendor === "northbeck" ? "QC-" : "NB-";
      expect(result.cutters.some((c) => c.sku.startsWith(prefix))).toBe(false);
    }
  });

  it("a withdrawn version is not found", async () => {
    expect((await search("northbeck", "G10")).hits.map((h) => h.slug)).not.toContain("g10-glass-epoxy-nb-2f-6-rigid-router");
    expect((await search("northbeck", "glass epoxy")).total).toBe(0);
  });

  it("a sheet with a draft in review is found at its published version", async () => {
    const slug = "mdf-nb-bn-6-rigid-router";
    const inReview = await db("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .where({ "s.slug": slug, "v.state": "in_review" })
      .first<{ number: number }>("v.number");
    const published = (await publishedVersions(ids.vendors.northbeck)).get(slug);
    expect(inReview?.number).toBeGreaterThan(published ?? Infinity);
    const hit = (await search("northbeck", "ball nose mdf")).hits.find((h) => h.slug === slug);
    expect(hit?.version).toBe(published);
  });

  it("another vendor's materials and SKUs find nothing", async () => {
    expect((await search("northbeck", "carbon fibre laminate")).hits.filter((h) => h.material.key === "cfrp")).toEqual([]);
    expect((await search("quillon", "NB-SF-3175")).cutters).toEqual([]);
  });
});

describe("indexing on publish and withdraw", () => {
  it("a draft is not indexed; publishing adds it, withdrawing removes it, through the sheet events", async () => {
    const vendorId = ids.vendors.northbeck;
    const sheetId = await insertReviewedDraft("northbeck", "zebrawood-trial", "Zebrawood trial sheet");
    await reindexSheets({ engine, vendorId, sheetIds: [sheetId] });
    expect((await search("northbeck", "zebrawood")).total).toBe(0);
    expect((await search("quillon", "zebrawood")).total).toBe(0);

    await publishDraft({ vendorId, userId: ids.users["eng2@northbeck.test"], slug: "zebrawood-trial" });
    expect(await deliverQueuedEvents()).toBe(1);
    expect((await search("northbeck", "zebrawood")).hits.map((h) => h.slug)).toEqual(["zebrawood-trial"]);
    expect((await search("quillon", "zebrawood")).total).toBe(0);

    await withdrawVersion({ vendorId, userId: ids.users["eng2@northbeck.test"], slug: "zebrawood-trial", reason: "Trial ended." });
    expect(await deliverQueuedEvents()).toBe(1);
    expect((await search("northbeck", "zebrawood")).total).toBe(0);
  });

  it("a failing engine fails the indexing job (which retries), not the write; a retry catches up", async () => {
    const vendorId = ids.vendors.northbeck;
    const sheetId = await insertReviewedDraft("northbeck", "wenge-trial", "Wenge trial sheet");
    await expect(publishDraft({ vendorId, userId: ids.users["eng2@northbeck.test"], slug: "wenge-trial" })).resolves.toMatchObject({
      state: "published",
    });
    const down: SearchEngine = { ...engine, upsert: async () => Promise.reject(new Error("engine down")) };
    await expect(reindexSheets({ engine: down, vendorId, sheetIds: [sheetId] })).rejects.toThrow("engine down");
    expect((await search("northbeck", "wenge")).total).toBe(0);
    await reindexSheets({ engine, vendorId, sheetIds: [sheetId] });
    expect((await search("northbeck", "wenge")).hits.map((h) => h.slug)).toEqual(["wenge-trial"]);
    await db.raw("delete from pgboss.job where name in ('sheet.events', 'sheet.events.deliver')");
  });

  it("a catalogue edit reindexes the sheets that use the entry", async () => {
    const vendorId = ids.vendors.quillon;
    const material: { id: string } = await db("materials").where({ vendor_id: vendorId, slug: "mdf" }).first("id");
    await db("materials")
      .where({ vendor_id: vendorId, id: material.id })
      .update({ synonyms: ["tamboured board"] });
    expect((await search("quillon", "tamboured")).total).toBe(0);
    await dispatchSheetEvent({ type: "catalogue.changed", vendorId, entity: "material", entityId: material.id });
    await deliverQueuedEvents();
    const { hits } = await search("quillon", "tamboured");
    expect(hits.length).toBeGreaterThan(0);
    expect(hits.every((h) => h.material.key === "mdf")).toBe(true);
  });
});
