import "server-only";

import { db } from "@/lib/db/knex";

export type Snippet = { id: string; title: string; body: string };

export async function listSnippets({ vendorId }: { vendorId: string }): Promise<Snippet[]> {
  return db("reply_snippets").where({ vendor_id: vendorId }).orderBy("title").select<Snippet[]>("id", "title", "body");
}

export async function saveSnippet({
  vendorId,
  userId,
  title,
  body,
}: {
  vendorId: string;
  userId: string;
  title: string;
  body: string;
}): Promise<void> {
  await db("reply_snippets")
    .insert({ vendor_id: vendorId, title, body, created_by: userId })
    .onConflict(["vendor_id", "title"])
    .merge({ body });
}
