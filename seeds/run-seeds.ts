import type { Knex } from "knex";

import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { seedSearchIndex } from "@/search/indexing/seed-search-index";

import { seedBench } from "./seed-bench";
import { seedFamilies } from "./seed-families";
import { seedField } from "./seed-field";
import { seedFoundation } from "./seed-foundation";
import { seedSheets } from "./seed-sheets";
import { seedSupport } from "./seed-support";
import { seedWebhooks } from "./seed-webhooks";

// Tables in dependency order for a reset; later features add theirs at the front.
export const TENANT_TABLES = [
  "library_generations",
  "webhook_deliveries",
  "webhooks",
  "field_week_rollups",
  "field_change_rollups",
  "field_version_rollups",
  "field_digests_sent",
  "sheet_version_activity",
  "search_words",
  "search_documents",
  "search_index_versions",
  "inbound_mail_log",
  "problem_reports",
  "reply_snippets",
  "desk_views",
  "ticket_attachments",
  "ticket_messages",
  "ticket_sheet_links",
  "tickets",
  "cutter_images",
  "family_batch_items",
  "family_batches",
  "family_rule_sets",
  "families",
  "change_alerts_sent",
  "mail_preferences",
  "customer_cutters",
  "outcomes",
  "setups",
  "machines",
  "sheet_versions",
  "sheets",
  "machine_classes",
  "materials",
  "cutters",
  "api_tokens",
  "audit_log",
  "invitations",
  "members",
  "verification_tokens",
  "rate_limit_buckets",
  "users",
  "vendors",
];

export async function runSeeds(knex: Knex, { reset }: { reset: boolean }) {
  if (reset) await knex.raw(`truncate ${TENANT_TABLES.join(", ")} cascade`);
  const ids = await seedFoundation(knex);
  await seedSheets(knex, ids);
  await seedBench(knex, ids);
  await seedSupport(knex, ids);
  await seedField(knex, ids);
  await seedWebhooks(knex, ids);
  await seedFamilies(knex, ids);
  await seedSearchIndex(knex);
  await refreshFieldRollups(knex);
  return ids;
}
