import { randomBytes } from "node:crypto";
import nodemailer from "nodemailer";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "./browser";
import { closeE2eDb, e2eDb } from "./db";
import { DEMO_PASSWORD, MAILDEV_URL } from "./env";
import { waitForMail } from "./maildev";

// A 1×1 PNG (ISO/IEC 15948 signature + IHDR/IDAT/IEND), standing in for a photo of the chips.
const PHOTO = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a2a0e1df0000000049454e44ae426082",
  "hex",
);
const CUSTOMER = "maker@example.test";
const AGENT = "support1@northbeck.test";
const INBOUND_PORT = Number(process.env.INBOUND_SMTP_PORT ?? 2525);

// A shared dev server can be slow under load: generous navigation timeouts.
async function reloadUntil(page: Page, text: string, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    await page.reload({ timeout: 90_000 });
    if ((await page.getByText(text).count()) > 0) {
      // Interactions follow: let the page hydrate first.
      await page.waitForLoadState("networkidle", { timeout: 60_000 }).catch(() => undefined);
      return;
    }
    if (Date.now() > deadline) throw new Error(`"${text}" did not appear on ${page.url()}`);
    await page.waitForTimeout(1000);
  }
}

// Like the harness sign-in, with the longer waits this journey uses on a busy shared dev server.
async function signIn(page: Page, email: string) {
  await page.goto("/sign-in?callbackUrl=%2F");
  // A click before hydration would submit the form natively and stay on /sign-in.
  await page.waitForLoadState("networkidle", { timeout: 120_000 });
  await page.locator("#pw-email").fill(email);
  await page.locator("#pw-password").fill(DEMO_PASSWORD);
  await Promise.all([
    page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout: 120_000 }),
    page.getByRole("button", { name: "Sign in", exact: true }).click(),
  ]);
}

describe("support journey", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it(
    "ticket from a sheet with a photo → assigned → adapted reply and a note → e-mail both ways → closed and rated",
    { timeout: 480_000 },
    async () => {
      const db = e2eDb();
      const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
      const customer = mustExist(await db("users").where({ email: CUSTOMER }).first("id"), "customer");
      const agent = mustExist(await db("users").where({ email: AGENT }).first("id", "name"), "agent");
      const version = mustExist(
        await db("sheet_versions")
          .where({ vendor_id: vendor.id, state: "published" })
          .whereILike("title", "Cast acrylic%")
          .first("id", "title"),
        "version",
      );
      const machine = mustExist(await db("machines").where({ vendor_id: vendor.id, user_id: customer.id }).first("id", "name"), "machine");
      expect(version && machine, "demo data: a published acrylic sheet and a machine for the customer").toBeTruthy();
      const subject = `Chips weld in the slot ${randomBytes(3).toString("hex")}`;

      // The customer opens a ticket from the sheet (the sheet page links here with both ids) and attaches a photo.
      const c = await openBrowser();
      sessions.push(c);
      c.page.setDefaultNavigationTimeout(90_000);
      await signIn(c.page, CUSTOMER);
      await c.page.goto(`/northbeck/support/new?sheetVersion=${version.id}&machine=${machine.id}`);
      await c.page.getByText(version.title).first().waitFor({ timeout: 15_000 });
      await c.page.locator("#f-subject").fill(subject);
      await c.page.locator("#f-body").fill("The chips melt back into the slot at **full-width slotting**.");
      await c.page.locator("#f-upload").setInputFiles({ name: "chips.png", mimeType: "image/png", buffer: PHOTO });
      await c.page.locator('[data-upload-state="done"]').waitFor({ timeout: 15_000 });
      await screenshot(c.page, "support-new-ticket");
      await Promise.all([
        c.page.waitForURL(/\/northbeck\/support\/tickets\//, { timeout: 90_000 }),
        c.page.getByRole("button", { name: "Send to support" }).click(),
      ]);
      const ticketId = c.page.url().split("/").pop()!;
      await c.page.getByRole("img", { name: "chips.png" }).waitFor({ timeout: 15_000 });

      // Staff assign it from the queue.
      const s = await openBrowser();
      sessions.push(s);
      s.page.setDefaultNavigationTimeout(90_000);
      await signIn(s.page, AGENT);
      await s.page.goto("/northbeck/desk");
      const row = s.page.locator(`tr[data-ticket-id="${ticketId}"]`);
      await row.waitFor({ timeout: 20_000 });
      await row.getByRole("checkbox").check();
      await s.page.getByLabel("Assign selected to").selectOption(agent.id);
      await s.page.getByRole("button", { name: "Assign selected" }).click();
      await expect(s.page.getByRole("status").filter({ hasText: "assigned" }).textContent({ timeout: 60_000 })).resolves.toContain(
        "1 ticket assigned",
      );
      await screenshot(s.page, "desk-queue-assigned");

      // A public reply with the sheet adapted to the customer's machine, then an internal note.
      await s.page.goto(`/northbeck/desk/tickets/${ticketId}`);
      // The picker lists the ticket's linked sheet first, with its machine class.
      const firstGroup = s.page.locator('select[name="cardSheetVersionId"] optgroup').first();
      await expect(firstGroup.getAttribute("label")).resolves.toBe("Linked to this ticket");
      await expect(firstGroup.locator("option").first().getAttribute("value")).resolves.toBe(version.id);
      await expect(firstGroup.locator("option").first().textContent()).resolves.toMatch(/ · .+ \(version \d+\)$/);
      // Other sheets are found by words (a catalogue holds more versions than a list can carry); the linked one stays.
      await s.page.waitForLoadState("networkidle", { timeout: 60_000 }).catch(() => undefined);
      const other = mustExist(
        await db("sheet_versions").where({ vendor_id: vendor.id, state: "published" }).whereNot({ id: version.id }).first("title"),
        "another published version",
      );
      await s.page.getByLabel("Find a sheet version").fill(other.title);
      const found = s.page.locator('select[name="cardSheetVersionId"] optgroup[label^="Found for"]');
      await found.waitFor({ state: "attached", timeout: 30_000 });
      const foundNames = await found.locator("option").allTextContents();
      expect(foundNames.length).toBeGreaterThan(0);
      for (const name of foundNames) expect(name.startsWith(other.title)).toBe(true);
      await expect(firstGroup.locator("option").first().getAttribute("value")).resolves.toBe(version.id);
      await s.page.locator("#f-staff-body").fill("Your router tops out below the sheet's speed, so here is the sheet adapted to it.");
      await s.page.locator('select[name="cardSheetVersionId"]').selectOption(version.id);
      await s.page.locator('select[name="cardMachineId"]').selectOption(machine.id);
      await s.page.getByRole("button", { name: "Send reply", exact: true }).click();
      await expect(s.page.getByRole("status").filter({ hasText: "Reply sent." }).textContent({ timeout: 60_000 })).resolves.toContain(
        "Reply sent.",
      );
      await s.page.locator('input[name="visibility"][value="note"]').check();
      // In note mode the editor is tinted and the button says what it does.
      await s.page.locator('form[data-mode="note"]').waitFor();
      await s.page.locator("#f-staff-body").fill("Internal: ask engineering whether vf is too low for light routers.");
      await screenshot(s.page, "desk-note-mode");
      await s.page.getByRole("button", { name: "Add internal note", exact: true }).click();
      await expect(s.page.getByRole("status").filter({ hasText: "Note added." }).textContent({ timeout: 60_000 })).resolves.toContain(
        "Note added.",
      );
      await s.page.reload({ timeout: 90_000 });
      await s.page.locator("[data-adapted-card]").waitFor({ timeout: 15_000 });
      await expect(s.page.locator("[data-adapted-card]").count()).resolves.toBe(1);
      await screenshot(s.page, "desk-ticket-replied");

      // The customer sees the reply and the adapted card, never the note, and gets the e-mail.
      await reloadUntil(c.page, "here is the sheet adapted to it");
      await expect(c.page.locator("[data-adapted-card]").count()).resolves.toBe(1);
      await expect(c.page.getByText("ask engineering whether").count()).resolves.toBe(0);
      await screenshot(c.page, "support-ticket-reply");
      const mail = await waitForMail(CUSTOMER, new RegExp(subject), { timeoutMs: 60_000 });
      expect(mail.text).toContain("here is the sheet adapted to it");
      expect(mail.text).not.toContain("ask engineering");
      // MailDev's JSON leaves Reply-To out; read it from the raw message (headers may be folded).
      const source = await (await fetch(`${MAILDEV_URL}/api/email/${mail.id}/source`)).text();
      const replyTo = /^Reply-To:\s*<?([^\s>]+)>?/im.exec(source.replace(/\r?\n[ \t]+/g, " "))?.[1] ?? "";
      // ticket . recipient . expiry day . signature
      expect(replyTo).toMatch(/^reply\+[0-9a-f]{32}\.[0-9a-f]{32}\.[0-9a-f]+\.[0-9a-f]{32}@/);

      // The customer answers by e-mail, through the app's inbound listener.
      await nodemailer.createTransport({ host: "127.0.0.1", port: INBOUND_PORT, secure: false, ignoreTLS: true }).sendMail({
        from: CUSTOMER,
        to: replyTo,
        subject: `Re: ${mail.subject}`,
        text: `Ran it at the adapted numbers: clean chips now.\n\nOn Tue, 1 Dec 2026, Support wrote:\n> ${mail.text.split("\n").join("\n> ")}`,
      });
      await reloadUntil(s.page, "clean chips now");
      await screenshot(s.page, "desk-reply-by-mail");

      // Staff close it; the customer rates it.
      await s.page.locator('select[name="status"]').selectOption("closed");
      await s.page.getByRole("button", { name: "Save changes" }).click();
      await expect(s.page.getByRole("status").filter({ hasText: "Ticket updated." }).textContent({ timeout: 60_000 })).resolves.toContain(
        "Ticket updated.",
      );
      await reloadUntil(c.page, "How well was your question answered?");
      await c.page.getByRole("radio", { name: /5/ }).check();
      await c.page.locator("#f-comment").fill("Quick and right.");
      await c.page.getByRole("button", { name: "Send rating" }).click();
      await expect(c.page.getByRole("status").filter({ hasText: "Thank you" }).textContent({ timeout: 60_000 })).resolves.toContain(
        "Thank you for rating",
      );
      await screenshot(c.page, "support-rated");
      const ticket = await db("tickets").where({ id: ticketId }).first("status", "satisfaction", "assignee_id");
      expect(ticket).toMatchObject({ status: "closed", satisfaction: 5, assignee_id: agent.id });
    },
  );
});
