import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadCutter } from "@/components/catalogue/load-drafting-item";

export default async function CutterLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; sku: string }> }) {
  const { vendor, sku } = await params;
  if (!(await loadCutter(vendor, sku))) notFound();
  return children;
}
