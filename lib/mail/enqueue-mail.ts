import "server-only";

import { enqueue } from "@/lib/jobs/enqueue";

import { type MailMessage, mailMessageSchema } from "./mail-schema";

export const MAIL_QUEUE = "mail.send";

/** Queue an e-mail; it is sent by the worker with retries, so an SMTP outage loses nothing. */
export async function enqueueMail(message: MailMessage): Promise<void> {
  await enqueue(MAIL_QUEUE, mailMessageSchema.parse(message));
}
