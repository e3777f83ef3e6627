import type { Knex } from "knex";

import type { SearchDocument } from "@/search/document/document-schema";
import { indexWords } from "@/search/document/index-words";

import { docToRow, weightedText } from "./pg-columns";
import { lexemeOf } from "./ts-query";

const CHUNK = 200;
const VECTOR_SQL = `setweight(to_tsvector('simple', sb_unaccent(?)), 'A') || setweight(to_tsvector('simple', sb_unaccent(?)), 'B')
  || setweight(to_tsvector('simple', sb_unaccent(?)), 'C') || setweight(to_tsvector('simple', sb_unaccent(?)), 'D')`;

/** Insert or replace documents; every row is written with the vendor id it is upserted under. */
export async function upsertRows(knex: Knex, vendorId: string, docs: readonly SearchDocument[]): Promise<void> {
  for (let i = 0; i < docs.length; i += CHUNK) {
    const chunk = docs.slice(i, i + CHUNK);
    const rows = chunk.map((doc) => ({
      ...docToRow(doc),
      vendor_id: vendorId,
      search_vector: knex.raw(VECTOR_SQL, weightedText(doc)),
      indexed_at: knex.fn.now(),
    }));
    await knex("search_documents").insert(rows).onConflict(["vendor_id", "doc_id"]).merge();
    const words = [...new Set(chunk.flatMap((doc) => indexWords(doc).split(" ").map(lexemeOf)))].filter(
      (w) => w.length >= 3 && !/\d/.test(w),
    );
    if (words.length)
      await knex("search_words")
        .insert(words.map((word) => ({ vendor_id: vendorId, word })))
        .onConflict(["vendor_id", "word"])
        .ignore();
  }
}

export async function removeRows(knex: Knex, vendorId: string, docIds: readonly string[]): Promise<void> {
  if (docIds.length === 0) return;
  await knex("search_documents")
    .where({ vendor_id: vendorId })
    .whereIn("doc_id", [...docIds])
    .delete();
}

export async function replaceVendorRows(knex: Knex, vendorId: string, docs: readonly SearchDocument[]): Promise<void> {
  await knex.transaction(async (trx) => {
    await trx("search_documents").where({ vendor_id: vendorId }).delete();
    // Words of removed documents otherwise stay (harmless: they only add terms that match nothing).
    await trx("search_words").where({ vendor_id: vendorId }).delete();
    await upsertRows(trx, vendorId, docs);
  });
}
