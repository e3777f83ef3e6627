import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadFamily } from "@/components/families/load-family";

export default async function FamilyLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; family: string }>;
}) {
  const { vendor, family } = await params;
  if (!(await loadFamily(vendor, family))) notFound();
  return children;
}
