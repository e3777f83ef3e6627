import net from "node:net";
import { SMTPServer } from "smtp-server";
import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";

// A local SMTP sink we stop and start ourselves; the transport is pointed at it before first use.
async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

function startSink(port: number, received: string[]): Promise<SMTPServer> {
  const sink = new SMTPServer({
    authOptional: true,
    disabledCommands: ["AUTH", "STARTTLS"],
    onData(stream, _session, callback) {
      let raw = "";
      stream.on("data", (c: Buffer) => (raw += c.toString()));
      stream.on("end", () => {
        received.push(raw);
        callback();
      });
    },
  });
  return new Promise((resolve) => sink.listen(port, "127.0.0.1", () => resolve(sink)));
}

const jobState = async (subject: string) =>
  (await db.raw("select state, retry_count from pgboss.job where name = 'mail.send' and data->>'subject' = ?", [subject])).rows[0] as
    { state: string; retry_count: number } | undefined;

let stopBoss: (() => Promise<void>) | null = null;
afterAll(async () => {
  await stopBoss?.();
});

describe("mail while SMTP is down", () => {
  it("keeps the job and delivers it once SMTP is back", { timeout: 120_000 }, async () => {
    const port = await freePort();
    process.env.SMTP_PORT = String(port);
    // The schedule shortened by configuration: retries after 1 s, 2 s, 2 s, ...
    Object.assign(process.env, { MAIL_RETRY_BASE_SECONDS: "1", MAIL_RETRY_CAP_SECONDS: "2" });
    const { enqueueMail } = await import("@/lib/mail/enqueue-mail");
    const { startWorker } = await import("@/lib/jobs/start-worker");
    const { getBoss } = await import("@/lib/jobs/boss");
    stopBoss = async () => (await getBoss()).stop({ graceful: false, wait: true });

    // Mails queued by earlier test files of this run would be tried first; this test is about its own job.
    await getBoss();
    await db.raw("delete from pgboss.job where name = 'mail.send'");
    const subject = `Outage test ${port}`;
    await enqueueMail(db, { to: "maker@example.test", subject, text: "Your ticket has a reply." });
    await startWorker();

    // SMTP is down: the first attempt fails and the job waits for a retry instead of being lost.
    await expect.poll(async () => (await jobState(subject))?.state, { timeout: 30_000, interval: 500 }).toBe("retry");

    const received: string[] = [];
    const sink = await startSink(port, received);
    try {
      await expect.poll(() => received.some((raw) => raw.includes(subject)), { timeout: 90_000, interval: 500 }).toBe(true);
      await expect.poll(async () => (await jobState(subject))?.state, { timeout: 10_000, interval: 500 }).toBe("completed");
      expect(received.filter((raw) => raw.includes(subject))).toHaveLength(1);
    } finally {
      await new Promise<void>((resolve) => sink.close(() => resolve()));
    }
  });
});
