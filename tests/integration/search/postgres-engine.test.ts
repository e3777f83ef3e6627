import { db } from "@/lib/db/knex";
import { createPostgresEngine } from "@/search/engines/postgres/postgres-engine";

import { defineEngineContract } from "./engine-contract";

// search_documents.vendor_id references vendors: the contract's random vendor ids get rows first.
const engine = createPostgresEngine(db);
defineEngineContract("postgres", () => ({
  ...engine,
  async replaceVendor(vendorId, docs) {
    await db("vendors")
      .insert({ id: vendorId, slug: `search-${vendorId.slice(0, 8)}`, name: "Search contract vendor", settings: "{}" })
      .onConflict("id")
      .ignore();
    await engine.replaceVendor(vendorId, docs);
  },
}));
