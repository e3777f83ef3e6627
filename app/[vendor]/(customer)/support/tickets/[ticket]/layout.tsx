import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";

import { requirePageAccess } from "@/lib/auth/page-access";
import { db } from "@/lib/db/knex";

// The ticket must be this customer's, in this vendor: checked here so a miss is a real 404.
export default async function CustomerTicketLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; ticket: string }> }) {
  const { vendor: slug, ticket } = await params;
  const { vendor, user } = await requirePageAccess(slug, "support.use", `/${slug}/support`);
  const id = z.uuid().safeParse(ticket).data;
  const row = id ? await db("tickets").where({ id, vendor_id: vendor.id, customer_id: user!.id }).first("id") : null;
  if (!row) notFound();
  return children;
}
