import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findLibrarySheetPage, parseVersionNumber } from "@/components/library/find-library-sheet-page";

// Drafts and versions in review are never found here; readable versions stay readable for ever.
export default async function VersionLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; sheet: string; n: string }>;
}) {
  const { vendor, sheet, n } = await params;
  const number = parseVersionNumber(n);
  if (number === null || !(await findLibrarySheetPage(vendor, sheet, number))) notFound();
  return children;
}
