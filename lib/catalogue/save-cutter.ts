import "server-only";

import type { Knex } from "knex";

import { type CutterFields } from "@/content-schema/catalogue-cutter";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { emitSheetEvent } from "@/lib/events/emit-sheet-event";

import { cutterToRow, rowToCutter } from "./catalogue-rows";
import type { Cutter } from "./catalogue-types";
import { newShortCode } from "./short-code";
import { withUniqueField } from "./unique-violation";

type Actor = { vendorId: string; userId: string | null };
const duplicateSku = (sku: string) => `A cutter with SKU ${sku} already exists.`;

/** Inserts one cutter (inside the caller's transaction when given). */
export async function insertCutter({
  vendorId,
  userId,
  fields,
  trx,
}: Actor & { fields: CutterFields; trx: Knex.Transaction }): Promise<Cutter> {
  const [row] = await trx("cutters")
    .insert({ ...cutterToRow(fields), vendor_id: vendorId, short_code: newShortCode() })
    .returning("*");
  await writeAudit(
    { vendorId, actorUserId: userId, action: "cutter.create", objectType: "cutter", objectId: row.id, details: { sku: fields.sku } },
    trx,
  );
  await emitSheetEvent(trx, { type: "catalogue.changed", vendorId, entity: "cutter", entityId: row.id });
  return rowToCutter(row);
}

export async function createCutter(options: Actor & { fields: CutterFields }): Promise<Cutter> {
  const cutter = await withUniqueField("sku", duplicateSku(options.fields.sku), () =>
    db.transaction((trx) => insertCutter({ ...options, trx })),
  );
  return cutter;
}

export async function updateCutter({ vendorId, userId, id, fields }: Actor & { id: string; fields: CutterFields }): Promise<Cutter> {
  const cutter = await withUniqueField("sku", duplicateSku(fields.sku), () =>
    db.transaction(async (trx) => {
      const [row] = await trx("cutters")
        .where({ vendor_id: vendorId, id })
        .update({ ...cutterToRow(fields), updated_at: trx.fn.now() })
        .returning("*");
      if (!row) throw new NotFound("No such cutter.");
      await writeAudit(
        { vendorId, actorUserId: userId, action: "cutter.update", objectType: "cutter", objectId: id, details: { sku: fields.sku } },
        trx,
      );
      await emitSheetEvent(trx, { type: "catalogue.changed", vendorId, entity: "cutter", entityId: id });
      return rowToCutter(row);
    }),
  );
  return cutter;
}
