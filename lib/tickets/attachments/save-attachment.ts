import "server-only";

import { db } from "@/lib/db/knex";
import { getStorage } from "@/lib/storage/get-storage";
import { sniffUpload } from "@/lib/storage/sniff-upload";
import { assertUploadQuota } from "@/lib/storage/upload-quota";
import { newStorageKey } from "@/lib/storage/upload-storage";

import { displayFileName } from "./display-file-name";

export type SavedAttachment = { id: string; fileName: string; contentType: string; kind: "image" | "pdf" | "text"; sizeBytes: number };

/**
 * Stores an upload for a ticket that is about to be created or replied to. The type comes from the
 * bytes; the row stays unattached (visible to its uploader only) until a ticket or message claims it.
 */
export async function saveAttachment({
  vendorId,
  userId,
  bytes,
  fileName,
}: {
  vendorId: string;
  userId: string;
  bytes: Buffer;
  fileName: string;
}): Promise<SavedAttachment> {
  const sniffed = await sniffUpload(bytes, fileName);
  // Checked before storing (a clear answer, no wasted write), and again under the per-person lock with the insert.
  await assertUploadQuota({ userId, addBytes: bytes.byteLength });
  const key = newStorageKey();
  await getStorage().put(key, bytes, sniffed.contentType);
  const name = displayFileName(fileName, sniffed);
  const [row] = await db
    .transaction(async (trx) => {
      await assertUploadQuota({ userId, addBytes: bytes.byteLength, trx });
      return trx("ticket_attachments")
        .insert({
          vendor_id: vendorId,
          uploaded_by: userId,
          storage_key: key,
          file_name: name,
          content_type: sniffed.contentType,
          kind: sniffed.kind,
          size_bytes: bytes.byteLength,
        })
        .returning<{ id: string }[]>("id");
    })
    .catch(async (error: unknown) => {
      await getStorage()
        .delete(key)
        .catch(() => undefined);
      throw error;
    });
  return { id: row.id, fileName: name, contentType: sniffed.contentType, kind: sniffed.kind, sizeBytes: bytes.byteLength };
}
