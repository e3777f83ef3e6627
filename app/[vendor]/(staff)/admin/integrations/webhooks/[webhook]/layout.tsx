import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findAdminWebhook } from "@/lib/webhooks/page-data";

// The webhook must belong to this vendor: checked above the loading boundary so a miss is a real 404.
export default async function WebhookLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; webhook: string }>;
}) {
  const { vendor: slug, webhook } = await params;
  if (!(await findAdminWebhook(slug, webhook))) notFound();
  return children;
}
