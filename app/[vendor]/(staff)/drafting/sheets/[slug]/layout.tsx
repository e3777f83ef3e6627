import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findDraftingSheetPage } from "@/lib/sheets/page-data";

export default async function DraftingSheetLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; slug: string }>;
}) {
  const { vendor, slug } = await params;
  if (!(await findDraftingSheetPage(vendor, slug))) notFound();
  return children;
}
