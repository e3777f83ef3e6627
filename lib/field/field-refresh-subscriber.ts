import "server-only";

import { db } from "@/lib/db/knex";
import type { SheetEventSubscriber } from "@/lib/events/sheet-events";

import { scheduleFieldRefresh } from "./refresh-rollups";

/** A version published, superseded or withdrawn changes what Field results lists: refresh soon. */
export const fieldRefreshSubscriber: SheetEventSubscriber = {
  name: "field-refresh",
  handle: async (event) => {
    if (event.type === "version.published" || event.type === "version.withdrawn") await scheduleFieldRefresh(db);
  },
};
