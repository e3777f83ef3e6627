import "server-only";

import { randomBytes } from "node:crypto";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { invalidateLibrary } from "@/lib/library/library-cache";
import { bumpLibraryGeneration } from "@/lib/library/library-generation";

import { checkImage } from "./check-image";
import { deleteImage, putImage } from "./image-store";

/** Stores a new picture for a cutter (checked by content) and drops the old one. */
export async function setCutterImage({
  vendorId,
  userId,
  cutterId,
  bytes,
}: {
  vendorId: string;
  userId: string;
  cutterId: string;
  bytes: Uint8Array;
}) {
  const contentType = await checkImage(bytes);
  const cutter = await db("cutters")
    .where({ vendor_id: vendorId, id: cutterId })
    .first<{ image_key: string | null } | undefined>("image_key");
  if (!cutter) throw new NotFound("No such cutter.");
  const key = `cutters/${cutterId}/${randomBytes(6).toString("hex")}`;
  await putImage({ vendorId, key, image: { contentType, bytes: Buffer.from(bytes) } });
  await db.transaction(async (trx) => {
    await trx("cutters").where({ vendor_id: vendorId, id: cutterId }).update({ image_key: key, updated_at: trx.fn.now() });
    await bumpLibraryGeneration(trx, vendorId);
  });
  // The Library shows the picture on the cutter card of its cached pages.
  invalidateLibrary({ vendorId });
  if (cutter.image_key) await deleteImage({ vendorId, key: cutter.image_key });
  await writeAudit({
    vendorId,
    actorUserId: userId,
    action: "cutter.image",
    objectType: "cutter",
    objectId: cutterId,
    details: { contentType, bytes: bytes.byteLength },
  });
  return { key, contentType };
}
