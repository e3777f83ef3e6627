import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findLibrarySheetPage } from "@/components/library/find-library-sheet-page";

// The sheet is looked up here, above any loading boundary, so an unknown sheet is a real 404.
export default async function SheetLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; sheet: string }>;
}) {
  const { vendor, sheet } = await params;
  if (!(await findLibrarySheetPage(vendor, sheet))) notFound();
  return children;
}
