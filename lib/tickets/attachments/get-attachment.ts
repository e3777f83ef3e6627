import "server-only";

import { can } from "@/lib/auth/permissions";
import type { Role } from "@/lib/auth/roles";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { getStorage } from "@/lib/storage/get-storage";

type Options = { vendorId: string; attachmentId: string; userId: string; role: Role };
export type AttachmentFile = { bytes: Buffer; fileName: string; contentType: string; kind: "image" | "pdf" | "text" };

/**
 * A file for download, if this person may see it: its uploader before it is attached; afterwards the
 * ticket's customer (not for files on internal notes) or staff with desk.use. Anyone else: not found.
 */
export async function getAttachment({ vendorId, attachmentId, userId, role }: Options): Promise<AttachmentFile> {
  const staff = can(role, "desk.use");
  const row = await db("ticket_attachments as a")
    .leftJoin("tickets as t", function () {
      this.on("t.id", "a.ticket_id").andOn("t.vendor_id", "a.vendor_id");
    })
    .leftJoin("ticket_messages as m", "m.id", "a.message_id")
    .where({ "a.id": attachmentId, "a.vendor_id": vendorId })
    .where((w) => {
      w.where((pending) => pending.whereNull("a.ticket_id").andWhere("a.uploaded_by", userId));
      if (staff) w.orWhereNotNull("t.id");
      else
        w.orWhere((own) =>
          own.where("t.customer_id", userId).andWhere((v) => v.whereNull("a.message_id").orWhere("m.visibility", "public")),
        );
    })
    .first<{ storage_key: string; file_name: string; content_type: string; kind: AttachmentFile["kind"] } | undefined>(
      "a.storage_key",
      "a.file_name",
      "a.content_type",
      "a.kind",
    );
  if (!row) throw new NotFound();
  const bytes = await getStorage().get(row.storage_key);
  if (!bytes) throw new NotFound();
  return { bytes, fileName: row.file_name, contentType: row.content_type, kind: row.kind };
}
