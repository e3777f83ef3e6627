import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { z } from "zod";

import { requirePageAccess } from "@/lib/auth/page-access";
import { db } from "@/lib/db/knex";

// The ticket must belong to this vendor: checked above the loading boundary so a miss is a real 404.
export default async function DeskTicketLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; ticket: string }> }) {
  const { vendor: slug, ticket } = await params;
  const { vendor } = await requirePageAccess(slug, "desk.use", `/${slug}/desk`);
  const id = z.uuid().safeParse(ticket).data;
  const row = id ? await db("tickets").where({ id, vendor_id: vendor.id }).first("id") : null;
  if (!row) notFound();
  return children;
}
