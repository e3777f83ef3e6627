import "server-only";

import type { SheetEventSubscriber } from "@/lib/events/sheet-events";

import { sendChangeAlerts } from "./send-change-alerts";

export const changeAlertSubscriber: SheetEventSubscriber = {
  name: "bench.change-alerts",
  handle: async (event) => {
    await sendChangeAlerts(event);
  },
};
