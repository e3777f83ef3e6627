// Data for scripts/bench-pages.ts: the demo scenario, synthetic catalogues (published versions, indexed for
// search), a Desk queue of many tickets and one ticket with a long thread, all invented.
import type { Knex } from "knex";

import { createPostgresEngine } from "../../search/engines/postgres/postgres-engine";
import { reindexVendor } from "../../search/indexing/reindex";
import { runSeeds } from "../../seeds/run-seeds";
import { createBenchVendor } from "../bench-search-data";

export type PagesTargets = { vendorSlug: string; sheetSlug: string; staffUserId: string; threadTicketId: string };

export type PagesDataOptions = { versions: number; tickets: number; messages: number };

export async function seedPagesData(knex: Knex, { versions, tickets, messages }: PagesDataOptions): Promise<PagesTargets> {
  let t = performance.now();
  await runSeeds(knex, { reset: false });
  console.log(`seeded the demo in ${Math.round(performance.now() - t)} ms`);

  t = performance.now();
  const vendorCount = 4;
  const engine = createPostgresEngine(knex);
  for (let i = 0; i < vendorCount; i++) {
    const vendor = await createBenchVendor(knex, i, Math.floor(versions / vendorCount) + (i < versions % vendorCount ? 1 : 0));
    await reindexVendor({ engine, knex, vendorId: vendor.id });
  }
  console.log(`generated and indexed ${versions} synthetic versions in ${Math.round(performance.now() - t)} ms`);

  const vendor = await knex("vendors").where({ slug: "northbeck" }).first<{ id: string; slug: string }>("id", "slug");
  const customer = await knex("users").where({ email: "maker@example.test" }).first<{ id: string }>("id");
  const staff = await knex("users").where({ email: "support1@northbeck.test" }).first<{ id: string }>("id");
  const sheet = await knex("sheets as s")
    .join("sheet_versions as v", "v.sheet_id", "s.id")
    .where({ "s.vendor_id": vendor.id, "v.state": "published" })
    .orderBy("s.slug")
    .first<{ slug: string }>("s.slug");

  t = performance.now();
  const { rows } = await knex.raw<{ rows: { n: number }[] }>("select coalesce(max(number), 0)::int as n from tickets where vendor_id = ?", [
    vendor.id,
  ]);
  const first = rows[0].n + 1;
  await knex.raw(
    `insert into tickets (vendor_id, number, customer_id, subject, body, status, priority, idempotency_key, first_response_due_at, created_at, last_activity_at)
     select ?, ? + g, ?, 'Bench ticket ' || g, 'Invented bench ticket about a cut that went wrong.',
       (array['new', 'in_progress', 'waiting_on_customer', 'answered', 'closed'])[1 + g % 5], (array['low', 'normal', 'normal', 'high'])[1 + g % 4], 'bench-' || g,
       now() + interval '1 day' - interval '1 minute' * g, now() - interval '1 minute' * g, now() - interval '1 minute' * g
     from generate_series(0, ?::int - 1) g`,
    [vendor.id, first, customer.id, tickets],
  );
  const thread = await knex("tickets").where({ vendor_id: vendor.id, number: first }).first<{ id: string }>("id");
  await knex.raw(
    `insert into ticket_messages (vendor_id, ticket_id, author_id, visibility, body, created_at)
     select ?, ?, case when g % 2 = 0 then ?::uuid else ?::uuid end, case when g % 10 = 9 then 'note' else 'public' end,
       'Invented message ' || g || ' of a long thread: **feed** and *speed* with a [link](https://example.test/' || g || ').',
       now() - interval '1 minute' * (? - g)
     from generate_series(1, ?::int) g`,
    [vendor.id, thread.id, customer.id, staff.id, messages, messages],
  );
  await knex.raw("analyze");
  console.log(`inserted ${tickets} tickets and a thread of ${messages} messages in ${Math.round(performance.now() - t)} ms`);
  return { vendorSlug: vendor.slug, sheetSlug: sheet.slug, staffUserId: staff.id, threadTicketId: thread.id };
}
