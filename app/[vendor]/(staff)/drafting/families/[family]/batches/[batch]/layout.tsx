import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadBatch } from "@/components/families/load-family";

export default async function BatchLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; family: string; batch: string }>;
}) {
  const { vendor, family, batch } = await params;
  if (!(await loadBatch(vendor, family, batch))) notFound();
  return children;
}
