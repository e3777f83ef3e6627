import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { findBenchMachine } from "@/lib/bench/page-data";

// Looked up above any loading boundary, so another customer's machine is a real 404.
export default async function MachineLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ vendor: string; id: string }>;
}) {
  const { vendor, id } = await params;
  if (!(await findBenchMachine(vendor, id))) notFound();
  return children;
}
