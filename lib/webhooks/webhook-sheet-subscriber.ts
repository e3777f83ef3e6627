import "server-only";

import { db } from "@/lib/db/knex";
import type { SheetEventSubscriber } from "@/lib/events/sheet-events";
import { appUrl } from "@/lib/http/app-url";
import { jobIdFor } from "@/lib/jobs/enqueue";

import { queueWebhookEvent } from "./queue-webhook-event";

type VersionRow = {
  number: number;
  title: string;
  published_at: Date | null;
  withdrawn_reason: string | null;
  slug: string;
  vendor_slug: string;
};

async function version(vendorId: string, versionId: string): Promise<VersionRow | undefined> {
  return db("sheet_versions as v")
    .join("sheets as s", (j) => j.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id"))
    .join("vendors as vd", "vd.id", "v.vendor_id")
    .where({ "v.id": versionId, "v.vendor_id": vendorId })
    .first<VersionRow | undefined>("v.number", "v.title", "v.published_at", "v.withdrawn_reason", "s.slug", "vd.slug as vendor_slug");
}

const ref = (v: VersionRow) => ({
  sheet: v.slug,
  version: v.number,
  title: v.title,
  url: appUrl(`/${v.vendor_slug}/library/${v.slug}/v/${v.number}`),
});
// A retried subscriber job must not make a second event: the id follows from what happened.
const eventId = (type: string, versionId: string) => jobIdFor("webhook-event", `${type}:${versionId}`);

/** Sheet events become webhook deliveries (sheet.published, sheet.superseded, sheet.withdrawn). */
export const webhookSheetSubscriber: SheetEventSubscriber = {
  name: "webhooks.sheets",
  handle: async (event) => {
    if (event.type === "catalogue.changed") return;
    const hooked = await db("webhooks").where({ vendor_id: event.vendorId }).first("id");
    if (!hooked) return;
    const current = await version(event.vendorId, event.versionId);
    if (!current) return;
    await db.transaction(async (trx) => {
      if (event.type === "version.withdrawn") {
        await queueWebhookEvent(trx, {
          vendorId: event.vendorId,
          type: "sheet.withdrawn",
          eventId: eventId("sheet.withdrawn", event.versionId),
          data: { ...ref(current), reason: current.withdrawn_reason },
        });
        return;
      }
      const previous = event.supersededVersionId ? await version(event.vendorId, event.supersededVersionId) : undefined;
      await queueWebhookEvent(trx, {
        vendorId: event.vendorId,
        type: "sheet.published",
        eventId: eventId("sheet.published", event.versionId),
        data: { ...ref(current), publishedAt: (current.published_at ?? new Date()).toISOString(), supersedes: previous?.number ?? null },
      });
      if (previous && event.supersededVersionId) {
        await queueWebhookEvent(trx, {
          vendorId: event.vendorId,
          type: "sheet.superseded",
          eventId: eventId("sheet.superseded", event.supersededVersionId),
          data: { ...ref(previous), supersededBy: current.number },
        });
      }
    });
  },
};
