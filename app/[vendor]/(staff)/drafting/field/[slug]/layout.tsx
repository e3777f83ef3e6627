import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findFieldSheetPage } from "@/lib/field/page-data";

// The sheet is looked up here, above loading.tsx: a notFound() inside the streamed page would answer 200.
export default async function FieldSheetLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; slug: string }>;
}) {
  const { vendor, slug } = await params;
  if (!(await findFieldSheetPage(vendor, slug))) notFound();
  return children;
}
