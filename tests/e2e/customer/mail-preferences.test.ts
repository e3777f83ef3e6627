import { afterAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { firstLink, waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

const ENGINEER = "eng2@northbeck.test";

describe("mail preferences", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    const db = e2eDb();
    const user = mustExist(await db("users").where({ email: ENGINEER }).first("id"), "user");
    if (user) await db("mail_preferences").where({ user_id: user.id }).delete();
    await closeE2eDb();
  });

  it(
    "a mail's stop link lands on the preferences page; its footer opens them without signing in; the header opens them when signed in",
    { timeout: 300_000 },
    async () => {
      const staff = await openBrowser();
      sessions.push(staff);
      staff.page.setDefaultNavigationTimeout(90_000);
      await signInWithPassword(staff.page, ENGINEER, "/northbeck/drafting/field");
      const since = Date.now() - 1000;
      await staff.page.getByRole("button", { name: "Send me this week’s digest" }).click();
      const mail = await waitForMail(ENGINEER, /^Field results for Northbeck/, { after: since, timeoutMs: 60_000 });
      const stop = firstLink(mail.text, /\/field\/digest\/stop\?token=/);
      const footer = firstLink(mail.text, /\/northbeck\/mail-preferences\?token=/);

      // Signed out, as from a mail client: the stop page asks, its button stops and lands on the preferences.
      const reader = await openBrowser();
      sessions.push(reader);
      await reader.page.goto(stop);
      await reader.page.getByRole("button", { name: "Stop the weekly digest" }).click();
      await reader.page.waitForURL(/\/northbeck\/mail-preferences\?.*stopped=weekly_digest/);
      await reader.page.getByText("Weekly digest: off.").waitFor();
      expect(await reader.page.getByLabel("Weekly digest").isChecked()).toBe(false);
      // An engineer's own kinds of mail: the digest and sheet changes, not ticket notifications.
      expect(await reader.page.getByLabel("Ticket notifications").count()).toBe(0);
      await screenshot(reader.page, "mail-preferences-after-stop");

      // The footer link of the same mail opens the same page; turning the digest back on is saved.
      await reader.page.goto(footer);
      await reader.page.getByLabel("Weekly digest").check();
      await reader.page.getByLabel("Change alerts").uncheck();
      await reader.page.getByRole("button", { name: "Save mail preferences" }).click();
      await reader.page.getByText("✓ Saved.").waitFor();
      const db = e2eDb();
      const user = mustExist(await db("users").where({ email: ENGINEER }).first("id"), "user");
      const rows = Object.fromEntries(
        (await db("mail_preferences").where({ user_id: user.id }).select("kind", "enabled")).map((r) => [r.kind, r.enabled]),
      );
      expect(rows).toMatchObject({ weekly_digest: true, change_alerts: false, batch_changes: true });

      // Signed in, from the header; a visitor without a link is not let in.
      await staff.page.getByRole("link", { name: "Mail preferences" }).click();
      await staff.page.waitForURL(/\/northbeck\/mail-preferences$/);
      expect(await staff.page.getByLabel("Change alerts").isChecked()).toBe(false);
      const visitor = await openBrowser();
      sessions.push(visitor);
      expect((await visitor.context.request.get("/northbeck/mail-preferences", { failOnStatusCode: false })).status()).toBe(404);
    },
  );
});
