import "server-only";

import { outcomeSymptomLabels } from "@/content-schema/outcome-fields";
import type { Vendor } from "@/content-schema/vendor";
import { appUrl } from "@/lib/http/app-url";
import { createStopToken } from "@/lib/mail/stop-token";

import { confidenceOf, percent } from "./confidence";
import { getCoverageGaps } from "./coverage";
import { listCustomerChanges } from "./customer-changes";
import { describeChange } from "./describe-change";
import type { DigestMail } from "./digest-mail";
import { countNeedsAttention, listNeedsAttention } from "./needs-attention";
import { topSymptom } from "./rollup-rows";
import { weekStartOf } from "./week-series";

// What the weekly Field digest says: its week, its lists and its stop link. Sending is in send-digest.ts,
// the queue in digest-job.ts.
const TOP = 5;

export { weekStartOf };

export const digestStopUrl = (vendor: Pick<Vendor, "id" | "slug">, userId: string) =>
  appUrl(`/api/v1/vendors/${vendor.slug}/field/digest/stop?token=${createStopToken("weekly-digest", { vendorId: vendor.id, userId })}`);

/** The digest's lists for one vendor; the same for every engineer of that vendor. */
export async function buildDigestContent(vendor: Vendor, weekOf: string): Promise<Omit<DigestMail, "stopUrl">> {
  const { z: zValue, label } = confidenceOf(vendor.settings);
  const [attention, attentionTotal, changes, coverage] = await Promise.all([
    listNeedsAttention({ vendorId: vendor.id, z: zValue, limit: TOP }),
    countNeedsAttention({ vendorId: vendor.id }),
    listCustomerChanges({ vendorId: vendor.id, limit: TOP }),
    getCoverageGaps({ vendorId: vendor.id }),
  ]);
  return {
    vendorName: vendor.name,
    weekOf,
    confidenceLabel: label,
    fieldUrl: appUrl(`/${vendor.slug}/drafting/field`),
    attention: attention.map((a) => {
      const symptom = topSymptom(a.symptoms);
      return {
        title: `${a.title} (${a.machineClass})`,
        number: a.number,
        failed: a.failed,
        outcomes: a.outcomes,
        lowerPct: percent(a.failure.lower),
        upperPct: percent(a.failure.upper),
        symptom: symptom && outcomeSymptomLabels[symptom],
        url: appUrl(`/${vendor.slug}/drafting/field/${a.sheetSlug}`),
      };
    }),
    attentionTotal,
    changes: changes.map((c) => ({
      title: `${c.title} (${c.machineClass})`,
      number: c.number,
      sentence: `${c.operationLabel}: ${describeChange(c)}`,
    })),
    gaps: coverage.clusters.slice(0, TOP).map((c) => c.summary),
    moreGaps: Math.max(0, coverage.clusters.length - TOP),
    machines: coverage.machines,
  };
}
