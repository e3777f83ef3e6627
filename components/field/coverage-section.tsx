import { getCoverageGaps } from "@/lib/field/coverage";

import { CoverageGapList } from "./coverage-gap-list";

/** Customers' machines no published machine class covers. */
export async function CoverageSection({ vendorId, vendorSlug }: { vendorId: string; vendorSlug: string }) {
  return <CoverageGapList report={await getCoverageGaps({ vendorId })} vendorSlug={vendorSlug} />;
}
