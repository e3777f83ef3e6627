import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { createTicket } from "@/lib/tickets/create-ticket";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

import { emptyQueue, faultPg, report, startMailDev, waitFor, type MailDev } from "./support/services";

let maildev: MailDev | null = null;
let stopBoss: (() => Promise<void>) | null = null;
afterAll(async () => {
  faultPg("start");
  await maildev?.stop();
  await stopBoss?.();
});

describe("fault: the queue cannot start at boot", () => {
  it("keeps trying, and work flows once the database is back, without a restart", async () => {
    await emptyQueue();
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    maildev = await startMailDev();
    const boss = await import("@/lib/jobs/boss");
    stopBoss = boss.stopBoss;
    const { startWorker } = await import("@/lib/jobs/start-worker");

    // Boot with the database down: the queue's start fails...
    faultPg("stop");
    const worker = startWorker();
    await expect(boss.getBoss()).rejects.toThrow();
    const whileDown = boss.queueState();
    expect(whileDown.state).toBe("failing");

    // ...and the database comes back. Nothing is restarted: the same process picks up.
    faultPg("start");
    const upAgain = Date.now();
    const workerRunning = await Promise.race([worker.then(() => true), new Promise<boolean>((r) => setTimeout(() => r(false), 60_000))]);
    const workerAfterMs = Date.now() - upAgain;
    // The next use of the queue starts it again instead of repeating the old failure.
    const afterRecovery = boss.queueState();

    const subject = `After recovery ${randomUUID().slice(0, 8)}`;
    await createTicket({
      vendor,
      customerId: customer.user.id,
      input: { subject, body: "Queued after the queue came back.", idempotencyKey: randomUUID(), attachmentIds: [] },
    });
    const delivered = await waitFor(async () => (await maildev!.mails()).some((m) => m.subject.includes(subject)), { timeoutMs: 30_000 });
    const mails = (await maildev.mails()).filter((m) => m.subject.includes(subject));

    report("queue-start", {
      startAttemptsWhileDown: whileDown.attempts,
      lastErrorWhileDown: whileDown.lastError,
      workerRunningAfterMs: workerAfterMs,
      stateAfterRecovery: afterRecovery.state,
      mailsDelivered: mails.length,
    });
    expect(workerRunning).toBe(true);
    expect(afterRecovery.state).toBe("ready");
    expect(delivered).toBe(true);
    expect(mails).toHaveLength(1);
    expect(mails[0].to[0].address).toBe(support.user.email);
  });
});
