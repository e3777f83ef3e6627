import { NextRequest } from "next/server";
import { beforeAll, describe, expect, it } from "vitest";

import { GET } from "@/app/api/v1/vendors/[vendor]/search/route";
import { db } from "@/lib/db/knex";
import { getSearchEngine } from "@/search/engines/choose-engine";
import { reindexVendor } from "@/search/indexing/reindex";
import type { SearchResponse } from "@/search/run/search-response";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createMember, createVendor } from "@/tests/factories/foundation";
import { sheetDoc } from "@/tests/unit/search/document/document-fixture";

let open: { id: string; slug: string };
let closed: { id: string; slug: string };
let token: string;
let openToken: string;

async function tokenFor(vendorId: string) {
  const member = await createMember(vendorId, "customer");
  return createApiToken(vendorId, member.user.id, "search test");
}

// Bearer tokens only: a cookie session needs a request scope that a direct handler call does not have.
const call = (slug: string, query: string, bearer = openToken) =>
  GET(new NextRequest(`http://localhost/api/v1/vendors/${slug}/search?${query}`, { headers: { authorization: `Bearer ${bearer}` } }), {
    params: Promise.resolve({ vendor: slug }),
  });

beforeAll(async () => {
  open = await createVendor({ settings: { libraryPublic: true } });
  closed = await createVendor({ settings: { libraryPublic: false } });
  const engine = getSearchEngine();
  await reindexVendor({ engine, vendorId: open.id });
  await engine.upsert(open.id, [
    sheetDoc({ vendorId: open.id, slug: "acrylic-18" }),
    sheetDoc({
      vendorId: open.id,
      slug: "mdf-6",
      title: "MDF, 6 mm",
      diameterMm: 6,
      flutes: 2,
      material: { slug: "mdf", name: "MDF", group: "wood" },
      kinds: ["pocket"],
    }),
  ]);
  await engine.upsert(closed.id, [sheetDoc({ vendorId: closed.id, slug: "closed-acrylic" })]);
  token = await tokenFor(closed.id);
  openToken = await tokenFor(open.id);
});

describe("GET /api/v1/vendors/{vendor}/search", () => {
  it("answers with hits, chips and facet counts", async () => {
    const response = await call(open.slug, `q=${encodeURIComponent("1/8 acrylic")}`);
    expect(response.status).toBe(200);
    const body = (await response.json()) as SearchResponse;
    expect(body.hits.map((h) => h.slug)).toEqual(["acrylic-18"]);
    expect(body.hits[0]).toMatchObject({
      version: 2,
      cutter: { sku: "T-SF-3175", diameterMm: 3.175 },
      operations: ["slotting", "profile"],
    });
    expect(body.chips.map((c) => c.kind)).toEqual(["diameter", "material"]);
    expect(body.facets.operations).toEqual(expect.arrayContaining([{ value: "slotting", count: 1 }]));
  });

  it("applies facet parameters as filters and pages", async () => {
    const body = (await (await call(open.slug, "operation=pocket&diameterMm=6&flutes=2&page=1")).json()) as SearchResponse;
    expect(body.hits.map((h) => h.slug)).toEqual(["mdf-6"]);
    expect(((await (await call(open.slug, "page=2")).json()) as SearchResponse).hits).toEqual([]);
  });

  it("refuses malformed parameters with field errors, never a stack trace", async () => {
    const response = await call(open.slug, "flutes=two&operation=teleport&diameterMm=-1");
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(Object.keys(body.fieldErrors).sort()).toEqual(["diameterMm", "flutes", "operation"]);
  });

  it("answers a very long or SQL-looking query", async () => {
    for (const q of ["x".repeat(5000), "'; drop table search_documents; --"])
      expect((await call(open.slug, `q=${encodeURIComponent(q)}`)).status).toBe(200);
    expect(await db("search_documents").where({ vendor_id: open.id }).count()).toEqual([{ count: "2" }]);
  });

  it("a token answers only for its own vendor: its own sheets, 404 elsewhere", async () => {
    const own = (await (await call(closed.slug, "q=acrylic", token)).json()) as SearchResponse;
    expect(own.hits.map((h) => h.slug)).toEqual(["closed-acrylic"]);
    expect((await call(open.slug, "q=acrylic", token)).status).toBe(404);
    expect((await call(closed.slug, "q=acrylic")).status).toBe(404);
  });
});
