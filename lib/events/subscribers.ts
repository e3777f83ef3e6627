import "server-only";

import { changeAlertSubscriber } from "@/lib/bench/change-alert-subscriber";
import { fieldRefreshSubscriber } from "@/lib/field/field-refresh-subscriber";
import { webhookSheetSubscriber } from "@/lib/webhooks/webhook-sheet-subscriber";
import { searchIndexSubscriber } from "@/search/indexing/search-index-jobs";

import type { SheetEventSubscriber } from "./sheet-events";

// Each feature that reacts to sheet events adds one entry here.
export const SHEET_EVENT_SUBSCRIBERS: SheetEventSubscriber[] = [
  searchIndexSubscriber,
  changeAlertSubscriber,
  fieldRefreshSubscriber,
  webhookSheetSubscriber,
];
