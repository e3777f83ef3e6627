import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findDeskTicket } from "@/lib/tickets/page-data";

// The ticket must belong to this vendor: checked above the loading boundary so a miss is a real 404.
export default async function DeskTicketLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; ticket: string }>;
}) {
  const { vendor: slug, ticket } = await params;
  if (!(await findDeskTicket(slug, ticket))) notFound();
  return children;
}
