import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findLibraryCutterPage } from "@/components/library/find-library-cutter-page";

export default async function CutterLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; sku: string }>;
}) {
  const { vendor, sku } = await params;
  if (!(await findLibraryCutterPage(vendor, sku))) notFound();
  return children;
}
