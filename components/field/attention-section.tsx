import type { AttentionFilter } from "@/content-schema/field-filters";
import { listNeedsAttention } from "@/lib/field/needs-attention";

import { NeedsAttentionTable } from "./needs-attention-table";

/** The Needs-attention list under the chosen filters. */
export async function AttentionSection({
  vendorId,
  vendorSlug,
  z,
  confidenceLabel,
  filter,
}: {
  vendorId: string;
  vendorSlug: string;
  z: number;
  confidenceLabel: string;
  filter: AttentionFilter;
}) {
  const items = await listNeedsAttention({ vendorId, z, filters: { from: filter.from, to: filter.to, machineClass: filter.class } });
  return <NeedsAttentionTable items={items} vendorSlug={vendorSlug} confidenceLabel={confidenceLabel} />;
}
