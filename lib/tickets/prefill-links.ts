import "server-only";

import { z } from "zod";

import { db } from "@/lib/db/knex";

import { READABLE_STATES } from "./resolve-ticket-links";

export type TicketPrefill = {
  sheetVersion: { id: string; title: string; number: number; materialId: string } | null;
  machine: { id: string; name: string } | null;
};

const id = z.uuid();

/**
 * The machine a question about a sheet most likely concerns when none was named: the one of the
 * customer's newest setup of that sheet, else their only machine.
 */
async function likelyMachine({ vendorId, customerId, sheetVersionId }: { vendorId: string; customerId: string; sheetVersionId: string }) {
  const fromSetup = await db("setups as st")
    .join("machines as m", "m.id", "st.machine_id")
    .where({
      "st.vendor_id": vendorId,
      "st.user_id": customerId,
      "st.sheet_version_id": sheetVersionId,
      "m.vendor_id": vendorId,
      "m.user_id": customerId,
    })
    .orderBy("st.updated_at", "desc")
    .first<{ id: string; name: string } | undefined>("m.id", "m.name");
  if (fromSetup) return fromSetup;
  const machines = await db("machines")
    .where({ vendor_id: vendorId, user_id: customerId })
    .limit(2)
    .select<{ id: string; name: string }[]>("id", "name");
  return machines.length === 1 ? machines[0] : undefined;
}

/**
 * Reads `?sheetVersion=&machine=` for a new ticket. Ids that are malformed, of another vendor or
 * (for machines) of another customer are ignored, as if they were not given. A sheet without a
 * machine gets the customer's likely machine.
 */
export async function prefillLinks({
  vendorId,
  customerId,
  sheetVersion,
  machine,
}: {
  vendorId: string;
  customerId: string;
  sheetVersion?: string;
  machine?: string;
}): Promise<TicketPrefill> {
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
  const chosen = m ?? (sv && !machine ? await likelyMachine({ vendorId, customerId, sheetVersionId: sv.id }) : undefined);
  return {
    sheetVersion: sv ? { id: sv.id, title: sv.title, number: sv.number, materialId: sv.material_id } : null,
    machine: chosen ? { id: chosen.id, name: chosen.name } : null,
  };
}
