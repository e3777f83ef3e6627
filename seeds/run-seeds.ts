import type { Knex } from "knex";

import { seedFoundation } from "./seed-foundation";

// Tables in dependency order for a reset; later features add theirs at the front.
export const TENANT_TABLES = [
  "sheet_versions", "sheets", "machine_classes", "materials", "cutters",
  "api_tokens", "audit_log", "invitations", "members", "verification_tokens", "rate_limit_buckets", "users", "vendors",
];

export async function runSeeds(knex: Knex, { reset }: { reset: boolean }) {
  if (reset) await knex.raw(`truncate ${TENANT_TABLES.join(", ")} cascade`);
  const ids = await seedFoundation(knex);
  return ids;
}
