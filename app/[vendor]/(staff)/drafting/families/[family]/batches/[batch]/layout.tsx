import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findFamilyBatch } from "@/lib/families/page-data";

export default async function BatchLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; family: string; batch: string }>;
}) {
  const { vendor, family, batch } = await params;
  if (!(await findFamilyBatch(vendor, family, batch))) notFound();
  return children;
}
