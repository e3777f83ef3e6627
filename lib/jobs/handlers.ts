import "server-only";

import { FIELD_DIGEST_CRON, FIELD_DIGEST_QUEUE, weeklyDigestJob } from "@/lib/field/send-digest";
import { FIELD_REFRESH_QUEUE, refreshFieldRollupsJob } from "@/lib/field/refresh-rollups";
import { deliverSheetEvent, dispatchSheetEvent, SHEET_EVENT_DELIVERY_QUEUE } from "@/lib/events/dispatch-sheet-event";
import { SHEET_EVENTS_QUEUE } from "@/lib/events/sheet-events";
import { MAIL_QUEUE } from "@/lib/mail/enqueue-mail";
import { sendMailJob } from "@/lib/mail/send-mail-job";
import { cleanupUploadsJob, UPLOAD_CLEANUP_CRON, UPLOAD_CLEANUP_QUEUE } from "@/lib/storage/cleanup-uploads";
import { reindexVendorJob, SEARCH_REINDEX_VENDOR_QUEUE } from "@/search/indexing/search-index-jobs";

export type JobHandler = (data: unknown) => Promise<void>;

// Every background job of the app, by queue name. Features add their queues here.
export const JOB_HANDLERS: Record<string, JobHandler> = {
  [MAIL_QUEUE]: sendMailJob,
  [SHEET_EVENTS_QUEUE]: dispatchSheetEvent,
  [SHEET_EVENT_DELIVERY_QUEUE]: deliverSheetEvent,
  [SEARCH_REINDEX_VENDOR_QUEUE]: reindexVendorJob,
  [FIELD_REFRESH_QUEUE]: refreshFieldRollupsJob,
  [FIELD_DIGEST_QUEUE]: weeklyDigestJob,
  [UPLOAD_CLEANUP_QUEUE]: cleanupUploadsJob,
};

// Queues that also run on a clock (cron, UTC).
export const JOB_SCHEDULES: Record<string, string> = {
  // Views and adaptations only reach the rollup through this; outcomes and hand-offs also ask for a refresh.
  [FIELD_REFRESH_QUEUE]: "*/5 * * * *",
  [FIELD_DIGEST_QUEUE]: FIELD_DIGEST_CRON,
  [UPLOAD_CLEANUP_QUEUE]: UPLOAD_CLEANUP_CRON,
};
