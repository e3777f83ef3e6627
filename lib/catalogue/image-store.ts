import "server-only";

import { db } from "@/lib/db/knex";

// The one storage boundary for catalogue images: today a table, later S3 (same key, same calls).
export type StoredImage = { contentType: string; bytes: Buffer };

export async function putImage({ vendorId, key, image }: { vendorId: string; key: string; image: StoredImage }): Promise<void> {
  await db("cutter_images")
    .insert({ key, vendor_id: vendorId, content_type: image.contentType, bytes: image.bytes })
    .onConflict("key")
    .merge();
}

export async function findImage({ vendorId, key }: { vendorId: string; key: string }): Promise<StoredImage | null> {
  const row = await db("cutter_images").where({ vendor_id: vendorId, key }).first<{ content_type: string; bytes: Buffer } | undefined>();
  return row ? { contentType: row.content_type, bytes: row.bytes } : null;
}

export async function deleteImage({ vendorId, key }: { vendorId: string; key: string }): Promise<void> {
  await db("cutter_images").where({ vendor_id: vendorId, key }).delete();
}
