import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { recordOutcome } from "@/lib/bench/outcomes";
import { db } from "@/lib/db/knex";
import { isDatabaseUnavailable } from "@/lib/db/unavailable";
import { errorResponse } from "@/lib/http/error-response";
import { addCustomerMessage } from "@/lib/tickets/add-message";
import { createTicket } from "@/lib/tickets/create-ticket";
import { createBenchSheet } from "@/tests/factories/bench";
import { createFieldCustomer } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

import { emptyQueue, faultPg, report, startMailDev, waitFor, type MailDev } from "./support/services";

Object.assign(process.env, { MAIL_RETRY_BASE_SECONDS: "1", MAIL_RETRY_CAP_SECONDS: "2" });

let maildev: MailDev | null = null;
let stopBoss: (() => Promise<void>) | null = null;
afterAll(async () => {
  faultPg("start");
  await maildev?.stop();
  await stopBoss?.();
});

type Kind = "ticket" | "reply" | "outcome";
type Attempt = { kind: Kind; key: string; body: string; ok: boolean; id?: string; status?: number };

describe("fault: PostgreSQL stopped and started under a write load", () => {
  it("keeps every acknowledged write, loses or doubles nothing, and runs each committed write's jobs once", async () => {
    await emptyQueue();
    const { startWorker } = await import("@/lib/jobs/start-worker");
    stopBoss = (await import("@/lib/jobs/boss")).stopBoss;
    maildev = await startMailDev();
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const sheet = await createBenchSheet(v.id);
    const field = await createFieldCustomer(v.id);
    const setups = await db("setups")
      .insert(
        Array.from({ length: 5 }, () => ({
          vendor_id: v.id,
          user_id: field.userId,
          machine_id: field.machineId,
          sheet_version_id: sheet.versionId,
          result: "{}",
        })),
      )
      .returning("id");
    const firstTicket = await createTicket({
      vendor,
      customerId: customer.user.id,
      input: { subject: "Load base", body: "Base.", idempotencyKey: randomUUID(), attachmentIds: [] },
    });
    await startWorker();

    const write = (a: Attempt) => {
      if (a.kind === "ticket")
        return createTicket({
          vendor,
          customerId: customer.user.id,
          input: { subject: a.body, body: a.body, idempotencyKey: a.key, attachmentIds: [] },
        });
      if (a.kind === "reply")
        return addCustomerMessage({
          vendorId: v.id,
          ticketId: firstTicket.id,
          authorId: customer.user.id,
          body: a.body,
          idempotencyKey: a.key,
        });
      return recordOutcome({
        vendorId: v.id,
        userId: field.userId,
        setupId: setups[parseInt(a.key.slice(-1), 16) % setups.length].id,
        fields: { result: "worked_as_written", changes: {}, notes: a.body },
        idempotencyKey: a.key,
      });
    };
    const attempts: Attempt[] = [];
    const started = Date.now();
    const loadMs = 14_000;
    // Bounded in count as well as time, and paced like people at keyboards: on a fast, quiet machine an unpaced
    // loop makes more mail than the worker delivers within the wait below, which says nothing about the restart.
    const maxAttempts = 600;
    const pauseMs = 100;
    let n = 0;
    const client = async () => {
      while (Date.now() - started < loadMs && attempts.length < maxAttempts) {
        const kind: Kind = (["ticket", "reply", "outcome"] as const)[n % 3];
        const key = randomUUID();
        const attempt: Attempt = { kind, key, body: `Load ${kind} ${n++} ${key}`, ok: false };
        attempts.push(attempt);
        try {
          attempt.id = (await write(attempt)).id;
          attempt.ok = true;
          await new Promise((resolve) => setTimeout(resolve, pauseMs));
        } catch (error) {
          // What the API would have answered: a restart must read as "try again", not as a failure.
          attempt.status = errorResponse(error).status;
          if (!isDatabaseUnavailable(error)) console.error("[fault] unexpected", error);
          await new Promise((resolve) => setTimeout(resolve, 200));
        }
      }
    };
    const restart = (async () => {
      await new Promise((resolve) => setTimeout(resolve, 4_000));
      faultPg("stop");
      const stoppedAt = Date.now();
      await new Promise((resolve) => setTimeout(resolve, 3_000));
      faultPg("start");
      return Date.now() - stoppedAt;
    })();
    await Promise.all([client(), client(), client(), client(), restart]);
    const downMs = await restart;

    const acknowledged = attempts.filter((a) => a.ok);
    const failed = attempts.filter((a) => !a.ok);
    // Every write that answered an error is resubmitted with its key, as a client would: it is then either
    // made now (it had not committed) or returned as the one that had (it committed, the answer was lost).
    let returnedByKey = 0;
    let madeOnResubmit = 0;
    for (const a of failed) {
      const again = await write(a);
      if ("created" in again && again.created === false) returnedByKey++;
      else madeOnResubmit++;
      a.id = again.id;
    }
    const table: Record<Kind, { table: string; column: string }> = {
      ticket: { table: "tickets", column: "subject" },
      reply: { table: "ticket_messages", column: "body" },
      outcome: { table: "outcomes", column: "notes" },
    };
    let missing = 0;
    let doubled = 0;
    for (const a of attempts) {
      const rows = await db(table[a.kind].table)
        .where({ vendor_id: v.id, [table[a.kind].column]: a.body })
        .select("id");
      if (rows.length === 0) missing++;
      if (rows.length > 1) doubled++;
      if (a.ok && rows[0]?.id !== a.id) missing++;
    }

    // Jobs: one mail to the support team per ticket and per customer reply (the one support member).
    const mailWrites = attempts.filter((a) => a.kind !== "outcome");
    const expectedMails = mailWrites.length + 1; // and the base ticket's
    const allMailed = await waitFor(async () => (await maildev!.mails()).length >= expectedMails, { timeoutMs: 120_000 });
    await new Promise((resolve) => setTimeout(resolve, 3_000));
    const mails = await maildev.mails();
    let mailNotOnce = 0;
    for (const a of mailWrites) {
      const mine = mails.filter((m) => m.text.includes(a.body) || m.subject.includes(a.body));
      if (mine.length !== 1 || !mine[0].to.some((t) => t.address === support.user.email)) mailNotOnce++;
    }
    const refreshJobs = Number((await db.raw("select count(*)::int as n from pgboss.job where name = 'field.refresh-rollups'")).rows[0].n);

    report("postgres-restart", {
      writes: attempts.length,
      acknowledged: acknowledged.length,
      answeredError: failed.length,
      errorStatuses: [...new Set(failed.map((a) => a.status))],
      returnedByKeyOnResubmit: returnedByKey,
      madeOnResubmit,
      postgresDownMs: downMs,
      missing,
      doubled,
      mailsExpected: expectedMails,
      mailsDelivered: mails.length,
      mailsNotExactlyOnce: mailNotOnce,
      rollupRefreshJobs: refreshJobs,
    });
    expect(failed.length).toBeGreaterThan(0);
    expect(failed.every((a) => a.status === 503)).toBe(true);
    expect(missing).toBe(0);
    expect(doubled).toBe(0);
    expect(allMailed).toBe(true);
    expect(mails).toHaveLength(expectedMails);
    expect(mailNotOnce).toBe(0);
    expect(refreshJobs).toBeGreaterThan(0);
  });
});
