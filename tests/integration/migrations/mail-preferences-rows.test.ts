import type { Knex } from "knex";
import { beforeAll, describe, expect, it } from "vitest";

import { loadMigration as load, migrationDatabase } from "@/tests/support/migration-db";

// The migration that turned mail preferences into one row per kind, run over rows written before it and back down,
// in a database of its own (built up to the migration before, so the carry-over can be seen).
const MIGRATION = "20261203160000_mail_preferences_and_my_cutters.ts";
const database = migrationDatabase(MIGRATION);
let knex: Knex;
beforeAll(() => {
  knex = database.knex();
});

describe(`migration ${MIGRATION}`, () => {
  it("carries both old columns over as rows, keeps everyone else on, and goes back down losslessly", async () => {
    const [vendor] = await knex("vendors").insert({ slug: "m-mail", name: "Migration test" }).returning("id");
    const user = async (email: string) => (await knex("users").insert({ email, name: email }).returning("id"))[0].id as string;
    const [off, digestOff, untouched] = [
      await user("off@example.test"),
      await user("digest@example.test"),
      await user("none@example.test"),
    ];
    // The table as it was before the migration (the typed table map knows only the new shape).
    await knex<{ vendor_id: string; user_id: string; change_alerts: boolean; weekly_digest: boolean }>("mail_preferences").insert([
      { vendor_id: vendor.id, user_id: off, change_alerts: false, weekly_digest: true },
      { vendor_id: vendor.id, user_id: digestOff, change_alerts: true, weekly_digest: false },
    ]);

    await (await load(MIGRATION)).up(knex);

    const rows = await knex("mail_preferences").orderBy(["user_id", "kind"]).select("user_id", "kind", "enabled");
    const of = (id: string) => Object.fromEntries(rows.filter((r) => r.user_id === id).map((r) => [r.kind, r.enabled]));
    expect(of(off)).toEqual({ change_alerts: false, weekly_digest: true });
    expect(of(digestOff)).toEqual({ change_alerts: true, weekly_digest: false });
    expect(of(untouched)).toEqual({});
    await expect(
      knex<Record<string, unknown>>("mail_preferences").insert({
        vendor_id: vendor.id,
        user_id: untouched,
        kind: "newsletter",
        enabled: true,
      }),
    ).rejects.toThrow(/mail_preferences_kind/);
    await knex("mail_preferences").insert({ vendor_id: vendor.id, user_id: untouched, kind: "ticket_notifications", enabled: false });

    await (await load(MIGRATION)).down(knex);
    const back = await knex("mail_preferences").orderBy("user_id").select("user_id", "change_alerts", "weekly_digest");
    expect(back.find((r) => r.user_id === off)).toMatchObject({ change_alerts: false, weekly_digest: true });
    expect(back.find((r) => r.user_id === digestOff)).toMatchObject({ change_alerts: true, weekly_digest: false });
    await (await load(MIGRATION)).up(knex);
    expect(await knex.schema.hasTable("customer_cutters")).toBe(true);
  });
});
