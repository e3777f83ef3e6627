import "server-only";

import { mailMessageSchema } from "@/content-schema/mail";

import { MAIL_FROM, mailTransport } from "./transport";

export async function sendMailJob(data: unknown): Promise<void> {
  const message = mailMessageSchema.parse(data);
  await mailTransport().sendMail({ from: MAIL_FROM, ...message });
}
