import "server-only";

import { deliverSheetEvent, dispatchSheetEvent, SHEET_EVENT_DELIVERY_QUEUE } from "@/lib/events/dispatch-sheet-event";
import { SHEET_EVENTS_QUEUE } from "@/lib/events/sheet-events";
import { MAIL_QUEUE } from "@/lib/mail/enqueue-mail";
import { sendMailJob } from "@/lib/mail/send-mail-job";
import { reindexVendorJob, SEARCH_REINDEX_VENDOR_QUEUE } from "@/search/indexing/search-index-jobs";

export type JobHandler = (data: unknown) => Promise<void>;

// Every background job of the app, by queue name. Features add their queues here.
export const JOB_HANDLERS: Record<string, JobHandler> = {
  [MAIL_QUEUE]: sendMailJob,
  [SHEET_EVENTS_QUEUE]: dispatchSheetEvent,
  [SHEET_EVENT_DELIVERY_QUEUE]: deliverSheetEvent,
  [SEARCH_REINDEX_VENDOR_QUEUE]: reindexVendorJob,
};
