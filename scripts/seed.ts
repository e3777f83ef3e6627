// Demo data: `npm run db:seed` (skips when vendors exist) or `npm run db:seed -- --reset`.
import knexFactory from "knex";

import { knexConfig } from "../lib/db/config";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../seeds/demo-scenario";
import { runSeeds } from "../seeds/run-seeds";

const knex = knexFactory(knexConfig());
try {
  const reset = process.argv.includes("--reset");
  const existing = Number((await knex("vendors").count<{ n: string }[]>("id as n"))[0].n);
  if (existing > 0 && !reset) {
    console.log(`Demo data present (${existing} vendors); use --reset to start over.`);
  } else {
    await runSeeds(knex, { reset });
    console.log("Demo data seeded (invented scenario).");
  }
  console.log(`\nDemo sign-ins (password for all: ${DEMO_PASSWORD}):`);
  for (const p of DEMO_PEOPLE) {
    const roles =
      Object.entries(p.roles)
        .map(([v, r]) => `${r} @ ${v}`)
        .join(", ") || "platform operator";
    console.log(`  ${p.email.padEnd(28)} ${roles}`);
  }
} finally {
  await knex.destroy();
}
