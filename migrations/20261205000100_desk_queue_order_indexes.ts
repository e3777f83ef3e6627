import type { Knex } from "knex";

// The Desk queue shows one page in the order staff chose (newest or oldest first, or by response target). With
// these indexes PostgreSQL walks a vendor's tickets in that order and stops after the page; without them it read
// and sorted every ticket of the vendor on every page and every 10-second refresh.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create index if not exists tickets_queue_by_created on tickets (vendor_id, created_at, number)");
  await knex.raw("create index if not exists tickets_queue_by_target on tickets (vendor_id, first_response_due_at, number)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists tickets_queue_by_target");
  await knex.raw("drop index if exists tickets_queue_by_created");
}
