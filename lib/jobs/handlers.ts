import "server-only";

import { MAIL_QUEUE } from "@/lib/mail/enqueue-mail";
import { sendMailJob } from "@/lib/mail/send-mail-job";

export type JobHandler = (data: unknown) => Promise<void>;

// Every background job of the app, by queue name. Features add their queues here.
export const JOB_HANDLERS: Record<string, JobHandler> = {
  [MAIL_QUEUE]: sendMailJob,
};
