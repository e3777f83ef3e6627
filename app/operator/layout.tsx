import type { ReactNode } from "react";

import { SiteShell } from "@/components/shell/site-shell";

export default function OperatorLayout({ children }: { children: ReactNode }) {
  return <SiteShell>{children}</SiteShell>;
}
