import "server-only";

import { db } from "@/lib/db/knex";
import { appUrl } from "@/lib/http/app-url";

import { summariseDeadLetters } from "./dead-letters";
import { enqueueMail, MAIL_DEAD_LETTER_QUEUE } from "./enqueue-mail";

export const DEAD_LETTER_CHECK_QUEUE = "mail.dead-letter-check";
export const DEAD_LETTER_CHECK_CRON = "*/10 * * * *";

/**
 * One summary mail to the platform operators when the dead-letter list has grown since they were last told;
 * nothing while it stays the same or shrinks. The notice row and the mail commit together.
 */
export async function notifyDeadLetters(): Promise<boolean> {
  const summary = await summariseDeadLetters();
  return db.transaction(async (trx) => {
    await trx("dead_letter_notices").insert({ queue: MAIL_DEAD_LETTER_QUEUE, notified_count: 0 }).onConflict("queue").ignore();
    const notice = await trx("dead_letter_notices")
      .where({ queue: MAIL_DEAD_LETTER_QUEUE })
      .forUpdate()
      .first<{ notified_count: number }>("notified_count");
    if (summary.count <= notice.notified_count) {
      if (summary.count < notice.notified_count)
        await trx("dead_letter_notices").where({ queue: MAIL_DEAD_LETTER_QUEUE }).update({ notified_count: summary.count });
      return false;
    }
    const operators: { email: string }[] = await trx("users").where({ is_operator: true }).select("email");
    const text = [
      `${summary.count} e-mail(s) could not be delivered after retrying for the whole retry window (${summary.count - notice.notified_count} new since the last notice).`,
      summary.oldest ? `Oldest: ${summary.oldest.toISOString()}.` : "",
      summary.lastError ? `Last error: ${summary.lastError}` : "",
      "",
      `Retry or discard them on the operator page: ${appUrl("/operator")}`,
    ].join("\n");
    for (const { email } of operators) {
      await enqueueMail(
        trx,
        { to: email, subject: `Swarfbook: ${summary.count} undelivered e-mail(s)`, text },
        { key: `dead-letters:${summary.count}:${summary.oldest?.toISOString()}` },
      );
    }
    await trx("dead_letter_notices")
      .where({ queue: MAIL_DEAD_LETTER_QUEUE })
      .update({ notified_count: summary.count, notified_at: trx.fn.now() });
    return true;
  });
}

export async function deadLetterCheckJob(): Promise<void> {
  await notifyDeadLetters();
}
