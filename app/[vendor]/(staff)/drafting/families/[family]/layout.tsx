import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findDraftingFamily } from "@/lib/families/page-data";

export default async function FamilyLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; family: string }>;
}) {
  const { vendor, family } = await params;
  if (!(await findDraftingFamily(vendor, family))) notFound();
  return children;
}
