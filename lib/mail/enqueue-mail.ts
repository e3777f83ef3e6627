import "server-only";

import type { Knex } from "knex";

import { mailMessageSchema, type MailMessage } from "@/content-schema/mail";
import { retriesToCover } from "@/lib/jobs/backoff";
import { enqueue, ensureQueue } from "@/lib/jobs/enqueue";

export const MAIL_QUEUE = "mail.send";
/** Mail that failed for the whole retry window waits here for the operator (/operator). */
export const MAIL_DEAD_LETTER_QUEUE = "mail.dead-letter";

const seconds = (name: string, fallback: number) => {
  const value = Number(process.env[name]);
  return Number.isFinite(value) && value >= 1 ? Math.round(value) : fallback;
};

/**
 * Waits between attempts double from the base up to the cap, and attempts go on for the whole window
 * (50 hours by default, so an SMTP outage of two days loses nothing). Shortened by configuration in tests.
 */
export function mailRetrySchedule() {
  return {
    baseSeconds: seconds("MAIL_RETRY_BASE_SECONDS", 60),
    capSeconds: seconds("MAIL_RETRY_CAP_SECONDS", 3_600),
    windowSeconds: seconds("MAIL_RETRY_WINDOW_SECONDS", 50 * 3_600),
  };
}

type Options = {
  /** The mail's identity for its purpose, e.g. `reply:<message id>:<recipient>`: one key, one mail. */
  key?: string;
};

/**
 * Queue an e-mail inside the caller's transaction: it is queued if and only if the write commits,
 * and the worker sends it with retries, so an SMTP outage loses nothing.
 */
export async function enqueueMail(trx: Knex | Knex.Transaction, message: MailMessage, { key }: Options = {}): Promise<string | null> {
  const schedule = mailRetrySchedule();
  await ensureQueue(MAIL_DEAD_LETTER_QUEUE);
  return enqueue(trx, MAIL_QUEUE, mailMessageSchema.parse(message), {
    key: key ? `${key}:${message.to.toLowerCase()}` : undefined,
    retryLimit: retriesToCover(schedule),
    retryDelay: schedule.baseSeconds,
    retryBackoff: false,
    deadLetter: MAIL_DEAD_LETTER_QUEUE,
    // Kept long enough to outlive the retry window.
    retentionSeconds: schedule.windowSeconds * 2 + 7 * 86_400,
  });
}
