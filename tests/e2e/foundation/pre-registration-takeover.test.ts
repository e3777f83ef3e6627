import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { firstLink, waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

const ATTACKER_PASSWORD = "attacker-chosen-password";

async function trySignIn(session: Session, email: string, password: string): Promise<string> {
  const { page } = session;
  await page.goto("/sign-in?vendor=northbeck");
  await page.locator("#pw-email").fill(email);
  await page.locator("#pw-password").fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  return (await page.locator("form [role=alert]").first().textContent({ timeout: 15_000 })) ?? "";
}

async function invite(admin: Session, email: string) {
  await admin.page.goto("/northbeck/admin/members");
  await admin.page.locator("#f-email").fill(email);
  await admin.page.locator("#invite-role").selectOption("engineer");
  await admin.page.getByRole("button", { name: "Send invitation" }).click();
  await expect(admin.page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain(`Invitation sent to ${email}`);
}

describe("an account registered in advance with an invitee's address", () => {
  const sessions: Session[] = [];
  const open = async () => {
    const s = await openBrowser();
    sessions.push(s);
    return s;
  };
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  it("gives the attacker neither a sign-in nor the role; the real invitee accepts and is signed in", async () => {
    const email = `newhire-${randomBytes(3).toString("hex")}@northbeck.test`;
    const started = Date.now();

    const attacker = await open();
    await attacker.page.goto("/northbeck/sign-up");
    await attacker.page.getByLabel("Your name").fill("Someone Else");
    await attacker.page.getByLabel("E-mail").fill(email);
    await attacker.page.getByLabel("Password").fill(ATTACKER_PASSWORD);
    await attacker.page.getByRole("button", { name: "Create account" }).click();
    await expect(attacker.page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain("we sent a link");
    await expect(trySignIn(attacker, email, ATTACKER_PASSWORD)).resolves.toContain("Confirm your e-mail first");
    await attacker.page.getByRole("button", { name: "Send the link again" }).click();
    await expect(attacker.page.locator("form [role=status]").textContent({ timeout: 15_000 })).resolves.toContain(
      "a new link is on its way",
    );
    await screenshot(attacker.page, "takeover-attacker-unconfirmed");

    const admin = await open();
    await signInWithPassword(admin.page, "admin@northbeck.test", "/northbeck/admin/members");
    await invite(admin, email);

    // Still refused after the invitation: the attacker never proved the address.
    await expect(trySignIn(attacker, email, ATTACKER_PASSWORD)).resolves.toContain("Confirm your e-mail first");

    const mail = await waitForMail(email, /invited/, { after: started - 1000 });
    const invitee = await open();
    await invitee.page.goto(firstLink(mail.text, /\/northbeck\/join\//));
    await invitee.page.getByLabel("Your name").fill("Real New Hire");
    await invitee.page.getByLabel("Choose a password").fill("the-real-hire-password");
    await invitee.page.getByRole("button", { name: "Accept invitation" }).click();
    // Accepting signs the person in.
    await invitee.page.waitForURL((url) => url.pathname === "/northbeck/library", { timeout: 30_000 });
    await invitee.page.goto("/northbeck/drafting");
    expect(new URL(invitee.page.url()).pathname).toBe("/northbeck/drafting");
    await expect(invitee.page.getByRole("banner").textContent()).resolves.toContain("Real New Hire");
    await screenshot(invitee.page, "takeover-invitee-in-drafting");

    await expect(trySignIn(attacker, email, ATTACKER_PASSWORD)).resolves.toContain("E-mail or password is not right");
    await attacker.page.goto("/northbeck/drafting");
    expect(new URL(attacker.page.url()).pathname).not.toBe("/northbeck/drafting");
  });

  it("an existing account is asked to sign in as itself and comes back to the invitation", async () => {
    const email = `existing-${randomBytes(3).toString("hex")}@northbeck.test`;
    const started = Date.now();
    // A confirmed account of another vendor (a member of Northbeck already would be changed by role, not invited).
    const person = await open();
    await person.page.goto("/quillon/sign-up");
    await person.page.getByLabel("Your name").fill("Existing Person");
    await person.page.getByLabel("E-mail").fill(email);
    await person.page.getByLabel("Password").fill("existing-person-pw");
    await person.page.getByRole("button", { name: "Create account" }).click();
    await expect(person.page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain("we sent a link");
    const confirm = await waitForMail(email, /Confirm your e-mail/, { after: started - 1000 });
    await person.page.goto(firstLink(confirm.text, /\/verify-email\?/));
    await person.page.getByLabel("Password").fill("existing-person-pw");
    await person.page.getByRole("button", { name: "Confirm my e-mail" }).click();
    await expect(person.page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain("confirmed");

    const admin = await open();
    await signInWithPassword(admin.page, "admin@northbeck.test", "/northbeck/admin/members");
    await invite(admin, email);
    const mail = await waitForMail(email, /invited/, { after: started - 1000 });
    const link = firstLink(mail.text, /\/northbeck\/join\//);

    await person.page.goto(link);
    await expect(person.page.getByLabel("Choose a password").count()).resolves.toBe(0);
    await person.page.getByRole("link", { name: "Sign in to accept" }).click();
    await person.page.waitForURL(/\/sign-in/);
    await person.page.locator("#pw-email").fill(email);
    await person.page.locator("#pw-password").fill("existing-person-pw");
    await person.page.getByRole("button", { name: "Sign in", exact: true }).click();
    await person.page.waitForURL((url) => url.pathname === new URL(link).pathname, { timeout: 30_000 });
    await person.page.getByRole("button", { name: "Accept invitation" }).click();
    await person.page.waitForURL((url) => url.pathname === "/northbeck/library", { timeout: 30_000 });
    await person.page.goto("/northbeck/drafting");
    expect(new URL(person.page.url()).pathname).toBe("/northbeck/drafting");
  });
});
