import type { Knex } from "knex";

// A search that relaxes to a material's group (nothing matched the material's own key) reads the vendor's
// documents of that group; without this index it read every document of the vendor.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create index if not exists search_documents_group on search_documents (vendor_id, kind, material_group)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists search_documents_group");
}
