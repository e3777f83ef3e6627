import "server-only";

import type { MachineClassFields } from "@/content-schema/catalogue-machine-class";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { emitSheetEvent } from "@/lib/events/emit-sheet-event";

import { machineClassToRow, rowToMachineClass } from "./catalogue-rows";
import type { MachineClass } from "./catalogue-types";
import { withUniqueField } from "./unique-violation";

type Options = { vendorId: string; userId: string | null; fields: MachineClassFields; id?: string };

/** Creates a machine class, or updates the one with `id`. */
export async function saveMachineClass({ vendorId, userId, fields, id }: Options): Promise<MachineClass> {
  const saved = await withUniqueField("slug", `A machine class with slug ${fields.slug} already exists.`, () =>
    db.transaction(async (trx) => {
      const [row] = id
        ? await trx("machine_classes")
            .where({ vendor_id: vendorId, id })
            .update({ ...machineClassToRow(fields), updated_at: trx.fn.now() })
            .returning("*")
        : await trx("machine_classes")
            .insert({ ...machineClassToRow(fields), vendor_id: vendorId })
            .returning("*");
      if (!row) throw new NotFound("No such machine class.");
      const action = id ? "machine_class.update" : "machine_class.create";
      await writeAudit(
        { vendorId, actorUserId: userId, action, objectType: "machine_class", objectId: row.id, details: { slug: fields.slug } },
        trx,
      );
      await emitSheetEvent(trx, { type: "catalogue.changed", vendorId, entity: "machine_class", entityId: row.id });
      return rowToMachineClass(row);
    }),
  );
  return saved;
}
