import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findCustomerTicket } from "@/lib/tickets/page-data";

// The ticket must be this customer's, in this vendor: checked here so a miss is a real 404.
export default async function CustomerTicketLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; ticket: string }>;
}) {
  const { vendor: slug, ticket } = await params;
  if (!(await findCustomerTicket(slug, ticket))) notFound();
  return children;
}
