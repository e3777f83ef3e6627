import "server-only";

import { db } from "@/lib/db/knex";
import { READABLE_STATES } from "@/lib/tickets/resolve-ticket-links";

export type Option = { id: string; name: string };

/** Members a ticket can be assigned to (support staff and admins). */
export async function listAssignees({ vendorId }: { vendorId: string }): Promise<Option[]> {
  const rows = await db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.vendor_id", vendorId)
    .whereIn("m.role", ["support", "admin"])
    .orderBy("u.name")
    .select("u.id", "u.name", "u.email");
  return rows.map((r) => ({ id: r.id, name: r.name || r.email }));
}

export async function listMaterialOptions({ vendorId }: { vendorId: string }): Promise<Option[]> {
  return db("materials").where({ vendor_id: vendorId }).orderBy("name").select<Option[]>("id", "name");
}

export type PickerVersion = Option & { state: string; machineClass: string };

/** Sheet versions a reply may embed: what customers can read, the published ones first, each with its machine class. */
export async function listPickerVersions({ vendorId }: { vendorId: string }): Promise<PickerVersion[]> {
  const rows = await db("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .join("machine_classes as k", "k.id", "s.machine_class_id")
    .where({ "v.vendor_id": vendorId, "s.vendor_id": vendorId, "k.vendor_id": vendorId })
    .whereIn("v.state", READABLE_STATES)
    .orderByRaw("(v.state = 'published') desc, v.title, k.name, v.number desc")
    .limit(500)
    .select("v.id", "v.title", "v.number", "v.state", "k.name as machine_class");
  return rows.map((r) => ({
    id: r.id,
    name: `${r.title} · ${r.machine_class} (version ${r.number})`,
    state: r.state,
    machineClass: r.machine_class,
  }));
}
