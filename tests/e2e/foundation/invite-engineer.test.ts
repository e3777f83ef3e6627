import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { firstLink, waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

describe("admin invites an engineer", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  it("the invitee accepts from the e-mail, is signed in and reaches Drafting; the link then stops working", async () => {
    const email = `new-engineer-${randomBytes(3).toString("hex")}@northbeck.test`;
    const admin = await openBrowser();
    sessions.push(admin);
    await signInWithPassword(admin.page, "admin@northbeck.test", "/northbeck/admin/members");
    const started = Date.now();
    await admin.page.locator("#f-email").fill(email);
    await admin.page.locator("#invite-role").selectOption("engineer");
    await admin.page.getByRole("button", { name: "Send invitation" }).click();
    await expect(admin.page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain(`Invitation sent to ${email}`);
    await screenshot(admin.page, "admin-invited");

    const mail = await waitForMail(email, /invited/, { after: started - 1000 });
    // The role reads as a word, not as its code.
    expect(mail.text).toContain("as applications engineer.");
    const link = firstLink(mail.text, /\/northbeck\/join\//);
    const invitee = await openBrowser();
    sessions.push(invitee);
    await invitee.page.goto(link);
    await invitee.page.getByLabel("Your name").fill("Nell Invitee");
    await invitee.page.getByLabel("Choose a password").fill("a-long-new-password");
    await invitee.page.getByRole("button", { name: "Accept invitation" }).click();
    // Accepting signs the invitee in with the password just chosen.
    await invitee.page.waitForURL((url) => url.pathname === "/northbeck/library", { timeout: 30_000 });
    await screenshot(invitee.page, "invitation-accepted");

    await invitee.page.goto("/northbeck/drafting");
    expect(new URL(invitee.page.url()).pathname).toBe("/northbeck/drafting");

    await admin.page.reload();
    await expect(admin.page.locator(`tr[data-member-email="${email}"]`).textContent()).resolves.toContain("Applications engineer");

    await invitee.page.goto(link);
    await expect(invitee.page.getByRole("heading", { name: "This invitation is not valid" }).isVisible()).resolves.toBe(true);
  });
});
