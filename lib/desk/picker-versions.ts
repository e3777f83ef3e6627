import "server-only";

import { PICKER_VERSIONS } from "@/content-schema/api-queries";
import { db } from "@/lib/db/knex";
import { READABLE_STATES } from "@/lib/tickets/resolve-ticket-links";

export type PickerVersion = { id: string; name: string; state: string; machineClass: string };
/** One answer of the picker: a page of versions, and whether more match. */
export type PickerPage = { versions: PickerVersion[]; hasMore: boolean };

const likeWords = (q: string) =>
  q
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 8)
    .map((w) => `%${w.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);

function readableVersions(vendorId: string) {
  return db("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .join("machine_classes as k", "k.id", "s.machine_class_id")
    .join("cutters as c", "c.id", "s.cutter_id")
    .join("materials as m", "m.id", "s.material_id")
    .where({ "v.vendor_id": vendorId, "s.vendor_id": vendorId, "k.vendor_id": vendorId, "c.vendor_id": vendorId, "m.vendor_id": vendorId })
    .whereIn("v.state", READABLE_STATES);
}

type Row = { id: string; title: string; number: number; state: string; machine_class: string };
const COLUMNS = ["v.id", "v.title", "v.number", "v.state", "k.name as machine_class"];
const toPicker = (r: Row): PickerVersion => ({
  id: r.id,
  name: `${r.title} · ${r.machine_class} (version ${r.number})`,
  state: r.state,
  machineClass: r.machine_class,
});

/**
 * Sheet versions a reply may embed (what customers can read), published ones first: every word of `q` must appear
 * in the title, cutter SKU, material or machine class. One page of them, and whether more match.
 */
export async function findPickerVersions({
  vendorId,
  q,
  limit = PICKER_VERSIONS,
}: {
  vendorId: string;
  q: string;
  limit?: number;
}): Promise<PickerPage> {
  const query = readableVersions(vendorId);
  for (const word of likeWords(q)) query.whereRaw("concat_ws(' ', v.title, c.sku, m.name, k.name) ilike ? escape '\\'", [word]);
  const rows = await query
    .orderByRaw("(v.state = 'published') desc, v.title, k.name, v.number desc")
    .limit(limit + 1)
    .select<Row[]>(COLUMNS);
  return { versions: rows.slice(0, limit).map(toPicker), hasMore: rows.length > limit };
}

/** The given versions (a ticket's linked ones) as picker entries, where customers can still read them. */
export async function listPickerVersionsById({ vendorId, ids }: { vendorId: string; ids: string[] }): Promise<PickerVersion[]> {
  if (!ids.length) return [];
  const rows = await readableVersions(vendorId).whereIn("v.id", ids).select<Row[]>(COLUMNS);
  const byId = new Map(rows.map((r) => [r.id, toPicker(r)]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}
