import "server-only";

import { z } from "zod";

import { db } from "@/lib/db/knex";

import { READABLE_STATES } from "./resolve-ticket-links";

export type TicketPrefill = { sheetVersion: { id: string; title: string; number: number; materialId: string } | null; machine: { id: string; name: string } | null };

const id = z.uuid();

/**
 * Reads `?sheetVersion=&machine=` for a new ticket. Ids that are malformed, of another vendor or
 * (for machines) of another customer are ignored, as if they were not given.
 */
export async function prefillLinks({ vendorId, customerId, sheetVersion, machine }: { vendorId: string; customerId: string; sheetVersion?: string; machine?: string }): Promise<TicketPrefill> {
  const svId = id.safeParse(sheetVersion).data;
  const mId = id.safeParse(machine).data;
  const [sv, m] = await Promise.all([
    svId
      ? db("sheet_versions as v")
          .join("sheets as s", "s.id", "v.sheet_id")
          .where({ "v.id": svId, "v.vendor_id": vendorId, "s.vendor_id": vendorId })
          .whereIn("v.state", READABLE_STATES)
          .first("v.id", "v.title", "v.number", "s.material_id")
      : null,
    mId ? db("machines").where({ id: mId, vendor_id: vendorId, user_id: customerId }).first("id", "name") : null,
  ]);
  return {
    sheetVersion: sv ? { id: sv.id, title: sv.title, number: sv.number, materialId: sv.material_id } : null,
    machine: m ? { id: m.id, name: m.name } : null,
  };
}
