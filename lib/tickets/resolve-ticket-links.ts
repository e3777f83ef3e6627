import "server-only";

import type { Knex } from "knex";

import { InvalidInput } from "@/lib/errors/domain-errors";

// Versions a customer may read: never drafts or versions still in review.
export const READABLE_STATES = ["published", "superseded", "withdrawn"] as const;

type Links = { sheetVersionId?: string; machineId?: string; materialId?: string };

/**
 * Checks that the linked sheet version, machine and material belong to this vendor, and the machine
 * to this customer. An id of someone else reads as a field error, not as a hint that it exists.
 */
export async function resolveTicketLinks(
  trx: Knex,
  vendorId: string,
  customerId: string,
  links: Links,
): Promise<Links & { sheetMaterialId?: string }> {
  const errors: Record<string, string[]> = {};
  let sheetMaterialId: string | undefined;
  if (links.sheetVersionId) {
    const row = await trx("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .where({ "v.id": links.sheetVersionId, "v.vendor_id": vendorId, "s.vendor_id": vendorId })
      .whereIn("v.state", READABLE_STATES)
      .first<{ material_id: string } | undefined>("s.material_id");
    if (!row) errors.sheetVersionId = ["That sheet version is not available."];
    else sheetMaterialId = row.material_id;
  }
  if (links.machineId) {
    const row = await trx("machines").where({ id: links.machineId, vendor_id: vendorId, user_id: customerId }).first("id");
    if (!row) errors.machineId = ["Choose one of your machines."];
  }
  if (links.materialId) {
    const row = await trx("materials").where({ id: links.materialId, vendor_id: vendorId }).first("id");
    if (!row) errors.materialId = ["Choose a material from the list."];
  }
  if (Object.keys(errors).length) throw new InvalidInput("Please correct the marked fields.", errors);
  return { ...links, sheetMaterialId };
}
