import { notFound } from "next/navigation";
import type { ReactNode } from "react";

import { loadBenchMachine } from "@/components/bench/load-bench";

// Looked up above any loading boundary, so another customer's machine is a real 404.
export default async function MachineLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string; id: string }> }) {
  const { vendor, id } = await params;
  if (!(await loadBenchMachine(vendor, id))) notFound();
  return children;
}
