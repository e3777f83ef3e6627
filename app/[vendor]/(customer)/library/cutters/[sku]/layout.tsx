import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadLibraryCutter } from "@/components/library/load-library-cutter";

export default async function CutterLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; sku: string }>;
}) {
  const { vendor, sku } = await params;
  if (!(await loadLibraryCutter(vendor, sku))) notFound();
  return children;
}
