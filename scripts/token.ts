// Operations: `npm run token -- create --vendor <slug> --email <email> [--name <label>]` prints a new
// personal access token for an existing member (shown once; only its hash is stored).
import { parseArgs } from "node:util";

import { createPersonalToken } from "@/lib/auth/personal-access-tokens";

import { db } from "../lib/db/knex";

const { positionals, values } = parseArgs({
  allowPositionals: true,
  options: { vendor: { type: "string" }, email: { type: "string" }, name: { type: "string" } },
});

async function main(): Promise<number> {
  if (positionals[0] !== "create" || !values.vendor || !values.email) {
    console.error("Usage: npm run token -- create --vendor <slug> --email <email> [--name <label>]");
    return 2;
  }
  const vendor = await db("vendors").where({ slug: values.vendor }).first<{ id: string } | undefined>("id");
  const user = await db("users").where({ email: values.email }).first<{ id: string } | undefined>("id");
  const member =
    vendor && user
      ? await db("members").where({ vendor_id: vendor.id, user_id: user.id }).first<{ role: string } | undefined>("role")
      : undefined;
  if (!vendor || !user || !member) {
    console.error(`No member ${values.email} in vendor ${values.vendor}.`);
    return 1;
  }
  const token = await createPersonalToken({ vendorId: vendor.id, userId: user.id, name: values.name ?? "created with npm run token" });
  console.error(`Token for ${values.email} (${member.role} @ ${values.vendor}); it is shown only now:`);
  console.log(token.secret);
  return 0;
}

try {
  process.exitCode = await main();
} finally {
  await db.destroy();
}
