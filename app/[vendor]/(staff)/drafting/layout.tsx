import type { ReactNode } from "react";

import { DraftingNav } from "@/components/drafting/drafting-nav";
import { areaLayout } from "@/components/shell/area-layout";

const guard = areaLayout("sheets.author", "drafting");

export default async function DraftingLayout({ children, params }: { children: ReactNode; params: Promise<{ vendor: string }> }) {
  const { vendor } = await params;
  return guard({
    params,
    children: (
      <>
        <DraftingNav vendorSlug={vendor} />
        {children}
      </>
    ),
  });
}
