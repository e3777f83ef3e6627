import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { addStaffMessage } from "@/lib/tickets/add-message";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";

import { emptyQueue, report, startMailDev, waitFor, type MailDev } from "./support/services";

// The retry schedule shortened by configuration: one second stands for one hour. Mail retries for
// 50 "hours" (waits of 1 s, then 2 s); SMTP stays down for 24 "hours", a simulated day.
const HOUR_MS = 1_000;
Object.assign(process.env, { MAIL_RETRY_BASE_SECONDS: "1", MAIL_RETRY_CAP_SECONDS: "2", MAIL_RETRY_WINDOW_SECONDS: "50" });

let maildev: MailDev | null = null;
let stopBoss: (() => Promise<void>) | null = null;
afterAll(async () => {
  await maildev?.stop();
  await stopBoss?.();
});

describe("fault: SMTP down for a simulated day", () => {
  it("delivers every mail of 200 tickets and replies made meanwhile exactly once", async () => {
    await emptyQueue();
    const { startWorker } = await import("@/lib/jobs/start-worker");
    const boss = await import("@/lib/jobs/boss");
    stopBoss = boss.stopBoss;
    const { vendor, support } = await createVendorWithStaff();
    const customers = await Promise.all(Array.from({ length: 10 }, () => createMember(vendor.id, "customer")));

    // SMTP (MailDev) is not running: the outage starts now.
    const outageStarted = Date.now();
    await startWorker();
    const expected = new Map<string, string>(); // subject → recipient, one mail each
    const tickets: { id: string; number: number; customer: { email: string; id: string } }[] = [];
    for (let i = 0; i < 100; i++) {
      const customer = customers[i % customers.length].user;
      const subject = `Outage ticket ${i}`;
      const ticket = await openTicket(vendor.id, customer.id, { subject });
      tickets.push({ ...ticket, customer });
      expected.set(`New ticket: ${subject}`, support.user.email);
    }
    for (const [i, t] of tickets.entries()) {
      await addStaffMessage({
        vendorId: vendor.id,
        ticketId: t.id,
        authorId: support.user.id,
        body: `Answer ${i}: lower the feed.`,
        visibility: "public",
      });
      expected.set(`#${t.number}] Outage ticket ${i}`, t.customer.email);
    }
    const writesDoneMs = Date.now() - outageStarted;
    await new Promise((resolve) => setTimeout(resolve, Math.max(0, 24 * HOUR_MS - (Date.now() - outageStarted))));

    const during = (
      await db.raw("select state, count(*)::int as n, max(retry_count) as attempts from pgboss.job where name = 'mail.send' group by state")
    ).rows as { state: string; n: number; attempts: number }[];
    const dead = Number((await db.raw("select count(*)::int as n from pgboss.job where name = 'mail.dead-letter'")).rows[0].n);
    expect(dead).toBe(0);
    expect(during.filter((r) => r.state === "completed")).toEqual([]);
    expect(during.reduce((sum, r) => sum + r.n, 0)).toBe(200);

    maildev = await startMailDev();
    const returned = Date.now();
    const delivered = await waitFor(async () => (await maildev!.mails()).length >= 200, { timeoutMs: 90_000 });
    const deliveryMs = Date.now() - returned;
    // A little longer: anything sent twice would show up now.
    await new Promise((resolve) => setTimeout(resolve, 3_000));
    const mails = await maildev.mails();
    const counts = new Map<string, number>();
    for (const [key, to] of expected)
      counts.set(key, mails.filter((m) => m.subject.endsWith(key) && m.to.some((a) => a.address === to)).length);
    const notOnce = [...counts].filter(([, n]) => n !== 1);
    const states = (await db.raw("select state, count(*)::int as n from pgboss.job where name = 'mail.send' group by state")).rows;
    report("smtp-outage", {
      writes: 200,
      mailsExpected: expected.size,
      outageSimulatedHours: 24,
      writesDoneAfterMs: writesDoneMs,
      attemptsDuringOutageMax: Math.max(...during.map((r) => r.attempts)) + 1,
      mailsDelivered: mails.length,
      deliveredWithinMs: deliveryMs,
      notExactlyOnce: notOnce.length,
      jobStates: states,
    });
    expect(delivered).toBe(true);
    expect(mails).toHaveLength(200);
    expect(notOnce).toEqual([]);
    expect(states).toEqual([{ state: "completed", n: 200 }]);
  });
});
