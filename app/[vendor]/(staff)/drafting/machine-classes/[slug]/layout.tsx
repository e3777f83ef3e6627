import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findDraftingMachineClass } from "@/lib/catalogue/page-data";

export default async function ItemLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; slug: string }> }) {
  const { vendor, slug } = await params;
  if (!(await findDraftingMachineClass(vendor, slug))) notFound();
  return children;
}
