import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadDraftingSheet } from "@/components/drafting/load-drafting-sheet";

export default async function DraftingSheetLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; slug: string }> }) {
  const { vendor, slug } = await params;
  if (!(await loadDraftingSheet(vendor, slug))) notFound();
  return children;
}
