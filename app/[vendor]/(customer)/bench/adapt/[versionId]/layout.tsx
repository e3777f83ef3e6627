import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findBenchVersion } from "@/lib/bench/page-data";

// The version is looked up above any loading boundary, so an unknown or unreadable one is a real 404.
export default async function AdaptVersionLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; versionId: string }>;
}) {
  const { vendor, versionId } = await params;
  if (!(await findBenchVersion(vendor, versionId))) notFound();
  return children;
}
