import type { Knex } from "knex";

// Cutter images live in the database for now; lib/catalogue/image-store.ts is the one place that reads
// and writes them, so moving to S3 later changes only that file (cutters.image_key names the object).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("cutter_images", (t) => {
    t.text("key").primary();
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.text("content_type").notNullable();
    t.binary("bytes").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`alter table cutter_images add constraint cutter_images_type_check
    check (content_type in ('image/png','image/jpeg','image/webp') and octet_length(bytes) <= 5242880)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("cutter_images");
}
