import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadMaterial } from "@/components/catalogue/load-drafting-item";

export default async function ItemLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; slug: string }> }) {
  const { vendor, slug } = await params;
  if (!(await loadMaterial(vendor, slug))) notFound();
  return children;
}
