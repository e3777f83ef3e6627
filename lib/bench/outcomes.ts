import "server-only";

import { outcomeChangesSchema, type OutcomeFields, type OutcomeResult, type OutcomeSymptom } from "@/content-schema/outcome-fields";
import { writeAudit } from "@/lib/audit/write-audit";
import { lockIdempotencyKey } from "@/lib/db/idempotent";
import { db } from "@/lib/db/knex";
import { InvalidInput, NotFound } from "@/lib/errors/domain-errors";
import { scheduleFieldRefresh } from "@/lib/field/refresh-rollups";
import { getStorage, newStorageKey, sniffUpload } from "@/lib/storage";
import { assertUploadQuota } from "@/lib/storage/upload-quota";
import { queueOutcomeReported } from "@/lib/webhooks/queue-domain-events";

export type Outcome = {
  id: string;
  result: OutcomeResult;
  symptom: OutcomeSymptom | null;
  changes: OutcomeFields["changes"];
  notes: string;
  hasPhoto: boolean;
  sheetVersionId: string;
  createdAt: string;
};

type Options = { vendorId: string; userId: string; setupId: string };

/** Records how a cut went, against the setup's pinned version and machine. The photo must sniff as an image. */
export async function recordOutcome({
  vendorId,
  userId,
  setupId,
  fields,
  photo,
  idempotencyKey,
}: Options & { fields: OutcomeFields; photo?: Buffer | null; idempotencyKey?: string }) {
  const setup = await db("setups")
    .where({ vendor_id: vendorId, user_id: userId, id: setupId })
    .first("id", "sheet_version_id", "machine_id");
  if (!setup) throw new NotFound("That setup was not found.");
  let photoKey: string | null = null;
  let photoSize: number | null = null;
  if (photo && photo.byteLength > 0) {
    const sniffed = await sniffUpload(photo, "photo");
    if (sniffed.kind !== "image")
      throw new InvalidInput("Please correct the marked fields.", { photo: ["The photo must be a PNG, JPEG or WebP image."] });
    await assertUploadQuota({ userId, addBytes: photo.byteLength });
    photoKey = newStorageKey();
    await getStorage().put(photoKey, photo, sniffed.contentType);
    photoSize = photo.byteLength;
  }
  return db.transaction(async (trx) => {
    if (idempotencyKey) {
      await lockIdempotencyKey(trx, "outcome", idempotencyKey);
      const earlier = await trx("outcomes")
        .where({ vendor_id: vendorId, user_id: userId, idempotency_key: idempotencyKey })
        .first<{ id: string } | undefined>("id");
      if (earlier) return { id: earlier.id, created: false };
    }
    const [row] = await trx("outcomes")
      .insert({
        vendor_id: vendorId,
        setup_id: setup.id,
        sheet_version_id: setup.sheet_version_id,
        user_id: userId,
        machine_id: setup.machine_id,
        result: fields.result,
        symptom: fields.result === "failed" ? (fields.symptom ?? null) : null,
        changes: JSON.stringify(fields.result === "worked_after_changes" ? fields.changes : {}),
        notes: fields.notes,
        photo_key: photoKey,
        photo_size_bytes: photoSize,
        idempotency_key: idempotencyKey ?? null,
      })
      .returning("id");
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "outcome.create",
        objectType: "outcome",
        objectId: row.id,
        details: { setupId, result: fields.result },
      },
      trx,
    );
    await scheduleFieldRefresh(trx);
    await queueOutcomeReported(trx, {
      vendorId,
      outcomeId: row.id,
      versionId: setup.sheet_version_id,
      result: fields.result,
      symptom: fields.result === "failed" ? (fields.symptom ?? null) : null,
    });
    return { id: row.id as string, created: true };
  });
}

export async function listOutcomes({ vendorId, userId, setupId }: Options): Promise<Outcome[]> {
  const rows = await db("outcomes")
    .where({ vendor_id: vendorId, user_id: userId, setup_id: setupId })
    .orderBy("created_at", "desc")
    .select("id", "result", "symptom", "changes", "notes", "photo_key", "sheet_version_id", "created_at");
  return rows.map((r) => ({
    id: r.id,
    result: r.result,
    symptom: r.symptom,
    // Written through the same schema; a row that no longer reads (a renamed parameter) shows no changes.
    changes: outcomeChangesSchema.catch({}).parse(r.changes ?? {}),
    notes: r.notes,
    hasPhoto: r.photo_key !== null,
    sheetVersionId: r.sheet_version_id,
    createdAt: new Date(r.created_at).toISOString(),
  }));
}

/** The stored photo of one of the customer's outcomes. */
export async function findOutcomePhoto({ vendorId, userId, outcomeId }: { vendorId: string; userId: string; outcomeId: string }) {
  const row = await db("outcomes")
    .where({ vendor_id: vendorId, user_id: userId, id: outcomeId })
    .whereNotNull("photo_key")
    .first("photo_key");
  if (!row?.photo_key) return null;
  const bytes = await getStorage().get(row.photo_key);
  if (!bytes) return null;
  const sniffed = await sniffUpload(bytes, "photo");
  return { bytes, contentType: sniffed.contentType };
}
