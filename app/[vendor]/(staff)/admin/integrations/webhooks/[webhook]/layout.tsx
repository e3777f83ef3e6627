import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";

import { requirePageAccess } from "@/lib/auth/page-access";
import { db } from "@/lib/db/knex";

// The webhook must belong to this vendor: checked above the loading boundary so a miss is a real 404.
export default async function WebhookLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; webhook: string }>;
}) {
  const { vendor: slug, webhook } = await params;
  const { vendor } = await requirePageAccess(slug, "integrations.manage", `/${slug}/admin/integrations`);
  const id = z.uuid().safeParse(webhook).data;
  const row = id ? await db("webhooks").where({ id, vendor_id: vendor.id }).first("id") : null;
  if (!row) notFound();
  return children;
}
