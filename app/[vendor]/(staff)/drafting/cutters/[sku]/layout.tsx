import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findDraftingCutter } from "@/lib/catalogue/page-data";

export default async function CutterLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; sku: string }>;
}) {
  const { vendor, sku } = await params;
  if (!(await findDraftingCutter(vendor, sku))) notFound();
  return children;
}
