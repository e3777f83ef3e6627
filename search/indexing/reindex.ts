import type { Knex } from "knex";

import { cutterDocId, sheetDocId } from "@/search/document/document-schema";
import { loadCutterDocuments, loadSheetDocuments, sheetIdsUsing } from "@/search/document/load-documents";
import type { SearchEngine } from "@/search/engines/engine-types";

type Ctx = { engine: SearchEngine; knex?: Knex };

/** Bring the given sheets' entries up to date: upsert the current published version, drop the rest. */
export async function reindexSheets({ engine, knex, vendorId, sheetIds }: Ctx & { vendorId: string; sheetIds: readonly string[] }) {
  if (sheetIds.length === 0) return { upserted: 0, removed: 0 };
  const docs = await loadSheetDocuments({ vendorId, sheetIds, knex });
  const live = new Set(docs.map((d) => d.sheetId));
  const gone = sheetIds.filter((id) => !live.has(id)).map(sheetDocId);
  await engine.upsert(vendorId, docs);
  await engine.remove(vendorId, gone);
  return { upserted: docs.length, removed: gone.length };
}

export async function reindexCutters({ engine, knex, vendorId, cutterIds }: Ctx & { vendorId: string; cutterIds: readonly string[] }) {
  const docs = await loadCutterDocuments({ vendorId, cutterIds, knex });
  const live = new Set(docs.map((d) => d.cutterId));
  await engine.upsert(vendorId, docs);
  await engine.remove(vendorId, cutterIds.filter((id) => !live.has(id)).map(cutterDocId));
}

/** After a catalogue edit: the sheets using the entry, and the cutter itself. */
export async function reindexCatalogueEntry({
  engine,
  knex,
  vendorId,
  entity,
  entityId,
}: Ctx & { vendorId: string; entity: "cutter" | "material" | "machine_class"; entityId: string }) {
  const sheetIds = await sheetIdsUsing({ vendorId, entity, entityId, knex });
  await reindexSheets({ engine, knex, vendorId, sheetIds });
  if (entity === "cutter") await reindexCutters({ engine, knex, vendorId, cutterIds: [entityId] });
}

/** Every document of one vendor, rebuilt from the database. */
export async function reindexVendor({ engine, knex, vendorId }: Ctx & { vendorId: string }) {
  const [sheets, cutters] = await Promise.all([loadSheetDocuments({ vendorId, knex }), loadCutterDocuments({ vendorId, knex })]);
  await engine.replaceVendor(vendorId, [...sheets, ...cutters]);
  return { sheets: sheets.length, cutters: cutters.length };
}
