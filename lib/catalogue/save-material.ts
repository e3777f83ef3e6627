import "server-only";

import type { MaterialFields } from "@/content-schema/catalogue-material";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { emitSheetEvent } from "@/lib/events/emit-sheet-event";

import { materialToRow, rowToMaterial } from "./catalogue-rows";
import type { Material } from "./catalogue-types";
import { withUniqueField } from "./unique-violation";

type Options = { vendorId: string; userId: string | null; fields: MaterialFields; id?: string };

/** Creates a material, or updates the one with `id`. */
export async function saveMaterial({ vendorId, userId, fields, id }: Options): Promise<Material> {
  const saved = await withUniqueField("slug", `A material with slug ${fields.slug} already exists.`, () =>
    db.transaction(async (trx) => {
      const [row] = id
        ? await trx("materials")
            .where({ vendor_id: vendorId, id })
            .update({ ...materialToRow(fields), updated_at: trx.fn.now() })
            .returning("*")
        : await trx("materials")
            .insert({ ...materialToRow(fields), vendor_id: vendorId })
            .returning("*");
      if (!row) throw new NotFound("No such material.");
      await writeAudit(
        {
          vendorId,
          actorUserId: userId,
          action: id ? "material.update" : "material.create",
          objectType: "material",
          objectId: row.id,
          details: { slug: fields.slug },
        },
        trx,
      );
      await emitSheetEvent(trx, { type: "catalogue.changed", vendorId, entity: "material", entityId: row.id });
      return rowToMaterial(row);
    }),
  );
  return saved;
}
