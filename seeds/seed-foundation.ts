import { hash } from "@node-rs/argon2";
import type { Knex } from "knex";

import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_VENDORS, OPERATOR_EMAIL } from "./demo-scenario";

export type SeededIds = { vendors: Record<string, string>; users: Record<string, string> };

export async function seedFoundation(knex: Knex): Promise<SeededIds> {
  const vendors: Record<string, string> = {};
  for (const v of DEMO_VENDORS) {
    const [row] = await knex("vendors")
      .insert({
        slug: v.slug,
        name: v.name,
        accent_color: v.accentColor,
        logo: Buffer.from(v.logo),
        logo_type: "image/svg+xml",
        settings: JSON.stringify(v.settings),
      })
      .returning("id");
    vendors[v.slug] = row.id;
  }
  const passwordHash = await hash(DEMO_PASSWORD);
  const users: Record<string, string> = {};
  for (const p of DEMO_PEOPLE) {
    const [row] = await knex("users")
      .insert({
        email: p.email,
        name: p.name,
        password_hash: passwordHash,
        email_verified: knex.fn.now(),
        is_operator: p.email === OPERATOR_EMAIL,
      })
      .returning("id");
    users[p.email] = row.id;
    for (const [slug, role] of Object.entries(p.roles)) {
      await knex("members").insert({ vendor_id: vendors[slug], user_id: row.id, role });
    }
  }
  return { vendors, users };
}
