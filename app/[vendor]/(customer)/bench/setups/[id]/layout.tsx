import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findBenchSetup } from "@/lib/bench/page-data";

// Looked up above the loading boundary, so another customer's setup is a real 404.
export default async function SetupLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; id: string }> }) {
  const { vendor, id } = await params;
  if (!(await findBenchSetup(vendor, id))) notFound();
  return children;
}
