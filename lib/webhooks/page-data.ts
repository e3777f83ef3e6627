import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { isUuid } from "@/lib/ids/is-uuid";

import { findWebhook } from "./list-webhooks";

// The webhook pages' data: one lookup per request, shared by the segment's layout (the 404) and its page.

/** A webhook of this vendor for its admin page; null for a malformed id or another vendor's webhook. */
export const findAdminWebhook = cache(async (vendorSlug: string, webhookId: string) => {
  const { vendor } = await requirePageAccess(vendorSlug, "integrations.manage", `/${vendorSlug}/admin/integrations`);
  if (!isUuid(webhookId)) return null;
  const webhook = await findWebhook({ vendorId: vendor.id, webhookId });
  return webhook ? { vendor, webhook } : null;
});
