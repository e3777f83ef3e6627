import net from "node:net";
import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { createUser, uniq } from "@/tests/factories/foundation";

// A port nobody listens on: every SMTP attempt fails at once.
async function closedPort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

let stop: (() => Promise<void>) | null = null;
afterAll(async () => {
  await stop?.();
});

const mailTo = async (to: string) =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [to])).rows as {
    data: { subject: string; text: string };
  }[];

describe("dead letters", () => {
  it(
    "mail that fails for the whole window waits for the operator, who hears once per growth and can retry or discard",
    { timeout: 90_000 },
    async () => {
      process.env.SMTP_PORT = String(await closedPort());
      // A window of 3 s: waits of 1 s and 2 s, then the letter is dead.
      Object.assign(process.env, {
        MAIL_RETRY_BASE_SECONDS: "1",
        MAIL_RETRY_CAP_SECONDS: "2",
        MAIL_RETRY_WINDOW_SECONDS: "3",
        JOBS_POLL_SECONDS: "0.5",
      });
      const { enqueueMail } = await import("@/lib/mail/enqueue-mail");
      const { startWorker } = await import("@/lib/jobs/start-worker");
      const { stopBoss } = await import("@/lib/jobs/boss");
      const { discardDeadLetters, listDeadLetters, retryDeadLetters, summariseDeadLetters } = await import("@/lib/mail/dead-letters");
      const { notifyDeadLetters } = await import("@/lib/mail/notify-dead-letters");
      stop = stopBoss;
      const operator = await createUser({ isOperator: true });

      // Mail queued by earlier test files in this database would be worked first and hold these two back.
      if ((await db.raw("select to_regclass('pgboss.job') as t")).rows[0].t)
        await db.raw("delete from pgboss.job where name = 'mail.send' and state in ('created', 'retry')");
      const first = `${uniq("dead")}@example.test`;
      const second = `${uniq("dead")}@example.test`;
      await enqueueMail(db, { to: first, subject: "Your reply", text: "One." });
      await enqueueMail(db, { to: second, subject: "Your reply", text: "Two." });
      await startWorker();
      await expect
        .poll(async () => (await listDeadLetters()).filter((l) => l.to === first || l.to === second).length, {
          timeout: 60_000,
          interval: 500,
        })
        .toBe(2);

      const summary = await summariseDeadLetters();
      expect(summary.count).toBeGreaterThanOrEqual(2);
      expect(summary.lastError).toMatch(/ECONNREFUSED|connect/i);
      // Three attempts (the first and two retries), then dead: nothing sent, nothing lost.
      const attempts = (await db.raw("select retry_count from pgboss.job where name = 'mail.send' and data->>'to' = ?", [first])).rows[0]
        .retry_count;
      expect(attempts).toBe(2);

      expect(await notifyDeadLetters()).toBe(true);
      expect(await notifyDeadLetters()).toBe(false);
      const notices = await mailTo(operator.email);
      expect(notices).toHaveLength(1);
      expect(notices[0].data.text).toContain("Retry or discard them on the operator page");

      const letters = await listDeadLetters();
      const mine = letters.find((l) => l.to === first)!;
      expect(await retryDeadLetters(mine.id)).toBe(1);
      expect(await retryDeadLetters(mine.id)).toBe(0);
      expect((await mailTo(first)).length).toBe(2);
      const other = letters.find((l) => l.to === second)!;
      expect(await discardDeadLetters(other.id)).toBe(1);
      expect((await listDeadLetters()).some((l) => l.id === mine.id || l.id === other.id)).toBe(false);
      // The list shrank: no notice; it must grow past the last notice again before the operator hears more.
      expect(await notifyDeadLetters()).toBe(false);
    },
  );
});
