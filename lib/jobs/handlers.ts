import "server-only";

import { deliverSheetEvent, dispatchSheetEvent, SHEET_EVENT_DELIVERY_QUEUE } from "@/lib/events/dispatch-sheet-event";
import { SHEET_EVENTS_QUEUE } from "@/lib/events/sheet-events";
import { generateBatchJob } from "@/lib/families/generate-batch";
import { FAMILY_ALERTS_QUEUE } from "@/lib/families/publish-batch";
import { sendBatchAlertsJob } from "@/lib/families/send-batch-alerts";
import { FAMILY_GENERATE_QUEUE } from "@/lib/families/start-generation";
import { FIELD_DIGEST_CRON, FIELD_DIGEST_QUEUE, weeklyDigestJob } from "@/lib/field/digest-job";
import { FIELD_REFRESH_QUEUE, refreshFieldRollupsJob } from "@/lib/field/refresh-rollups";
import { MAIL_QUEUE, mailRetrySchedule } from "@/lib/mail/enqueue-mail";
import { DEAD_LETTER_CHECK_CRON, DEAD_LETTER_CHECK_QUEUE, deadLetterCheckJob } from "@/lib/mail/notify-dead-letters";
import { MAIL_SEND_CONCURRENCY } from "@/lib/mail/send-concurrency";
import { sendMailJob } from "@/lib/mail/send-mail-job";
import { cleanupUploadsJob, UPLOAD_CLEANUP_CRON, UPLOAD_CLEANUP_QUEUE } from "@/lib/storage/cleanup-uploads";
import { deliverWebhookJob } from "@/lib/webhooks/deliver-webhook";
import { pruneWebhookDeliveriesJob, WEBHOOK_PRUNE_CRON, WEBHOOK_PRUNE_QUEUE } from "@/lib/webhooks/prune-deliveries";
import { WEBHOOK_DELIVERY_QUEUE } from "@/lib/webhooks/queue-webhook-event";
import { reindexVendorJob, SEARCH_REINDEX_VENDOR_QUEUE } from "@/search/indexing/search-index-jobs";

import type { JobMeta } from "./job-meta";

export type JobHandler = (data: unknown, job: JobMeta) => Promise<void>;

// Every background job of the app, by queue name. Features add their queues here.
export const JOB_HANDLERS: Record<string, JobHandler> = {
  [MAIL_QUEUE]: sendMailJob,
  [SHEET_EVENTS_QUEUE]: dispatchSheetEvent,
  [SHEET_EVENT_DELIVERY_QUEUE]: deliverSheetEvent,
  [SEARCH_REINDEX_VENDOR_QUEUE]: reindexVendorJob,
  [FIELD_REFRESH_QUEUE]: refreshFieldRollupsJob,
  [FIELD_DIGEST_QUEUE]: weeklyDigestJob,
  [UPLOAD_CLEANUP_QUEUE]: cleanupUploadsJob,
  [DEAD_LETTER_CHECK_QUEUE]: deadLetterCheckJob,
  [WEBHOOK_DELIVERY_QUEUE]: deliverWebhookJob,
  [WEBHOOK_PRUNE_QUEUE]: pruneWebhookDeliveriesJob,
  [FAMILY_GENERATE_QUEUE]: generateBatchJob,
  [FAMILY_ALERTS_QUEUE]: sendBatchAlertsJob,
};

// Queues that also run on a clock (cron, UTC).
export const JOB_SCHEDULES: Record<string, string> = {
  // Views and adaptations only reach the rollup through this; outcomes and hand-offs also ask for a refresh.
  [FIELD_REFRESH_QUEUE]: "*/5 * * * *",
  [FIELD_DIGEST_QUEUE]: FIELD_DIGEST_CRON,
  [UPLOAD_CLEANUP_QUEUE]: UPLOAD_CLEANUP_CRON,
  [DEAD_LETTER_CHECK_QUEUE]: DEAD_LETTER_CHECK_CRON,
  [WEBHOOK_PRUNE_QUEUE]: WEBHOOK_PRUNE_CRON,
};

// Queues whose retries follow a capped exponential backoff over a long window (the rest use DEFAULT_JOB_OPTIONS).
export const JOB_RETRY_SCHEDULES: Record<string, () => { baseSeconds: number; capSeconds: number }> = {
  [MAIL_QUEUE]: mailRetrySchedule,
};

// Queues whose jobs of one batch run side by side (the rest run one after another, in the order fetched).
export const JOB_CONCURRENCY: Record<string, number> = {
  [MAIL_QUEUE]: MAIL_SEND_CONCURRENCY,
};
