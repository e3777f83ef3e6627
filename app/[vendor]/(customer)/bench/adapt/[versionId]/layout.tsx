import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadBenchVersion } from "@/components/bench/load-bench-version";

// The version is looked up above any loading boundary, so an unknown or unreadable one is a real 404.
export default async function AdaptVersionLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; versionId: string }> }) {
  const { vendor, versionId } = await params;
  if (!(await loadBenchVersion(vendor, versionId))) notFound();
  return children;
}
