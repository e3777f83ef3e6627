import "server-only";

import { mailMessageSchema } from "@/content-schema/mail";
import { db } from "@/lib/db/knex";

import { enqueueMail, MAIL_DEAD_LETTER_QUEUE } from "./enqueue-mail";

export type DeadLetter = { id: string; to: string; subject: string; failedAt: Date; error: string | null };
export type DeadLetterSummary = { count: number; oldest: Date | null; lastError: string | null };

type Row = { id: string; data: unknown; output: unknown; created_on: Date };

// pg-boss stores a failed job's error as the job's output: { message, stack } or { value: { message } }.
function errorOf(output: unknown): string | null {
  if (!output || typeof output !== "object") return null;
  const o = output as { message?: unknown; value?: { message?: unknown } };
  const message = typeof o.message === "string" ? o.message : typeof o.value?.message === "string" ? o.value.message : null;
  return message ? message.slice(0, 300) : null;
}

const waiting = () => db("pgboss.job").where({ name: MAIL_DEAD_LETTER_QUEUE, state: "created" });

/** Mail that failed for the whole retry window and waits for the operator, newest first. */
export async function listDeadLetters(limit = 50): Promise<DeadLetter[]> {
  const rows: Row[] = await waiting()
    .orderBy("created_on", "desc")
    .limit(limit)
    .select("id", "data", "output", "created_on")
    .catch((error: unknown) => {
      if (noSchema(error)) return [];
      throw error;
    });
  return rows.map((r) => {
    const mail = mailMessageSchema.partial().safeParse(r.data).data ?? {};
    return { id: r.id, to: mail.to ?? "?", subject: mail.subject ?? "?", failedAt: new Date(r.created_on), error: errorOf(r.output) };
  });
}

// Before the queue's first start there is no pgboss schema, and so no dead letters.
const noSchema = (error: unknown) => (error as { code?: string }).code === "42P01";

export async function summariseDeadLetters(): Promise<DeadLetterSummary> {
  try {
    return await summarise();
  } catch (error) {
    if (noSchema(error)) return { count: 0, oldest: null, lastError: null };
    throw error;
  }
}

async function summarise(): Promise<DeadLetterSummary> {
  const [agg] = await waiting().select(db.raw("count(*)::int as count"), db.raw("min(created_on) as oldest"));
  const [last] = await waiting().orderBy("created_on", "desc").limit(1).select("output");
  return { count: agg.count, oldest: agg.oldest ? new Date(agg.oldest) : null, lastError: last ? errorOf(last.output) : null };
}

/**
 * Send dead letters again, on a fresh retry schedule: one (by id) or all. Taking the letter off the list and
 * queueing its mail are one transaction, so a double click queues it once.
 */
export async function retryDeadLetters(id?: string): Promise<number> {
  return db.transaction(async (trx) => {
    const q = trx("pgboss.job").where({ name: MAIL_DEAD_LETTER_QUEUE, state: "created" });
    if (id) q.where({ id });
    const rows: { id: string; data: unknown }[] = await q.del().returning(["id", "data"]);
    for (const row of rows) {
      const mail = mailMessageSchema.safeParse(row.data);
      if (mail.success) await enqueueMail(trx, mail.data);
    }
    return rows.length;
  });
}

/** Drop dead letters for good: one (by id) or all. */
export async function discardDeadLetters(id?: string): Promise<number> {
  const q = waiting();
  if (id) q.where({ id });
  return q.del();
}
