import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadLibrarySheet, parseVersionNumber } from "@/components/library/load-library-sheet";

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
  if (number === null || !(await loadLibrarySheet(vendor, sheet, number))) notFound();
  return children;
}
